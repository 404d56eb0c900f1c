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

export class LabourUnit extends Model<InferAttributes<LabourUnit>, InferCreationAttributes<LabourUnit>> {
  declare id: CreationOptional<number>;
  declare organisationId: ForeignKey<Organisation['id']>;
  declare key: string;
  declare label: string;
  declare hours: number;
  declare per: CreationOptional<string>;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    LabourUnit.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        key: { type: DataTypes.STRING(60), allowNull: false },
        label: { type: DataTypes.STRING(200), allowNull: false },
        hours: { type: DataTypes.DOUBLE, allowNull: false },
        per: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'each' },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'labour_units' },
    );
  }
}
