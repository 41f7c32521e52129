import { spawnSync } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createSequelize } from '@/lib/db';
import { createMigrator } from '@/lib/migrator';
import { migrate } from '../../scripts/lib/database';
import { requireEnv } from '../helpers/env';
import { tableStates } from '../helpers/table-states';

/**
 * Backups (issue 19): the real `npm run db:backup` and `npm run db:restore` scripts, run as the user runs them,
 * against real PostgreSQL. Never the database the app uses: scratch databases on the same server, made here
 * (migrated, seeded with the invented demo, plus awkward rows of our own) and dropped afterwards, also on failure.
 * The oracle is every table's row count and an md5 of its rows, taken before the backup and after each restore.
 */

const root = path.resolve(__dirname, '..', '..');
const tsx = path.join(root, 'node_modules', '.bin', 'tsx');
const mark = `${process.pid}_${randomBytes(3).toString('hex')}`;
const SCRATCH = `seamline_backup_${mark}`;
const OLDER = `seamline_backup_older_${mark}`;
/** The migration files (index.ts and types.ts aside): the level a database restored by this code must reach. */
const migrationFiles = readdirSync(path.join(root, 'migrations'))
  .filter((f) => f.endsWith('.ts') && f !== 'index.ts' && f !== 'types.ts')
  .map((f) => f.slice(0, -'.ts'.length))
  .sort();

const mainUrl = () => requireEnv('DATABASE_URL');
function urlOf(database: string): string {
  const u = new URL(mainUrl());
  u.pathname = `/${database}`;
  return u.toString();
}

/** One statement on a database of the test server (the app's own only to create and drop the scratch ones). */
async function sql(database: string | null, text: string, values: unknown[] = []): Promise<void> {
  const client = new pg.Client({ connectionString: database ? urlOf(database) : mainUrl() });
  await client.connect();
  try {
    await client.query(text, values);
  } finally {
    await client.end();
  }
}
const dropDatabase = (name: string) => sql(null, `DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`);

/** Row count and checksum of every table of a scratch database, by table. */
async function sums(database: string): Promise<Record<string, { count: number; checksum: string }>> {
  const sequelize = createSequelize(urlOf(database));
  try {
    const states = await tableStates(sequelize);
    return Object.fromEntries([...states].map(([table, s]) => [table, { count: s.count, checksum: s.checksum }]));
  } finally {
    await sequelize.close();
  }
}

/** The real script, in its own process, with DATABASE_URL naming the scratch database. */
function script(name: 'db-backup' | 'db-restore', database: string, args: string[] = []) {
  const r = spawnSync(tsx, [path.join('scripts', `${name}.ts`), ...args], { cwd: root, env: { ...process.env, DATABASE_URL: urlOf(database) }, encoding: 'utf8', timeout: 60_000 });
  return { status: r.status, stdout: r.stdout, stderr: r.stderr, said: `${r.stdout}\n${r.stderr}` };
}

const made: string[] = [];
/** Runs db:backup and returns the file it printed (checked: under backups/, named by the database and the UTC second). */
function backup(database: string, startedMs: number): { file: string; shown: string; sizeText: string } {
  const r = script('db-backup', database);
  expect(r.status, r.said).toBe(0);
  const m = new RegExp(`(backups/seamline-${database}-(\\d{4}-\\d{2}-\\d{2})T(\\d{2})-(\\d{2})-(\\d{2})Z\\.dump) \\(([\\d.]+ [kMG]?B)\\)`).exec(r.stdout);
  expect(m, r.said).not.toBeNull();
  const [, shown, day, hh, mm, ss, sizeText] = m!;
  const stampMs = Date.parse(`${day}T${hh}:${mm}:${ss}Z`);
  expect(stampMs).toBeGreaterThanOrEqual(Math.floor(startedMs / 1000) * 1000);
  expect(stampMs).toBeLessThanOrEqual(Date.now());
  const file = path.join(root, shown!);
  made.push(file);
  return { file, shown: shown!, sizeText: sizeText! };
}

