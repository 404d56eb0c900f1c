import type { QueryInterface } from 'sequelize';
import type { MigrationParams } from 'umzug';

/**
 * The catalogue on the change feed: any statement that inserts, updates or deletes catalogue items
 * sends one "c:*" on channel pw_change when its transaction commits (an import of the whole catalogue
 * is one notification, not one per row). Inserts count here: a cached catalogue lacks a new item.
 */
export async function up({ context: qi }: MigrationParams<QueryInterface>) {
  await qi.sequelize.query(`
    create function pw_notify_table_change() returns trigger language plpgsql as $$
    begin
      perform pg_notify('pw_change', tg_argv[0] || ':*');
      return null;
    end $$;
    create trigger pw_catalogue_change after insert or update or delete or truncate on catalogue_items for each statement execute function pw_notify_table_change('c');
  `);
}

export async function down({ context: qi }: MigrationParams<QueryInterface>) {
  await qi.sequelize.query(`
    drop trigger if exists pw_catalogue_change on catalogue_items;
    drop function if exists pw_notify_table_change();
  `);
}
