// Connects, migrates and (optionally) seeds: shared by the start script, the server entry and test set-up.
import { connectDatabase } from './db/sequelize';
import { migrate } from './db/migrate';
import { seedDemo } from './db/seeders/demo';
import { env } from './config/env';

export async function prepareDatabase(url: string, opts: { seed?: boolean; poolMax?: number } = {}) {
  const sequelize = connectDatabase(url, { logSql: env().PW_LOG_SQL === '1', poolMax: opts.poolMax });
  await migrate(sequelize);
  const seeded = opts.seed ? await seedDemo(sequelize) : false;
  return { sequelize, seeded };
}