describe('npm run db:backup and db:restore', () => {
  const savedUrl = process.env.DATABASE_URL;
  let original: Record<string, { count: number; checksum: string }> = {};
  let dump = { file: '', shown: '', sizeText: '' };
  const work = mkdtempSync(path.join(os.tmpdir(), 'seamline-backup-test-'));

  beforeAll(async () => {
    await dropDatabase(SCRATCH);
    await sql(null, `CREATE DATABASE "${SCRATCH}"`);
    await migrate(urlOf(SCRATCH));
    // seedDemo and the data layer use the process's one pool on DATABASE_URL (read when first used): the scratch one.
    process.env.DATABASE_URL = urlOf(SCRATCH);
    const { seedDemo } = await import('../../scripts/seed');
    const { createUserWithWorkspace } = await import('@/lib/data/users');
    const { getSequelize } = await import('@/lib/db');
    try {
      await seedDemo();
      // Rows of our own, with what a dump must carry exactly: quotes, backslashes, tabs, newlines, non-ASCII, NULL.
      await createUserWithWorkspace({ email: `backup-${mark}@example.test`, name: `Odile "Q" O'Varra \\ Ævrin–Łoszt 🎚`, password: 'a-long-password-1' });
      await sql(SCRATCH, 'INSERT INTO dev_messages (id, mail_from, mail_to, subject, text, created_at) VALUES (gen_random_uuid(), $1, $2, $3, $4, now())', [
        'Seamline <no-reply@seamline.test>',
        `backup-${mark}@example.test`,
        'Invented\tsubject',
        'line one\nline two\r\n\\N is not null\n\\.\nend',
      ]);
      await sql(SCRATCH, 'INSERT INTO rate_limits (key, points, expire) VALUES ($1, 3, NULL)', [`backup-${mark}`]);
    } finally {
      process.env.DATABASE_URL = savedUrl;
      await getSequelize().close();
    }
    original = await sums(SCRATCH);
  }, 120_000);

  afterAll(async () => {
    process.env.DATABASE_URL = savedUrl;
    for (const name of [SCRATCH, OLDER]) await dropDatabase(name).catch((e) => console.error(`could not drop ${name}: ${e}`));
    for (const file of made) rmSync(file, { force: true });
    rmSync(work, { recursive: true, force: true });
  }, 60_000);

  it('the scratch database holds the demo and our awkward rows in every table the migrations make', () => {
    expect(original.umzug_meta?.count).toBe(migrationFiles.length);
    for (const table of ['users', 'workspaces', 'memberships', 'systems', 'system_revisions', 'measurements', 'speaker_profiles', 'lessons', 'lesson_steps', 'dev_messages', 'rate_limits']) {
      expect(original[table]?.count, table).toBeGreaterThan(0);
    }
  });

  it('db:backup writes a whole custom-format dump under backups/, readable by its owner only, and prints its path and size', () => {
    const started = Date.now();
    dump = backup(SCRATCH, started);
    const bytes = readFileSync(dump.file);
    // pg_dump's custom format begins with the magic "PGDMP" (from memory); the restores below prove the rest.
    expect(bytes.subarray(0, 5).toString('latin1')).toBe('PGDMP');
    expect(statSync(dump.file).mode & 0o777).toBe(0o600);
    const [value, unit] = dump.sizeText.split(' ');
    const factor = { B: 1, kB: 1e3, MB: 1e6, GB: 1e9 }[unit as 'B' | 'kB' | 'MB' | 'GB'];
    expect(Math.abs(Number(value) * factor - bytes.length)).toBeLessThanOrEqual(factor === 1 ? 0 : 0.05 * factor);
    expect(readdirSync(path.dirname(dump.file)).filter((f) => f.includes(SCRATCH) && f.endsWith('.partial')), 'no temporary file left').toEqual([]);
  });

  it('drop the database, restore into a new empty one: every table has the same rows (count and checksum)', async () => {
    await dropDatabase(SCRATCH);
    await sql(null, `CREATE DATABASE "${SCRATCH}"`);
    const r = script('db-restore', SCRATCH, [dump.shown]);
    expect(r.status, r.said).toBe(0);
    expect(await sums(SCRATCH)).toEqual(original);
    const rows = Object.values(original).reduce((s, t) => s + t.count, 0);
    expect(r.stdout).toContain(`restored ${Object.keys(original).length} tables, ${rows.toLocaleString('en-US')} rows`);
    expect(r.stdout).toContain(`migration level: ${migrationFiles.length} of the ${migrationFiles.length} migrations`);
    expect(r.stdout).toContain('migrations: up to date');
  }, 60_000);

  it('refuses a database that is not empty unless told --replace, and changes nothing', async () => {
    await sql(SCRATCH, "UPDATE workspaces SET name = name || ' (changed after the backup)'");
    await sql(SCRATCH, 'CREATE TABLE newer_feature (id int PRIMARY KEY)');
    await sql(SCRATCH, 'INSERT INTO newer_feature VALUES (1)');
    const before = await sums(SCRATCH);
    expect(before).not.toEqual(original);
    const r = script('db-restore', SCRATCH, [dump.shown]);
    expect(r.status, r.said).toBe(1);
    expect(r.stderr).toMatch(new RegExp(`${SCRATCH} at .* is not empty \\(${Object.keys(before).length} tables, .*\\): nothing was changed\\..*--replace`));
    expect(await sums(SCRATCH)).toEqual(before);
  }, 60_000);

  it('--replace prints each table it drops with its row count, then gives back exactly the backup (a newer table gone too)', async () => {
    const before = await sums(SCRATCH);
    const r = script('db-restore', SCRATCH, [dump.shown, '--replace']);
    expect(r.status, r.said).toBe(0);
    const dropping = r.stdout.slice(0, r.stdout.indexOf('• restoring'));
    for (const [table, s] of Object.entries(before)) expect(dropping, table).toMatch(new RegExp(`\\n\\s+${table}\\s+${s.count.toLocaleString('en-US')} rows?\\n`));
    expect(await sums(SCRATCH)).toEqual(original);
  }, 60_000);

  it('a truncated copy, random bytes and a damaged middle are refused with a clear message, and the data is untouched', async () => {
    const whole = readFileSync(dump.file);
    const damaged = Buffer.from(whole);
    for (let i = Math.floor(whole.length / 2); i < Math.floor(whole.length / 2) + 64; i++) damaged[i] = damaged[i]! ^ 0x5a;
    const bad = {
      'truncated.dump': whole.subarray(0, Math.floor(whole.length / 2)),
      'random.dump': randomBytes(whole.length),
      'damaged.dump': damaged,
    };
    for (const [name, bytes] of Object.entries(bad)) {
      const file = path.join(work, name);
      writeFileSync(file, bytes);
      const r = script('db-restore', SCRATCH, [file, '--replace']);
      expect(r.status, `${name}: ${r.said}`).toBe(1);
      expect(r.stderr, name).toContain(`${file} is not a complete Seamline backup (pg_restore: `);
      expect(r.stderr, name).toContain('): nothing was changed');
      expect(r.stdout, name).not.toContain('dropping');
      expect(await sums(SCRATCH), name).toEqual(original);
    }
    expect(existsSync(dump.file)).toBe(true);
  }, 60_000);

  it('a backup one migration behind is restored into a database it creates, then brought up to date', async () => {
    await dropDatabase(OLDER);
    await sql(null, `CREATE DATABASE "${OLDER}"`);
    const sequelize = createSequelize(urlOf(OLDER));
    try {
      await createMigrator(sequelize).up({ to: migrationFiles.at(-2)! });
    } finally {
      await sequelize.close();
    }
    const older = backup(OLDER, Date.now());
    await dropDatabase(OLDER);
    const r = script('db-restore', OLDER, [older.shown]);
    expect(r.status, r.said).toBe(0);
    expect(r.stdout).toContain(`created the empty database ${OLDER}`);
    expect(r.stdout).toContain(`migration level: ${migrationFiles.length - 1} of the ${migrationFiles.length} migrations`);
    expect(r.stdout).toContain(`migrated: ${migrationFiles.at(-1)}`);
    const level = await sums(OLDER);
    expect(level.umzug_meta?.count).toBe(migrationFiles.length);
  }, 60_000);
});
