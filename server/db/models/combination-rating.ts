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

export class CombinationRatingRow extends Model<InferAttributes<CombinationRatingRow>, InferCreationAttributes<CombinationRatingRow>> {
  declare id: CreationOptional<number>;
  declare organisationId: ForeignKey<Organisation['id']>;
  declare ref: string;
  declare componentCodes: string[];
  declare ratingKa: number;
  declare maxVolts: number | null;
  declare source: string;
  declare active: CreationOptional<boolean>;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    CombinationRatingRow.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        ref: { type: DataTypes.STRING(60), allowNull: false },
        componentCodes: { type: DataTypes.JSONB, allowNull: false },
        ratingKa: { type: DataTypes.DOUBLE, allowNull: false },
        maxVolts: { type: DataTypes.INTEGER, allowNull: true },
        source: { type: DataTypes.STRING(300), allowNull: false },
        active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'combination_ratings' },
    );
  }
}
