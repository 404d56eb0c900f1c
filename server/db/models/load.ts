import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Organisation } from './organisation';
import type { Panel } from './panel';

/** A motor on a panel: the designer's answers, the engine's stored selection and the designer's overrides. */
export class Load extends Model<InferAttributes<Load>, InferCreationAttributes<Load>> {
  declare id: CreationOptional<number>;
  declare organisationId: ForeignKey<Organisation['id']>;
  declare panelId: ForeignKey<Panel['id']>;
  declare position: CreationOptional<number>;
  declare tag: string;
  declare answers: Record<string, unknown>;
  declare selection: Record<string, unknown> | null;
  declare overrides: CreationOptional<Array<Record<string, unknown>>>;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Load.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        tag: { type: DataTypes.STRING(40), allowNull: false },
        answers: { type: DataTypes.JSONB, allowNull: false },
        selection: { type: DataTypes.JSONB, allowNull: true },
        overrides: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'loads' },
    );
  }
}
