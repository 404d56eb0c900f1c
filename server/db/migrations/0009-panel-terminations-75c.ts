import { DataTypes, type QueryInterface } from 'sequelize';
import type { MigrationParams } from 'umzug';

/** The panel's answer: its equipment listed for 75 °C conductors (NEC 110.14(C)(1)(a)(3)); null when not answered (taken as yes, flagged). */
export async function up({ context: qi }: MigrationParams<QueryInterface>) {
  await qi.addColumn('panels', 'terminations_listed_75c', { type: DataTypes.BOOLEAN, allowNull: true, defaultValue: null });
}

export async function down({ context: qi }: MigrationParams<QueryInterface>) {
  await qi.removeColumn('panels', 'terminations_listed_75c');
}
