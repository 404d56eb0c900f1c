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
import type { RevisionSnapshot } from '../../../shared/schemas/panel';

/** A frozen, signed-off state of a panel: its loads, selections and bill of materials. */
export class Revision extends Model<InferAttributes<Revision>, InferCreationAttributes<Revision>> {
  declare id: CreationOptional<number>;
  declare organisationId: ForeignKey<Organisation['id']>;
  declare panelId: ForeignKey<Panel['id']>;
  declare number: number;
  declare snapshot: RevisionSnapshot;
  declare approvedBy: number | null;
  declare approvedAt: Date;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Revision.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        number: { type: DataTypes.INTEGER, allowNull: false },
        snapshot: { type: DataTypes.JSONB, allowNull: false },
        approvedBy: { type: DataTypes.INTEGER, allowNull: true },
        approvedAt: { type: DataTypes.DATE, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'revisions' },
    );
  }
}
