import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { Organisation } from './organisation';
import type { Job } from './job';
import type { PanelState } from '../../../shared/schemas/panel';
import type { PanelRollup } from '../../../shared/schemas/selection';

export class Panel extends Model<InferAttributes<Panel>, InferCreationAttributes<Panel>> {
  declare id: CreationOptional<number>;
  declare organisationId: ForeignKey<Organisation['id']>;
  declare jobId: ForeignKey<Job['id']>;
  declare name: string;
  declare description: CreationOptional<string>;
  declare mounting: CreationOptional<string>;
  declare status: CreationOptional<PanelState>;
  declare revisionNumber: number | null;
  declare markupPercent: CreationOptional<number>;
  declare labourRate: CreationOptional<number>;
  /** equipment listed for 75 °C conductors (110.14(C)(1)(a)(3)); null: not answered, taken as yes and flagged */
  declare terminationsListed75C: CreationOptional<boolean | null>;
  declare archivedAt: Date | null;
  declare rollup: PanelRollup | null;
  declare submittedAt: Date | null;
  declare bomGeneratedAt: CreationOptional<Date | null>;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare job?: NonAttribute<Job>;

  static initModel(sequelize: Sequelize) {
    Panel.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        name: { type: DataTypes.STRING(200), allowNull: false },
        description: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        mounting: { type: DataTypes.STRING(30), allowNull: false, defaultValue: 'wall-mounted' },
        status: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'draft' },
        revisionNumber: { type: DataTypes.INTEGER, allowNull: true },
        markupPercent: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 15 },
        labourRate: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 85 },
        terminationsListed75C: { type: DataTypes.BOOLEAN, allowNull: true, defaultValue: null, field: 'terminations_listed_75c' },
        archivedAt: { type: DataTypes.DATE, allowNull: true },
        rollup: { type: DataTypes.JSONB, allowNull: true },
        submittedAt: { type: DataTypes.DATE, allowNull: true },
        bomGeneratedAt: { type: DataTypes.DATE, allowNull: true },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'panels' },
    );
  }
}
