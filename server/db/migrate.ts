import { Umzug, SequelizeStorage } from 'umzug';
import type { QueryInterface, Sequelize } from 'sequelize';
import { migrations } from './migrations/index';

export function migrator(sequelize: Sequelize) {
  return new Umzug<QueryInterface>({
    migrations: migrations.map(([name, m]) => ({ name, up: m.up, down: m.down })),
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  });
}

export async function migrate(sequelize: Sequelize) {
  return migrator(sequelize).up();
}
