/**
 * What `npm run db:backup` and `npm run db:restore` share: PostgreSQL's own client tools (Debian's package,
 * installed when absent, like the server), how they are told where the database is (the password only
 * through PGPASSWORD in the child's environment, never on a command line, never printed), and the
 * questions asked of a database (which tables, how many rows, which migrations ran).
 */
import { existsSync, readdirSync } from 'node:fs';
import path from 'node:path';
import { spawnSync } from 'node:child_process';
import pg from 'pg';
import { aptInstall } from './run';
import { findPgBin, parseDatabaseUrl, portAnswers } from './postgres';
import { projectRoot } from './env-file';

/** Where backups go: ignored by git (.gitignore), readable by this user only. */
export const backupDir = path.join(projectRoot, 'backups');

/** A PostgreSQL client program from Debian's packages (/usr/lib/postgresql/<major>/bin), newest major first. */
function findPgTool(name: 'pg_dump' | 'pg_restore' | 'psql'): string | null {
  const base = '/usr/lib/postgresql';
  if (!existsSync(base)) return null;
  const majors = readdirSync(base).filter((v) => existsSync(path.join(base, v, 'bin', name))).sort((a, b) => Number(b) - Number(a));
  return majors[0] ? path.join(base, majors[0], 'bin', name) : null;
}

/**
 * The client program, installing Debian's client package when it is missing: the one of the server's major
 * version when the server is installed here (postgresql-client-15 beside postgresql-15), else the default one.
 */
export function pgTool(name: 'pg_dump' | 'pg_restore' | 'psql'): string {
  const found = findPgTool(name);
  if (found) return found;
  const serverBin = findPgBin();
  const major = serverBin ? path.basename(path.dirname(serverBin)) : null;
  aptInstall([major ? `postgresql-client-${major}` : 'postgresql-client']);
  const installed = findPgTool(name);
  if (!installed) throw new Error(`the PostgreSQL client was installed but no ${name} was found under /usr/lib/postgresql`);
  return installed;
}

interface Connection {
  /** The DATABASE_URL without its password: safe to pass as --dbname and to print. */
  urlWithoutPassword: string;
  /** The child's environment: PGPASSWORD from the URL (when it has one) and a connect timeout. */
  env: NodeJS.ProcessEnv;
  database: string;
  /** "127.0.0.1:54329", for messages. */
  where: string;
}

export function connectionFor(databaseUrl: string): Connection {
  const target = parseDatabaseUrl(databaseUrl);
  const u = new URL(databaseUrl);
  u.password = '';
  const env: NodeJS.ProcessEnv = { ...process.env, PGCONNECT_TIMEOUT: '10' };
  if (target.password) env.PGPASSWORD = target.password;
  return { urlWithoutPassword: u.toString(), env, database: target.database, where: `${target.host}:${target.port}` };
}

/** Fails with a plain sentence when nothing answers at the URL's host and port. */
export async function requireServer(databaseUrl: string): Promise<void> {
  const target = parseDatabaseUrl(databaseUrl);
  const host = target.host === 'localhost' ? '127.0.0.1' : target.host;
  if (!(await portAnswers(host, target.port, 3000))) {
    throw new Error(`PostgreSQL does not answer at ${host}:${target.port} (DATABASE_URL): start it first (\`npm run db:start\` runs the project's own server)`);
  }
}

interface ToolResult {
  ok: boolean;
  stdout: string;
  /** pg_dump's / pg_restore's / psql's own words, trimmed to their first lines. */
  error: string;
}

/** Runs a client program and keeps what it said; its output is read, not shown. */
export function runTool(tool: string, args: string[], env: NodeJS.ProcessEnv): ToolResult {
  const r = spawnSync(tool, args, { env, encoding: 'utf8', maxBuffer: 64 * 1024 * 1024 });
  const said = `${r.stderr ?? ''}${r.error ? String(r.error) : ''}`.trim().split('\n').filter(Boolean);
  const error = said.slice(0, 3).join('; ') + (said.length > 3 ? ` (and ${said.length - 3} more lines)` : '');
  const stopped = r.signal ? `stopped by ${r.signal}` : `exit code ${r.status}`;
  return { ok: r.status === 0, stdout: r.stdout ?? '', error: error || `${path.basename(tool)}: ${stopped}, nothing said` };
}

/** "512 B", "48.3 kB", "2.4 MB" (powers of 1000, as the units say). */
export function humanSize(bytes: number): string {
  const units = ['B', 'kB', 'MB', 'GB', 'TB'];
  let value = bytes;
  let unit = 0;
  while (value >= 1000 && unit < units.length - 1) {
    value /= 1000;
    unit++;
  }
  return unit === 0 ? `${bytes} B` : `${value.toFixed(1)} ${units[unit]}`;
}

/** 2026-12-03T02:09:08Z → "2026-12-03T02-09-08Z": sortable, and a valid file name everywhere. */
export function backupStamp(at: Date): string {
  return `${at.toISOString().slice(0, 19).replaceAll(':', '-')}Z`;
}

export function quoteIdent(name: string): string {
  return `"${name.replaceAll('"', '""')}"`;
}

/** Runs `work` with a client on the URL's database (or another one on the same server), closed afterwards. */
export async function withClient<T>(databaseUrl: string, work: (client: pg.Client) => Promise<T>, database?: string): Promise<T> {
  const u = new URL(databaseUrl);
  if (database) u.pathname = `/${encodeURIComponent(database)}`;
  const client = new pg.Client({ connectionString: u.toString(), connectionTimeoutMillis: 10_000 });
  await client.connect();
  try {
    return await work(client);
  } finally {
    await client.end();
  }
}

export interface TableCount {
  table: string;
  rows: number;
}

/** Every table of the public schema with its row count, by name. */
export async function tableCounts(client: pg.Client): Promise<TableCount[]> {
  const tables = (await client.query<{ name: string }>("SELECT tablename AS name FROM pg_tables WHERE schemaname = 'public' ORDER BY 1")).rows;
  const out: TableCount[] = [];
  for (const { name } of tables) {
    const r = await client.query<{ n: string }>(`SELECT count(*) AS n FROM public.${quoteIdent(name)}`);
    out.push({ table: name, rows: Number(r.rows[0]?.n ?? 0) });
  }
  return out;
}

/** The migrations recorded in umzug_meta (none when the table is absent). */
export async function executedMigrations(client: pg.Client): Promise<string[]> {
  const exists = await client.query("SELECT 1 FROM pg_tables WHERE schemaname = 'public' AND tablename = 'umzug_meta'");
  if (!exists.rowCount) return [];
  return (await client.query<{ name: string }>('SELECT name FROM public.umzug_meta ORDER BY name')).rows.map((r) => r.name);
}

export const plural = (n: number, one: string, many = `${one}s`) => `${n.toLocaleString('en-US')} ${n === 1 ? one : many}`;
