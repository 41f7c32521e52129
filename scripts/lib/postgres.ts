import { existsSync, mkdirSync, readdirSync, rmSync, writeFileSync, chmodSync } from 'node:fs';
import net from 'node:net';
import path from 'node:path';
import { aptInstall, capture, isRoot, run } from './run';
import { projectRoot } from './env-file';

export interface DatabaseTarget {
  host: string;
  port: number;
  user: string;
  password: string;
  database: string;
}

export function parseDatabaseUrl(url: string): DatabaseTarget {
  const u = new URL(url);
  return {
    host: u.hostname,
    port: Number(u.port || 5432),
    user: decodeURIComponent(u.username),
    password: decodeURIComponent(u.password),
    database: u.pathname.replace(/^\//, ''),
  };
}

export const isLoopback = (host: string) => ['127.0.0.1', 'localhost', '::1'].includes(host);

export function portAnswers(host: string, port: number, timeoutMs = 800): Promise<boolean> {
  return new Promise((resolve) => {
    const socket = net.connect({ host, port });
    const done = (ok: boolean) => {
      socket.destroy();
      resolve(ok);
    };
    socket.setTimeout(timeoutMs, () => done(false));
    socket.once('connect', () => done(true));
    socket.once('error', () => done(false));
  });
}

/** Finds Debian's PostgreSQL binaries, newest major version first (15 on Debian 12). */
export function findPgBin(): string | null {
  const base = '/usr/lib/postgresql';
  if (!existsSync(base)) return null;
  const versions = readdirSync(base).filter((v) => existsSync(path.join(base, v, 'bin', 'pg_ctl'))).sort((a, b) => Number(b) - Number(a));
  return versions[0] ? path.join(base, versions[0], 'bin') : null;
}

export function dataDirFor(port: number, kind = 'pg'): string {
  return path.join(projectRoot, '.data', `${kind}-${port}`);
}

/** Runs a PostgreSQL binary as the postgres user when we are root (initdb and postgres refuse root). */
function asPostgres(bin: string, args: string[]): void {
  if (isRoot) run('runuser', ['-u', 'postgres', '--', bin, ...args]);
  else run(bin, args);
}

/** The postgres options our servers run with (also used to restart one, e.g. in the fault test). */
export function serverOptions(host: string, port: number, dataDir: string): string {
  return `-c listen_addresses=${host} -c port=${port} -c unix_socket_directories='${dataDir}' -c max_connections=200`;
}

function quoteIdent(s: string) {
  return `"${s.replace(/"/g, '""')}"`;
}
function quoteLiteral(s: string) {
  return `'${s.replace(/'/g, "''")}'`;
}

/**
 * Makes sure a PostgreSQL server answers at the DATABASE_URL's loopback host and port, with the
 * role and database it names. Idempotent: a server that already answers is left alone (only the
 * role and database are checked when the server is ours).
 */
export async function ensurePostgres(databaseUrl: string, options: { dataDir?: string; quiet?: boolean } = {}): Promise<void> {
  const target = parseDatabaseUrl(databaseUrl);
  const log = options.quiet ? () => {} : (s: string) => console.log(s);
  if (!isLoopback(target.host)) {
    log(`• DATABASE_URL points at ${target.host}; using that server as it is`);
    return;
  }
  const dataDir = options.dataDir ?? dataDirFor(target.port);
  const host = target.host === 'localhost' ? '127.0.0.1' : target.host;

  if (await portAnswers(host, target.port)) {
    if (existsSync(path.join(dataDir, 'PG_VERSION'))) await ensureRoleAndDatabase(target, dataDir);
    log(`• PostgreSQL answers on ${host}:${target.port}`);
    return;
  }

  let bin = findPgBin();
  if (!bin) {
    aptInstall(['postgresql']);
    bin = findPgBin();
    if (!bin) throw new Error('postgresql was installed but no pg_ctl was found under /usr/lib/postgresql');
  }
  // Debian's package starts its own cluster on 5432; we never use or touch it.

  if (!existsSync(path.join(dataDir, 'PG_VERSION'))) {
    log(`• initdb into ${path.relative(projectRoot, dataDir)}`);
    rmSync(dataDir, { recursive: true, force: true });
    mkdirSync(dataDir, { recursive: true });
    if (isRoot) run('chown', ['postgres:postgres', dataDir]);
    chmodSync(dataDir, 0o700);
    asPostgres(path.join(bin, 'initdb'), ['-D', dataDir, '-U', 'postgres', '--auth-local=trust', '--auth-host=scram-sha-256', '-E', 'UTF8', '--locale=C.UTF-8']);
  }
  const logFile = path.join(dataDir, 'server.log');
  log(`• starting PostgreSQL on ${host}:${target.port}`);
  asPostgres(path.join(bin, 'pg_ctl'), [
    '-D', dataDir, '-l', logFile, '-w', '-t', '60', 'start',
    '-o', serverOptions(host, target.port, dataDir),
  ]);
  await ensureRoleAndDatabase(target, dataDir);
}

function psqlAsSuperuser(target: DatabaseTarget, dataDir: string, sql: string, database = 'postgres'): string | null {
  const bin = findPgBin();
  const psql = bin ? path.join(bin, 'psql') : 'psql';
  const args = ['-h', dataDir, '-p', String(target.port), '-U', 'postgres', '-d', database, '-tAX', '-v', 'ON_ERROR_STOP=1', '-c', sql];
  return isRoot ? capture('runuser', ['-u', 'postgres', '--', psql, ...args]) : capture(psql, args);
}

async function ensureRoleAndDatabase(target: DatabaseTarget, dataDir: string): Promise<void> {
  const roleExists = psqlAsSuperuser(target, dataDir, `SELECT 1 FROM pg_roles WHERE rolname = ${quoteLiteral(target.user)}`);
  if (roleExists === null) throw new Error(`cannot reach the PostgreSQL server in ${dataDir} as postgres`);
  if (roleExists.trim() !== '1') {
    psqlAsSuperuser(target, dataDir, `CREATE ROLE ${quoteIdent(target.user)} LOGIN PASSWORD ${quoteLiteral(target.password)} CREATEDB`);
  }
  const dbExists = psqlAsSuperuser(target, dataDir, `SELECT 1 FROM pg_database WHERE datname = ${quoteLiteral(target.database)}`);
  if (dbExists?.trim() !== '1') {
    psqlAsSuperuser(target, dataDir, `CREATE DATABASE ${quoteIdent(target.database)} OWNER ${quoteIdent(target.user)}`);
  }
}

/** Stops the project's own server for this DATABASE_URL (if it is running). */
export function stopPostgres(databaseUrl: string, options: { dataDir?: string; remove?: boolean } = {}): void {
  const target = parseDatabaseUrl(databaseUrl);
  const dataDir = options.dataDir ?? dataDirFor(target.port);
  const bin = findPgBin();
  if (bin && existsSync(path.join(dataDir, 'postmaster.pid'))) {
    try {
      asPostgres(path.join(bin, 'pg_ctl'), ['-D', dataDir, '-m', 'fast', '-w', 'stop']);
    } catch (e) {
      console.error(String(e));
    }
  }
  if (options.remove) rmSync(dataDir, { recursive: true, force: true });
}

export function writeFileSafe(file: string, text: string) {
  mkdirSync(path.dirname(file), { recursive: true });
  writeFileSync(file, text);
}
