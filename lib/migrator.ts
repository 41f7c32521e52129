import type { Sequelize } from 'sequelize';
import { SequelizeStorage, Umzug } from 'umzug';
import { migrations } from '@/migrations';

/** The one umzug migrator: migrations from `migrations/` in file-name order, history (by name) in the `umzug_meta` table. */
export function createMigrator(sequelize: Sequelize, logger: Console | undefined = undefined) {
  return new Umzug({
    migrations: migrations.map((m) => ({ name: m.name, up: m.up, down: m.down })),
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'umzug_meta' }),
    logger,
  });
}
