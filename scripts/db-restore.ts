/**
 * npm run db:restore -- FILE [--replace] — puts a backup made by `npm run db:backup` into the database in
 * DATABASE_URL.
 *
 * 1. The file is read whole before anything is touched: `pg_restore --list` reads its table of contents and
 *    `pg_restore --file=…` reads every data block (a damaged or truncated file fails here), turning it into the
 *    SQL that is run; it must hold a Seamline database (the `umzug_meta` migration table). Otherwise: refused,
 *    "nothing was changed", exit code 1.
 * 2. The target must be empty: no table and no enum type in its public schema (a migrated database with no rows
 *    is not empty: its tables would collide with the backup's). A database that does not exist is created empty.
 *    `--replace` drops what is there, after printing each table and its row count.
 * 3. One transaction: psql runs the drops (with --replace) and the backup's SQL with --single-transaction and
 *    ON_ERROR_STOP, so a failure anywhere leaves the database as it was. (psql rather than pg_restore's own
 *    --single-transaction because --replace must also drop tables a newer migration added, which the backup
 *    knows nothing of and pg_restore --clean would leave beside an older migration history.)
 * 4. Prints the tables and rows restored and the migration level; a backup older than this Seamline is brought
 *    up to date at once by running the pending migrations (as `npm start` would on its next start), a backup made
 *    by a newer Seamline is reported and left alone.
 */
