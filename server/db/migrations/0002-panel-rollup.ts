import { DataTypes, type QueryInterface } from 'sequelize';
import type { MigrationParams } from 'umzug';

/** The engine's panel roll-up (feeder per 430.24 / 430.62(A)) stored with the panel. */
export async function up({ context: qi }: MigrationParams<QueryInterface>) {
  await qi.addColumn('panels', 'rollup', { type: DataTypes.JSONB, allowNull: true });
  await qi.addColumn('panels', 'submitted_at', { type: DataTypes.DATE, allowNull: true });
  await qi.addIndex('loads', ['panel_id', 'position']);
}

export async function down({ context: qi }: MigrationParams<QueryInterface>) {
  await qi.removeIndex('loads', ['panel_id', 'position']);
  await qi.removeColumn('panels', 'submitted_at');
  await qi.removeColumn('panels', 'rollup');
}
