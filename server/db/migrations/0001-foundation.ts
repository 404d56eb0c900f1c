import { DataTypes, type QueryInterface } from 'sequelize';
import type { MigrationParams } from 'umzug';

const id = { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false };
const ts = {
  created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
};
const org = { type: DataTypes.INTEGER, allowNull: false, references: { model: 'organisations', key: 'id' }, onDelete: 'CASCADE' };
const version = { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 };

export async function up({ context: qi }: MigrationParams<QueryInterface>) {
  await qi.createTable('organisations', { id, name: { type: DataTypes.STRING(200), allowNull: false }, ...ts });

  await qi.createTable('users', {
    id,
    organisation_id: org,
    email: { type: DataTypes.STRING(320), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(200), allowNull: false },
    password_hash: { type: DataTypes.STRING(400), allowNull: true },
    roles: { type: DataTypes.ARRAY(DataTypes.STRING(20)), allowNull: false, defaultValue: [] },
    active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
    invite_token: { type: DataTypes.STRING(100), allowNull: true, unique: true },
    last_sign_in_at: { type: DataTypes.DATE, allowNull: true },
    version,
    ...ts,
  });

  // connect-pg-simple's table
  await qi.createTable('session', {
    sid: { type: DataTypes.STRING, primaryKey: true, allowNull: false },
    sess: { type: DataTypes.JSON, allowNull: false },
    expire: { type: DataTypes.DATE(6), allowNull: false },
  });
  await qi.addIndex('session', ['expire'], { name: 'IDX_session_expire' });

  await qi.createTable('jobs', {
    id,
    organisation_id: org,
    number: { type: DataTypes.STRING(40), allowNull: false },
    name: { type: DataTypes.STRING(200), allowNull: false },
    customer: { type: DataTypes.STRING(200), allowNull: false, defaultValue: '' },
    site: { type: DataTypes.STRING(200), allowNull: false, defaultValue: '' },
    supply_volts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 480 },
    supply_phases: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 3 },
    supply_hz: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 60 },
    available_fault_ka: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 22 },
    ambient_c: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 30 },
    code_edition: { type: DataTypes.STRING(10), allowNull: false, defaultValue: '2023' },
    notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    archived_at: { type: DataTypes.DATE, allowNull: true },
    created_by: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    version,
    ...ts,
  });
  await qi.addIndex('jobs', ['organisation_id', 'number'], { unique: true });

  await qi.createTable('panels', {
    id,
    organisation_id: org,
    job_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'jobs', key: 'id' }, onDelete: 'CASCADE' },
    name: { type: DataTypes.STRING(200), allowNull: false },
    description: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    mounting: { type: DataTypes.STRING(30), allowNull: false, defaultValue: 'wall-mounted' },
    status: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'draft' },
    revision_number: { type: DataTypes.INTEGER, allowNull: true },
    markup_percent: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 15 },
    labour_rate: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 85 },
    archived_at: { type: DataTypes.DATE, allowNull: true },
    version,
    ...ts,
  });
  await qi.addIndex('panels', ['job_id']);

  await qi.createTable('loads', {
    id,
    organisation_id: org,
    panel_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'panels', key: 'id' }, onDelete: 'CASCADE' },
    position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    tag: { type: DataTypes.STRING(40), allowNull: false },
    answers: { type: DataTypes.JSONB, allowNull: false },
    selection: { type: DataTypes.JSONB, allowNull: true },
    overrides: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    version,
    ...ts,
  });
  await qi.addIndex('loads', ['panel_id', 'tag'], { unique: true });

  await qi.createTable('revisions', {
    id,
    organisation_id: org,
    panel_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'panels', key: 'id' }, onDelete: 'CASCADE' },
    number: { type: DataTypes.INTEGER, allowNull: false },
    snapshot: { type: DataTypes.JSONB, allowNull: false },
    approved_by: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    approved_at: { type: DataTypes.DATE, allowNull: false },
    ...ts,
  });
  await qi.addIndex('revisions', ['panel_id', 'number'], { unique: true });

  await qi.createTable('comments', {
    id,
    organisation_id: org,
    panel_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'panels', key: 'id' }, onDelete: 'CASCADE' },
    load_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'loads', key: 'id' }, onDelete: 'CASCADE' },
    user_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    body: { type: DataTypes.TEXT, allowNull: false },
    ...ts,
  });
  await qi.addIndex('comments', ['panel_id']);

  await qi.createTable('activities', {
    id,
    organisation_id: org,
    job_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'jobs', key: 'id' }, onDelete: 'CASCADE' },
    panel_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'panels', key: 'id' }, onDelete: 'CASCADE' },
    user_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    entity: { type: DataTypes.STRING(40), allowNull: false },
    entity_id: { type: DataTypes.INTEGER, allowNull: true },
    action: { type: DataTypes.STRING(40), allowNull: false },
    summary: { type: DataTypes.TEXT, allowNull: false },
    diff: { type: DataTypes.JSONB, allowNull: true },
    ...ts,
  });
  await qi.addIndex('activities', ['organisation_id', 'job_id']);
  await qi.addIndex('activities', ['organisation_id', 'entity']);

  await qi.createTable('catalogue_items', {
    id,
    organisation_id: org,
    code: { type: DataTypes.STRING(60), allowNull: false },
    category: { type: DataTypes.STRING(40), allowNull: false },
    description: { type: DataTypes.STRING(300), allowNull: false },
    ratings: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
    sccr_ka: { type: DataTypes.DOUBLE, allowNull: true },
    heat_loss_w: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
    unit_cost: { type: DataTypes.DOUBLE, allowNull: false },
    labour_hours: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
    lead_time_days: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
    version,
    ...ts,
  });
  await qi.addIndex('catalogue_items', ['organisation_id', 'code'], { unique: true });
  await qi.addIndex('catalogue_items', ['organisation_id', 'category']);

  await qi.createTable('labour_units', {
    id,
    organisation_id: org,
    key: { type: DataTypes.STRING(60), allowNull: false },
    label: { type: DataTypes.STRING(200), allowNull: false },
    hours: { type: DataTypes.DOUBLE, allowNull: false },
    version,
    ...ts,
  });
  await qi.addIndex('labour_units', ['organisation_id', 'key'], { unique: true });

  await qi.createTable('bom_lines', {
    id,
    organisation_id: org,
    panel_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'panels', key: 'id' }, onDelete: 'CASCADE' },
    position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    line: { type: DataTypes.JSONB, allowNull: false },
    ...ts,
  });
  await qi.addIndex('bom_lines', ['panel_id']);

  await qi.createTable('mail_messages', {
    id,
    to_address: { type: DataTypes.TEXT, allowNull: false },
    from_address: { type: DataTypes.TEXT, allowNull: false },
    subject: { type: DataTypes.TEXT, allowNull: false },
    body: { type: DataTypes.TEXT, allowNull: false },
    ...ts,
  });
}

export async function down({ context: qi }: MigrationParams<QueryInterface>) {
  for (const t of [
    'mail_messages',
    'bom_lines',
    'labour_units',
    'catalogue_items',
    'activities',
    'comments',
    'revisions',
    'loads',
    'panels',
    'jobs',
    'session',
    'users',
    'organisations',
  ]) {
    await qi.dropTable(t);
  }
}
