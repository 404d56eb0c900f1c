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
import type { LoadInput } from '../../../shared/schemas/load';
import type { LoadSelection } from '../../../shared/schemas/selection';
import type { StoredOverride } from '../../../shared/schemas/override';

/** A motor on a panel: the designer's answers, the engine's stored selection and the designer's overrides. */
export class Load extends Model<InferAttributes<Load>, InferCreationAttributes<Load>> {
  declare id: CreationOptional<number>;
  declare organisationId: ForeignKey<Organisation['id']>;
  declare panelId: ForeignKey<Panel['id']>;
  declare position: CreationOptional<number>;
  declare tag: string;
  /** the motor's answers as parsed by LoadSchema when saved */
  declare answers: LoadInput;
  /** the engine's stored selection (a snapshot: a rule change does not rewrite it) */
  declare selection: LoadSelection | null;
  declare overrides: CreationOptional<StoredOverride[]>;
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
