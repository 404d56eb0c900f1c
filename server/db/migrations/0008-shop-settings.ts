import { DataTypes, type QueryInterface } from 'sequelize';
import type { MigrationParams } from 'umzug';

/**
 * The shop's own identity and defaults on its organisation (the name is the shop's name), and a table
 * of stored files (the logo) behind the file-store interface.
 */
export async function up({ context: qi }: MigrationParams<QueryInterface>) {
  await qi.createTable('stored_files', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    organisation_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'organisations', key: 'id' }, onDelete: 'CASCADE' },
    key: { type: DataTypes.STRING(200), allowNull: false },
    content_type: { type: DataTypes.STRING(100), allowNull: false },
    bytes: { type: DataTypes.INTEGER, allowNull: false },
    data: { type: DataTypes.BLOB, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('stored_files', ['organisation_id', 'key'], { unique: true, name: 'stored_files_org_key' });
  await qi.addColumn('organisations', 'address', { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' });
  await qi.addColumn('organisations', 'logo_key', { type: DataTypes.STRING(200), allowNull: true });
  await qi.addColumn('organisations', 'default_labour_rate', { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 85 });
  await qi.addColumn('organisations', 'default_markup_percent', { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 15 });
  await qi.addColumn('organisations', 'drawing_number_scheme', {
    type: DataTypes.STRING(80),
    allowNull: false,
    defaultValue: '{job}-{panel}-{sheet:2}',
  });
  await qi.addColumn('organisations', 'allow_self_sign_off', { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false });
  await qi.addColumn('organisations', 'version', { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 });
  // the signed-in people's cache holds the organisation's name: a renamed shop announces it as a user change
  await qi.sequelize.query(
    "create trigger pw_organisations_change after update or delete on organisations for each row execute function pw_notify_row_change('u')",
  );
}

export async function down({ context: qi }: MigrationParams<QueryInterface>) {
  await qi.sequelize.query('drop trigger if exists pw_organisations_change on organisations');
  for (const c of [
    'version',
    'allow_self_sign_off',
    'drawing_number_scheme',
    'default_markup_percent',
    'default_labour_rate',
    'logo_key',
    'address',
  ]) {
    await qi.removeColumn('organisations', c);
  }
  await qi.dropTable('stored_files');
}