import './lib/load-env';
import { existsSync, mkdtempSync, rmSync, statSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type pg from 'pg';
import { migrations } from '../migrations';
import { migrate } from './lib/database';
import { connectionFor, executedMigrations, pgTool, plural, quoteIdent, requireServer, runTool, tableCounts, withClient, type TableCount } from './lib/backup';

const USAGE = 'usage: npm run db:restore -- FILE [--replace]   (into the database in DATABASE_URL; --replace drops what it holds first)';

function parseArgs(args: string[]): { file: string; replace: boolean } | null {
  const files = args.filter((a) => !a.startsWith('--'));
  const flags = args.filter((a) => a.startsWith('--'));
  if (files.length !== 1 || flags.some((f) => f !== '--replace')) return null;
  return { file: files[0]!, replace: flags.includes('--replace') };
}

/** The tables an archive's table of contents creates ("229; 1259 24581 TABLE public users seamline"). */
function archiveTables(list: string): string[] {
  return [...list.matchAll(/^\d+; \d+ \d+ TABLE public (\S+) /gm)].map((m) => m[1]!);
}

/** The file is a whole pg_dump archive of a Seamline database: its SQL written to `sqlFile`, or refused. */
function readBackup(file: string, shown: string, sqlFile: string, replace: boolean, env: NodeJS.ProcessEnv): string[] {
  if (!existsSync(file) || !statSync(file).isFile()) throw new Error(`${shown} does not exist or is not a file: nothing was changed`);
  const pgRestore = pgTool('pg_restore');
  const notWhole = (why: string) => new Error(`${shown} is not a complete Seamline backup (${why}): nothing was changed`);
  const list = runTool(pgRestore, ['--list', file], env);
  if (!list.ok) throw notWhole(list.error);
  const sql = runTool(pgRestore, ['--no-owner', ...(replace ? ['--clean', '--if-exists'] : []), `--file=${sqlFile}`, file], env);
  if (!sql.ok) throw notWhole(sql.error);
  const tables = archiveTables(list.stdout);
  if (!tables.includes('umzug_meta')) throw notWhole(`a pg_dump archive, but of no Seamline database: it has no umzug_meta table (tables: ${tables.join(', ') || 'none'})`);
  return tables;
}

interface Present {
  tables: TableCount[];
  types: string[];
}

async function present(client: pg.Client): Promise<Present> {
  const types = await client.query<{ name: string }>(
    "SELECT t.typname AS name FROM pg_type t JOIN pg_namespace n ON n.oid = t.typnamespace WHERE n.nspname = 'public' AND t.typtype IN ('e', 'd') ORDER BY 1",
  );
  return { tables: await tableCounts(client), types: types.rows.map((r) => r.name) };
}

/** Connects to the target, creating it (empty, owned by the URL's role) when it does not exist. */
async function openTarget(databaseUrl: string, database: string): Promise<Present> {
  try {
    return await withClient(databaseUrl, present);
  } catch (e) {
    if ((e as { code?: string }).code !== '3D000') throw e; // 3D000: no such database
  }
  await withClient(databaseUrl, (c) => c.query(`CREATE DATABASE ${quoteIdent(database)}`), 'postgres');
  console.log(`• created the empty database ${database}`);
  return withClient(databaseUrl, present);
}

function describeRows(tables: TableCount[]): string {
  return `${plural(tables.length, 'table')}, ${plural(tables.reduce((s, t) => s + t.rows, 0), 'row')}`;
}

function printTables(tables: TableCount[]): void {
  const width = Math.max(0, ...tables.map((t) => t.table.length));
  const digits = Math.max(0, ...tables.map((t) => t.rows.toLocaleString('en-US').length));
  for (const t of tables) console.log(`    ${t.table.padEnd(width)}  ${t.rows.toLocaleString('en-US').padStart(digits)} ${t.rows === 1 ? 'row' : 'rows'}`);
}

/** With --replace: drops every table and enum type of the public schema (run inside the restore's transaction). */
function dropStatements(now: Present): string {
  const lines: string[] = [];
  if (now.tables.length) lines.push(`DROP TABLE IF EXISTS ${now.tables.map((t) => `public.${quoteIdent(t.table)}`).join(', ')} CASCADE;`);
  if (now.types.length) lines.push(`DROP TYPE IF EXISTS ${now.types.map((t) => `public.${quoteIdent(t)}`).join(', ')} CASCADE;`);
  return `${lines.join('\n')}\n`;
}

/** After the restore: the migration level, and the pending migrations run when the backup is older than this code. */
async function bringUpToDate(databaseUrl: string): Promise<void> {
  const known = migrations.map((m) => m.name).sort();
  const executed = await withClient(databaseUrl, executedMigrations);
  const unknown = executed.filter((name) => !known.includes(name));
  const pending = known.filter((name) => !executed.includes(name));
  console.log(`• migration level: ${executed.length} of the ${known.length} migrations this Seamline has${executed.length ? ` (last: ${executed.at(-1)})` : ''}`);
  if (unknown.length) {
    console.warn(`! this backup was made by a newer Seamline: it has migrations this copy does not know (${unknown.join(', ')}). Update Seamline before starting the app on it; nothing was migrated.`);
    return;
  }
  if (!pending.length) {
    console.log('• migrations: up to date');
    return;
  }
  console.log(`• the backup is older than this Seamline: running the ${plural(pending.length, 'newer migration')}`);
  try {
    const done = await migrate(databaseUrl);
    console.log(`• migrated: ${done.join(', ')}`);
  } catch (e) {
    throw new Error(`the backup was restored, but migrating it failed (${e instanceof Error ? e.message : e}); fix the cause and run \`npm run db:migrate\``);
  }
}

async function main() {
  const options = parseArgs(process.argv.slice(2));
  if (!options) {
    console.error(USAGE);
    process.exit(2);
  }
  const { config } = await import('../lib/config');
  const databaseUrl = config.databaseUrl;
  const connection = connectionFor(databaseUrl);
  const file = path.resolve(options.file);
  const work = mkdtempSync(path.join(os.tmpdir(), 'seamline-restore-')); // 0700: the SQL holds personal data
  try {
    const sqlFile = path.join(work, 'backup.sql');
    const backupTables = readBackup(file, options.file, sqlFile, options.replace, connection.env);
    await requireServer(databaseUrl);
    const psql = pgTool('psql');
    const target = `${connection.database} at ${connection.where}`;
    const now = await openTarget(databaseUrl, connection.database);
    const empty = !now.tables.length && !now.types.length;
    if (!empty && !options.replace) {
      throw new Error(
        `${target} is not empty (${describeRows(now.tables)}${now.types.length ? `, ${plural(now.types.length, 'enum type')}` : ''}): nothing was changed. ` +
          'Restore into an empty database (point DATABASE_URL at a new name), or add --replace to drop what it holds first.',
      );
    }
    const dropFile = path.join(work, 'drop.sql');
    writeFileSync(dropFile, options.replace && !empty ? dropStatements(now) : '');
    if (options.replace && !empty) {
      console.log(`• --replace: dropping what ${target} holds now (${describeRows(now.tables)}${now.types.length ? ` and ${plural(now.types.length, 'enum type')}` : ''}):`);
      printTables(now.tables);
    }
    console.log(`• restoring ${options.file} (${plural(backupTables.length, 'table')}) into ${target} in one transaction`);
    const result = runTool(psql, ['--no-psqlrc', '--quiet', '--no-password', '--single-transaction', '--set=ON_ERROR_STOP=1', `--dbname=${connection.urlWithoutPassword}`, '--file', dropFile, '--file', sqlFile], connection.env);
    if (!result.ok) throw new Error(`the restore into ${target} failed and was rolled back: nothing was changed (${result.error})`);
    const after = await withClient(databaseUrl, tableCounts);
    console.log(`• restored ${describeRows(after)}:`);
    printTables(after);
    await bringUpToDate(databaseUrl);
  } finally {
    rmSync(work, { recursive: true, force: true });
  }
}

main().then(
  () => process.exit(0),
  (e) => {
    console.error(e instanceof Error ? e.message : e);
    process.exit(1);
  },
);
