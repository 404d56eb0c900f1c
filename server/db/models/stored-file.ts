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

/** A file kept in PostgreSQL (the default file store): the shop's logo. */
export class StoredFileRow extends Model<InferAttributes<StoredFileRow>, InferCreationAttributes<StoredFileRow>> {
  declare id: CreationOptional<number>;
  declare organisationId: ForeignKey<Organisation['id']>;
  declare key: string;
  declare contentType: string;
  declare bytes: number;
  declare data: Buffer;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    StoredFileRow.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        key: { type: DataTypes.STRING(200), allowNull: false },
        contentType: { type: DataTypes.STRING(100), allowNull: false },
        bytes: { type: DataTypes.INTEGER, allowNull: false },
        data: { type: DataTypes.BLOB, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'stored_files' },
    );
  }
}
