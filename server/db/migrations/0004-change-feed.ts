import type { QueryInterface } from 'sequelize';
import type { MigrationParams } from 'umzug';

/**
 * Change notifications for the per-process caches (server/db/change-feed.ts): after a session, user,
 * job or panel row is updated or deleted, PostgreSQL sends "<kind>:<key>" on channel pw_change when
 * the transaction commits. A session is named by the md5 of its id, so the id never travels.
 * Inserts are not announced: nothing can have cached a row that did not exist.
 */
export async function up({ context: qi }: MigrationParams<QueryInterface>) {
  await qi.sequelize.query(`
    create function pw_notify_row_change() returns trigger language plpgsql as $$
    begin
      perform pg_notify('pw_change', tg_argv[0] || ':' || old.id);
      return null;
    end $$;
    create function pw_notify_session_change() returns trigger language plpgsql as $$
    begin
      perform pg_notify('pw_change', 's:' || md5(old.sid));
      return null;
    end $$;
    create trigger pw_session_change after update or delete on session for each row execute function pw_notify_session_change();
    create trigger pw_users_change after update or delete on users for each row execute function pw_notify_row_change('u');
    create trigger pw_jobs_change after update or delete on jobs for each row execute function pw_notify_row_change('j');
    create trigger pw_panels_change after update or delete on panels for each row execute function pw_notify_row_change('p');
  `);
}

export async function down({ context: qi }: MigrationParams<QueryInterface>) {
  await qi.sequelize.query(`
    drop trigger if exists pw_panels_change on panels;
    drop trigger if exists pw_jobs_change on jobs;
    drop trigger if exists pw_users_change on users;
    drop trigger if exists pw_session_change on session;
    drop function if exists pw_notify_session_change();
    drop function if exists pw_notify_row_change();
  `);
}
