import { DataTypes, type QueryInterface } from 'sequelize';
import type { MigrationParams } from 'umzug';

/** Catalogue unit and terminations, labour-unit basis, and when a panel's bill of materials was built. */
export async function up({ context: qi }: MigrationParams<QueryInterface>) {
  await qi.addColumn('catalogue_items', 'unit', { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'ea' });
  await qi.addColumn('catalogue_items', 'terminations', { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 });
  await qi.addColumn('labour_units', 'per', { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'each' });
  await qi.addColumn('panels', 'bom_generated_at', { type: DataTypes.DATE, allowNull: true });
}

export async function down({ context: qi }: MigrationParams<QueryInterface>) {
  await qi.removeColumn('panels', 'bom_generated_at');
  await qi.removeColumn('labour_units', 'per');
  await qi.removeColumn('catalogue_items', 'terminations');
  await qi.removeColumn('catalogue_items', 'unit');
}
