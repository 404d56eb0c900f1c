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

export class Job extends Model<InferAttributes<Job>, InferCreationAttributes<Job>> {
  declare id: CreationOptional<number>;
  declare organisationId: ForeignKey<Organisation['id']>;
  declare number: string;
  declare name: string;
  declare customer: CreationOptional<string>;
  declare site: CreationOptional<string>;
  declare supplyVolts: CreationOptional<number>;
  declare supplyPhases: CreationOptional<number>;
  declare supplyHz: CreationOptional<number>;
  declare availableFaultKa: CreationOptional<number>;
  declare ambientC: CreationOptional<number>;
  declare voltageUnbalancePercent: CreationOptional<number>;
  declare codeEdition: CreationOptional<string>;
  declare notes: CreationOptional<string>;
  declare archivedAt: Date | null;
  declare createdBy: number | null;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Job.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        number: { type: DataTypes.STRING(40), allowNull: false },
        name: { type: DataTypes.STRING(200), allowNull: false },
        customer: { type: DataTypes.STRING(200), allowNull: false, defaultValue: '' },
        site: { type: DataTypes.STRING(200), allowNull: false, defaultValue: '' },
        supplyVolts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 480 },
        supplyPhases: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 3 },
        supplyHz: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 60 },
        availableFaultKa: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 22 },
        ambientC: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 30 },
        voltageUnbalancePercent: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
        codeEdition: { type: DataTypes.STRING(10), allowNull: false, defaultValue: '2023' },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        archivedAt: { type: DataTypes.DATE, allowNull: true },
        createdBy: { type: DataTypes.INTEGER, allowNull: true },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'jobs' },
    );
  }
}
