import { DataTypes, type QueryInterface } from 'sequelize';
import type { MigrationParams } from 'umzug';

const COLUMNS = ['outline_width_mm', 'outline_height_mm', 'outline_depth_mm', 'clearance_above_mm', 'clearance_below_mm'] as const;

/**
 * A catalogue item's outside dimensions as mounted (width, height, depth, mm) and the free space a drive or
 * soft starter needs above and below it; null where not given. The backplate layout places parts by them.
 */
export async function up({ context: qi }: MigrationParams<QueryInterface>) {
  for (const column of COLUMNS)
    await qi.addColumn('catalogue_items', column, { type: DataTypes.DOUBLE, allowNull: true, defaultValue: null });
}

export async function down({ context: qi }: MigrationParams<QueryInterface>) {
  for (const column of [...COLUMNS].reverse()) await qi.removeColumn('catalogue_items', column);
}
