import { afterAll, describe, expect, it } from 'vitest';
import { createSequelize } from '@/lib/db';
import { createMigrator } from '@/lib/migrator';
import { migrations } from '@/migrations';
import { requireEnv } from '../helpers/env';
import { testDb } from '../helpers/db';

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

      const up = await migrator.up();
      expect(up.map((m) => m.name)).toEqual(migrations.map((m) => m.name));
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
});
