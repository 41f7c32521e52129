import { createSequelize } from '../../lib/db';
import { createMigrator } from '../../lib/migrator';

export async function migrate(databaseUrl: string, direction: 'up' | 'down-all' = 'up'): Promise<string[]> {
  const sequelize = createSequelize(databaseUrl);
  try {
    const migrator = createMigrator(sequelize);
    if (direction === 'down-all') {
      const done = await migrator.down({ to: 0 });
      return done.map((m) => m.name);
    }
    const done = await migrator.up();
    return done.map((m) => m.name);
  } finally {
    await sequelize.close();
  }
}
