import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { Organisation } from './organisation';

export class CatalogueItem extends Model<InferAttributes<CatalogueItem>, InferCreationAttributes<CatalogueItem>> {
  declare id: CreationOptional<number>;
  declare organisationId: ForeignKey<Organisation['id']>;
  declare code: string;
  declare category: string;
  declare description: string;
  declare ratings: Record<string, unknown>;
  declare sccrKa: number | null;
  declare outlineWidthMm: CreationOptional<number | null>;
  declare outlineHeightMm: CreationOptional<number | null>;
  declare outlineDepthMm: CreationOptional<number | null>;
  declare clearanceAboveMm: CreationOptional<number | null>;
  declare clearanceBelowMm: CreationOptional<number | null>;
  declare heatLossW: CreationOptional<number>;
  declare unitCost: number;
  declare labourHours: CreationOptional<number>;
  declare leadTimeDays: CreationOptional<number>;
  declare active: CreationOptional<boolean>;
  declare unit: CreationOptional<string>;
  declare terminations: CreationOptional<number>;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    CatalogueItem.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        code: { type: DataTypes.STRING(60), allowNull: false },
        category: { type: DataTypes.STRING(40), allowNull: false },
        description: { type: DataTypes.STRING(300), allowNull: false },
        ratings: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        sccrKa: { type: DataTypes.DOUBLE, allowNull: true },
        outlineWidthMm: { type: DataTypes.DOUBLE, allowNull: true },
        outlineHeightMm: { type: DataTypes.DOUBLE, allowNull: true },
        outlineDepthMm: { type: DataTypes.DOUBLE, allowNull: true },
        clearanceAboveMm: { type: DataTypes.DOUBLE, allowNull: true },
        clearanceBelowMm: { type: DataTypes.DOUBLE, allowNull: true },
        heatLossW: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
        unitCost: { type: DataTypes.DOUBLE, allowNull: false },
        labourHours: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
        leadTimeDays: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        unit: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'ea' },
        terminations: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'catalogue_items' },
    );
  }
}
