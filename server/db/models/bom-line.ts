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
import type { Panel } from './panel';
import type { BomLine } from '../../../shared/schemas/catalogue';

/** One stored bill-of-materials line; `line` holds the shared BomLine shape with its frozen unit cost. */
export class BomLineRow extends Model<InferAttributes<BomLineRow>, InferCreationAttributes<BomLineRow>> {
  declare id: CreationOptional<number>;
  declare organisationId: ForeignKey<Organisation['id']>;
  declare panelId: ForeignKey<Panel['id']>;
  declare position: number;
  declare line: BomLine;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    BomLineRow.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        line: { type: DataTypes.JSONB, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'bom_lines' },
    );
  }
}
