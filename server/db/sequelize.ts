import { Sequelize } from 'sequelize';
import { initModels } from './models/index';

let instance: Sequelize | null = null;

/** Opens the connection pool once per process and wires the models. */
export function connectDatabase(url: string, opts: { logSql?: boolean; poolMax?: number } = {}): Sequelize {
  if (instance) return instance;
  instance = new Sequelize(url, {
    dialect: 'postgres',
    logging: opts.logSql ? (sql) => console.log(sql) : false,
    pool: { max: opts.poolMax ?? 20, min: 0, idle: 10_000, acquire: 20_000 },
    // a database that does not answer (host down, network cut) fails the request within 10 s, as 503
    dialectOptions: { connectionTimeoutMillis: 10_000, keepAlive: true },
    define: { underscored: true },
  });
  initModels(instance);
  return instance;
}

export function db(): Sequelize {
  if (!instance) throw new Error('database not connected');
  return instance;
}

export async function closeDatabase() {
  if (instance) {
    await instance.close();
    instance = null;
  }
}
