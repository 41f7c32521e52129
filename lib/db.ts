import pg from 'pg';
import { Sequelize } from 'sequelize';
import { config } from './config';
import { initModels } from '@/models';

/**
 * The one Sequelize instance of this process, cached on globalThis so that development
 * reloads do not open a new pool each time. Models are registered on first use.
 */
const globalForDb = globalThis as unknown as { seamlineSequelize?: Sequelize };

export function createSequelize(databaseUrl: string = config.databaseUrl): Sequelize {
  const sequelize = new Sequelize(databaseUrl, {
    dialect: 'postgres',
    dialectModule: pg,
    logging: false,
    pool: { max: 10, min: 0, idle: 10_000, acquire: 8_000 },
    dialectOptions: { connectionTimeoutMillis: 3_000, statement_timeout: 15_000 },
  });
  initModels(sequelize);
  return sequelize;
}

export function getSequelize(): Sequelize {
  if (!globalForDb.seamlineSequelize) {
    globalForDb.seamlineSequelize = createSequelize();
  }
  // The pool is shared process-wide; this module's copy of the models is registered on it.
  initModels(globalForDb.seamlineSequelize);
  return globalForDb.seamlineSequelize;
}

/** Models are usable once this has run; every data module calls it first. */
export function db(): Sequelize {
  return getSequelize();
}
