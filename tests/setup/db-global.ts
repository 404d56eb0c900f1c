// API test set-up: a fresh database per run on the project's PostgreSQL (or DATABASE_URL's server),
// migrated and seeded with the demo data; dropped afterwards. A cluster the run had to start is
// stopped at its end (PW_KEEP_DB=1 keeps it).
import type { TestProject } from 'vitest/node';
import { acquireCluster, createDatabase, dropDatabase, releaseCluster, serverUrl } from '../../scripts/postgres';

declare module 'vitest' {
  export interface ProvidedContext {
    databaseUrl: string;
  }
}

export default async function setup(project: TestProject) {
  process.env.PW_QUIET = '1';
  const name = `pw_test_${process.pid}_${Date.now().toString(36)}`;
  let url: string;
  let admin: string | null = null;
  if (process.env.DATABASE_URL) {
    // An external server: create the test database beside the configured one.
    const base = new URL(process.env.DATABASE_URL);
    admin = `${base.protocol}//${base.username}:${base.password}@${base.host}/postgres`;
    await createDatabase(admin, name);
    base.pathname = `/${name}`;
    url = base.toString();
  } else {
    admin = await acquireCluster();
    await createDatabase(admin, name);
    url = serverUrl(name);
  }
  const { prepareDatabase } = await import('../../server/boot');
  const { closeDatabase } = await import('../../server/db/sequelize');
  await prepareDatabase(url, { seed: true });
  await closeDatabase();
  project.provide('databaseUrl', url);
  return async () => {
    if (admin) await dropDatabase(admin, name).catch(() => undefined);
    // the cluster stops once the browser tests are done with it too, and only if this run started it
    if (!process.env.DATABASE_URL) releaseCluster();
  };
}
