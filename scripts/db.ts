/**
 * npm run db:start | db:stop | db:migrate | db:seed | db:reset
 * PostgreSQL on loopback in .data/, migrations by umzug, the invented demo.
 */
import { ensureSecret, loadLocalEnv } from './lib/env-file';
import './lib/load-env';
import { ensurePostgres, stopPostgres } from './lib/postgres';
import { migrate } from './lib/database';

async function main() {
  loadLocalEnv();
  const { config } = await import('../lib/config');
  const command = process.argv[2];
  switch (command) {
    case 'start':
      await ensurePostgres(config.databaseUrl);
      break;
    case 'stop':
      stopPostgres(config.databaseUrl);
      console.log('• PostgreSQL stopped');
      break;
    case 'migrate': {
      await ensurePostgres(config.databaseUrl);
      const done = await migrate(config.databaseUrl);
      console.log(done.length ? `• migrated: ${done.join(', ')}` : '• migrations: up to date');
      break;
    }
    case 'down': {
      const done = await migrate(config.databaseUrl, 'down-all');
      console.log(`• reverted: ${done.join(', ') || 'nothing'}`);
      break;
    }
    case 'seed': {
      ensureSecret();
      await ensurePostgres(config.databaseUrl);
      await migrate(config.databaseUrl);
      const { seedDemo } = await import('./seed');
      const summary = await seedDemo();
      console.log(`• demo: ${summary}`);
      break;
    }
    default:
      console.error('usage: tsx scripts/db.ts start|stop|migrate|down|seed');
      process.exit(2);
  }
}

main().then(
  () => process.exit(0),
  (e) => {
    console.error(e instanceof Error ? e.message : e);
    process.exit(1);
  },
);
