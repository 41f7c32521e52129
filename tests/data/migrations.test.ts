import { readdirSync } from 'node:fs';
import { afterAll, describe, expect, it } from 'vitest';
import { createSequelize } from '@/lib/db';
import { createMigrator } from '@/lib/migrator';
import { SequelizeStorage, Umzug } from 'umzug';
import { migrations } from '@/migrations';
import { requireEnv } from '../helpers/env';
import { testDb } from '../helpers/db';

/** The migration files in migrations/ (index.ts and types.ts aside), by file name: the order they must run in. */
const fileNames = readdirSync(new URL('../../migrations/', import.meta.url))
  .filter((f) => f.endsWith('.ts') && f !== 'index.ts' && f !== 'types.ts')
  .map((f) => f.slice(0, -'.ts'.length))
  .sort();

describe('migrations', () => {
  const name = `seamline_migrations_${process.pid}`;
  const url = (() => {
    const u = new URL(requireEnv('DATABASE_URL'));
    u.pathname = `/${name}`;
    return u.toString();
  })();

  afterAll(async () => {
    const admin = await testDb();
    await admin.query(`DROP DATABASE IF EXISTS "${name}"`);
  });

  it('run up and down cleanly on an empty database, and up again', async () => {
    const admin = await testDb();
    await admin.query(`DROP DATABASE IF EXISTS "${name}"`);
    await admin.query(`CREATE DATABASE "${name}"`);
    const sequelize = createSequelize(url);
    try {
      const migrator = createMigrator(sequelize);
      const tables = async () =>
        ((await sequelize.query("SELECT tablename FROM pg_tables WHERE schemaname = 'public' AND tablename <> 'umzug_meta' ORDER BY tablename", { type: 'SELECT' })) as { tablename: string }[]).map((r) => r.tablename);

      // Before anything runs, and as they run: every file of migrations/, in file-name (timestamp) order.
      expect(fileNames.length).toBeGreaterThan(10);
      expect((await migrator.pending()).map((m) => m.name)).toEqual(fileNames);
      const up = await migrator.up();
      expect(up.map((m) => m.name)).toEqual(migrations.map((m) => m.name));
      expect(up.map((m) => m.name)).toEqual(fileNames);
      expect((await migrator.executed()).map((m) => m.name)).toEqual(fileNames);
      expect(await tables()).toEqual(expect.arrayContaining(['users', 'workspaces', 'memberships', 'systems', 'system_revisions', 'share_links', 'invitations', 'password_reset_tokens']));

      const down = await migrator.down({ to: 0 });
      expect(down).toHaveLength(migrations.length);
      expect(await tables()).toEqual([]);
      const types = (await sequelize.query("SELECT typname FROM pg_type WHERE typname LIKE 'enum_%'", { type: 'SELECT' })) as unknown[];
      expect(types).toEqual([]);

      expect((await migrator.up()).length).toBe(migrations.length);
      expect(await migrator.pending()).toEqual([]);
    } finally {
      await sequelize.close();
    }
  });

  it('a database migrated in the earlier list order (lessons before measurements) counts as fully migrated: runs are recorded by name', async () => {
    const admin = await testDb();
    await admin.query(`DROP DATABASE IF EXISTS "${name}"`);
    await admin.query(`CREATE DATABASE "${name}"`);
    const sequelize = createSequelize(url);
    try {
      // The order the list used to run in: create-measurements (…003000) last, after the lessons (…004000, …004100).
      const measurements = migrations.find((m) => m.name === '20261201003000-create-measurements');
      expect(measurements).toBeDefined();
      // The list as it stood then (up to the lesson steps); later migrations run afterwards as pending ones.
      const then = migrations.filter((m) => m.name <= '20261201004100-create-lesson-steps');
      const later = migrations.filter((m) => !then.includes(m));
      const earlierOrder = [...then.filter((m) => m !== measurements), measurements!];
      const earlier = new Umzug({
        migrations: earlierOrder.map((m) => ({ name: m.name, up: m.up, down: m.down })),
        context: sequelize.getQueryInterface(),
        storage: new SequelizeStorage({ sequelize, tableName: 'umzug_meta' }),
        logger: undefined,
      });
      expect((await earlier.up()).map((m) => m.name)).toEqual(earlierOrder.map((m) => m.name));
      const migrator = createMigrator(sequelize);
      expect((await migrator.pending()).map((m) => m.name)).toEqual(later.map((m) => m.name));
      await migrator.up();
      expect(await migrator.pending()).toEqual([]);
      expect([...(await migrator.executed()).map((m) => m.name)].sort()).toEqual(fileNames);
    } finally {
      await sequelize.close();
    }
  });
});
