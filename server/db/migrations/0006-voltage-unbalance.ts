import { DataTypes, type QueryInterface } from 'sequelize';
import type { MigrationParams } from 'umzug';

/** The site's measured voltage unbalance on the job (NEMA MG 1 14.36), %; 0 when none is known. */
export async function up({ context: qi }: MigrationParams<QueryInterface>) {
  await qi.addColumn('jobs', 'voltage_unbalance_percent', { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 });
}

export async function down({ context: qi }: MigrationParams<QueryInterface>) {
  await qi.removeColumn('jobs', 'voltage_unbalance_percent');
}
