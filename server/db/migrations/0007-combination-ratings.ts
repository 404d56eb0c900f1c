import { DataTypes, type QueryInterface } from 'sequelize';
import type { MigrationParams } from 'umzug';

/**
 * Tested combination ratings (UL 508A SB4): a set of catalogue parts in one bucket, tested together
 * to a short-circuit current rating higher than their own, from a listing or a maker's published table.
 */
export async function up({ context: qi }: MigrationParams<QueryInterface>) {
  await qi.createTable('combination_ratings', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    organisation_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'organisations', key: 'id' }, onDelete: 'CASCADE' },
    ref: { type: DataTypes.STRING(60), allowNull: false },
    component_codes: { type: DataTypes.JSONB, allowNull: false },
    rating_ka: { type: DataTypes.DOUBLE, allowNull: false },
    max_volts: { type: DataTypes.INTEGER, allowNull: true },
    source: { type: DataTypes.STRING(300), allowNull: false },
    active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('combination_ratings', ['organisation_id', 'ref'], { unique: true, name: 'combination_ratings_org_ref' });
  // on the change feed with the catalogue (migration 0005): the SCCR worksheet keeps them in memory
  await qi.sequelize.query(
    "create trigger pw_combination_change after insert or update or delete or truncate on combination_ratings for each statement execute function pw_notify_table_change('c')",
  );
}

export async function down({ context: qi }: MigrationParams<QueryInterface>) {
  await qi.dropTable('combination_ratings');
}
