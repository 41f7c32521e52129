/**
 * npm run db:backup — the database in DATABASE_URL, dumped by PostgreSQL's own pg_dump in its custom format into
 * backups/seamline-<database>-<UTC yyyy-mm-ddThh-mm-ssZ>.dump, and its path and size printed.
 *
 * Consistent by nature: pg_dump reads every table in one transaction, from one snapshot, so the file is the
 * database as it stood at one instant even while the app keeps writing. The file is written under a hidden
 * temporary name, flushed to disk and only then renamed: a file under the final name is always a whole one.
 * It holds personal data (e-mail addresses, password hashes): it is made readable by this user only.
 */
import './lib/load-env';
import { chmodSync, closeSync, existsSync, fsyncSync, mkdirSync, openSync, renameSync, rmSync, statSync } from 'node:fs';
import path from 'node:path';
import { backupDir, backupStamp, connectionFor, humanSize, pgTool, requireServer, runTool } from './lib/backup';

/** The path as the user would type it from here: relative when inside the current folder. */
function shown(file: string): string {
  const relative = path.relative(process.cwd(), file);
  return relative.startsWith('..') || path.isAbsolute(relative) ? file : relative;
}

async function main() {
  if (process.argv.length > 2) {
    console.error('usage: npm run db:backup   (backs up the database in DATABASE_URL; takes no arguments)');
    process.exit(2);
  }
  const { config } = await import('../lib/config');
  const databaseUrl = config.databaseUrl;
  const connection = connectionFor(databaseUrl);
  await requireServer(databaseUrl);
  const pgDump = pgTool('pg_dump');

  mkdirSync(backupDir, { recursive: true, mode: 0o700 });
  const name = `seamline-${connection.database}-${backupStamp(new Date())}.dump`;
  const file = path.join(backupDir, name);
  if (existsSync(file)) throw new Error(`${shown(file)} already exists (backups are named by the second): run it again`);
  const partial = path.join(backupDir, `.${name}.partial`);
  closeSync(openSync(partial, 'w', 0o600));
  try {
    const result = runTool(pgDump, ['--format=custom', `--file=${partial}`, '--no-password', `--dbname=${connection.urlWithoutPassword}`], connection.env);
    if (!result.ok) throw new Error(`pg_dump could not back up ${connection.database} at ${connection.where}: ${result.error}`);
    const fd = openSync(partial, 'r');
    fsyncSync(fd);
    closeSync(fd);
    chmodSync(partial, 0o600);
    renameSync(partial, file);
  } finally {
    rmSync(partial, { force: true });
  }
  console.log(`• backup of ${connection.database} at ${connection.where} (one consistent snapshot): ${shown(file)} (${humanSize(statSync(file).size)})`);
}

main().then(
  () => process.exit(0),
  (e) => {
    console.error(e instanceof Error ? e.message : e);
    process.exit(1);
  },
);
