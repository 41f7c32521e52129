/**
 * npm start — from a fresh clone: npm packages (bootstrap.mjs), Debian's postgresql if absent,
 * PostgreSQL on loopback with its data in .data/, migrations, the invented demo, the mail
 * catcher, the production build, and the app on http://127.0.0.1:$PORT. Safe to run twice.
 */
import './lib/load-env';
import { ensureSecret, loadLocalEnv } from './lib/env-file';
import { ensurePostgres, portAnswers } from './lib/postgres';
import { migrate } from './lib/database';
import { buildIfNeeded } from './lib/build';
import { serveApp } from './lib/serve';

async function main() {
  ensureSecret();
  loadLocalEnv();
  const { config } = await import('../lib/config');
  const { DEMO_PASSWORD, DEMO_USERS, seedDemo } = await import('./seed');
  // Settings the server reads per request, checked here: a mistyped value stops npm start with its name, never a 500.
  const { readApiLimits } = await import('../lib/api-limits');
  const { readTrustedProxies } = await import('../lib/client-address');
  readApiLimits();
  readTrustedProxies();

  if (await portAnswers('127.0.0.1', config.port)) {
    console.log(`• something already answers on port ${config.port}; if it is Seamline, it is at ${config.appUrl}`);
    console.log(`  (to run a second copy, set another PORT and DATABASE_URL)`);
    return;
  }
  await ensurePostgres(config.databaseUrl);
  const migrated = await migrate(config.databaseUrl);
  console.log(migrated.length ? `• migrated: ${migrated.length} migration(s)` : '• migrations: up to date');
  console.log(`• demo: ${await seedDemo()}`);

  const smtp = new URL(config.smtpUrl);
  if (['127.0.0.1', 'localhost'].includes(smtp.hostname)) {
    if (await portAnswers('127.0.0.1', Number(smtp.port))) console.log(`• a mail catcher already listens on ${config.smtpUrl}`);
    else {
      const { startMailCatcher } = await import('./mail-catcher');
      await startMailCatcher();
      console.log(`• mail catcher on ${config.smtpUrl} (messages at ${config.appUrl}/dev/mailbox)`);
    }
  }

  buildIfNeeded();
  const env = { ...process.env, NEXTAUTH_URL: config.appUrl, APP_URL: config.appUrl, SEAMLINE_DEV_MAILBOX: '1' };
  const child = await serveApp(config.port, env);
  console.log('');
  console.log(`  Seamline is running at ${config.appUrl}`);
  console.log(`  Demo sign-in: ${DEMO_USERS.owner.email} / ${DEMO_PASSWORD}  (also ${DEMO_USERS.viewer.email}, ${DEMO_USERS.other.email}, ${DEMO_USERS.admin.email}; same password)`);
  console.log(`  Dev mailbox: ${config.appUrl}/dev/mailbox   Stop: Ctrl+C (the database keeps running; npm run db:stop stops it)`);
  console.log('');
  const stop = () => child.kill('SIGTERM');
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
  await new Promise<void>((resolve) => child.once('exit', () => resolve()));
  process.exit(0);
}

main().catch((e) => {
  console.error(`npm start failed: ${e instanceof Error ? e.message : e}`);
  process.exit(1);
});
