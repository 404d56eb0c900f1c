import path from 'node:path';
import { Umzug, SequelizeStorage } from 'umzug';
import type { QueryInterface, Sequelize } from 'sequelize';

export function migrator(sequelize: Sequelize) {
  return new Umzug<QueryInterface>({
    migrations: {
      glob: ['migrations/*.ts', { cwd: path.join(import.meta.dirname) }],
    },
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  });
}

export async function migrate(sequelize: Sequelize) {
  return migrator(sequelize).up();
}
