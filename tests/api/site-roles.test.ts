import { describe, expect, it } from 'vitest';
import { createUserWithWorkspace } from '@/lib/data/users';
import { LAST_SITE_ADMIN_MESSAGE, setSiteRole } from '@/lib/data/site-roles';
import { AppError } from '@/lib/errors';
import { testDb } from '../helpers/db';
import { Client, signedInClient, uniqueEmail } from '../helpers/http';

/**
 * Site roles (issue 19 follow-up): a site administrator makes another account a site admin, or a member again, on the
 * Users page or PATCH /api/v1/admin/users/{id}; the site keeps at least one admin. The oracle is the stored role and
 * what each account may then open (GET /api/v1/admin/users is for site admins only).
 */

const PASSWORD = 'a-long-password-1';

async function account(label: string, siteRole: 'admin' | 'member' = 'member') {
  await testDb();
  const email = uniqueEmail(`site-role-${label}`);
  const user = await createUserWithWorkspace({ email, name: `Site role ${label} (invented)`, password: PASSWORD, siteRole });
  return { ...user, client: await signedInClient(email, PASSWORD) };
}

const storedRole = async (id: string) => {
  const [rows] = await (await testDb()).query('SELECT site_role FROM users WHERE id = :id', { replacements: { id } });
  return (rows as { site_role: string }[])[0]?.site_role;
};

describe('site roles', () => {
  it('an admin makes a member a site admin (who may then list the accounts) and a member again (who may not)', async () => {
    const admin = await account('admin', 'admin');
    const member = await account('member');
    expect((await member.client.get('/api/v1/admin/users')).status).toBe(404);

    const up = await admin.client.patch(`/api/v1/admin/users/${member.id}`, { siteRole: 'admin' });
    expect(up.status, up.text).toBe(200);
    expect(up.body).toMatchObject({ id: member.id, email: member.email, siteRole: 'admin' });
    expect(await storedRole(member.id)).toBe('admin');
    // The same cookie, read afresh: the new admin may list the accounts at once.
    const list = await member.client.get('/api/v1/admin/users');
    expect(list.status, list.text).toBe(200);
    expect(list.body.items.find((u: { id: string }) => u.id === member.id)).toMatchObject({ siteRole: 'admin' });

    // The role it has already: 200, nothing changed.
    expect((await admin.client.patch(`/api/v1/admin/users/${member.id}`, { siteRole: 'admin' })).body).toMatchObject({ siteRole: 'admin' });

    // Back to member (another admin remains): 200, and the Users list is closed to it again.
    const down = await member.client.patch(`/api/v1/admin/users/${member.id}`, { siteRole: 'member' });
    expect(down.status, down.text).toBe(200);
    expect(await storedRole(member.id)).toBe('member');
    expect((await member.client.get('/api/v1/admin/users')).status).toBe(404);
  }, 60_000);

  it('refuses what it must, changing nothing: a member, a token, a bad body, an unknown account', async () => {
    const admin = await account('admin2', 'admin');
    const member = await account('member2');
    const other = await account('other2');
    expect((await member.client.patch(`/api/v1/admin/users/${other.id}`, { siteRole: 'admin' })).status).toBe(404);
    expect((await new Client().patch(`/api/v1/admin/users/${other.id}`, { siteRole: 'admin' })).status).toBe(401);
    const made = await admin.client.post('/api/v1/tokens', { name: 'admin token', workspaceId: (await admin.client.get('/api/v1/workspaces')).body.items[0].id, scope: 'write' });
    expect(made.status, made.text).toBe(201);
    expect((await new Client({ Authorization: `Bearer ${made.body.token}` }).patch(`/api/v1/admin/users/${other.id}`, { siteRole: 'admin' })).status).toBe(404);
    const bad = await admin.client.patch(`/api/v1/admin/users/${other.id}`, { siteRole: 'owner' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues[0].path).toBe('siteRole');
    expect((await admin.client.patch(`/api/v1/admin/users/${other.id}`, { siteRole: 'admin', extra: 1 })).status).toBe(400);
    expect((await admin.client.patch('/api/v1/admin/users/00000000-0000-4000-8000-000000000000', { siteRole: 'admin' })).status).toBe(404);
    expect((await admin.client.patch('/api/v1/admin/users/not-an-id', { siteRole: 'admin' })).status).toBe(404);
    expect(await storedRole(other.id)).toBe('member');
  }, 60_000);

  it('the last site admin cannot be made a member (decided in a transaction that is rolled back, as if no other admin existed)', async () => {
    const admin = await account('last', 'admin');
    const caller = { id: admin.id, siteRole: 'admin' as const };
    const db = await testDb();
    const t = await db.transaction();
    try {
      await db.query("UPDATE users SET site_role = 'member' WHERE site_role = 'admin' AND id <> :id", { replacements: { id: admin.id }, transaction: t });
      const refused = await setSiteRole(caller, admin.id, 'member', t).catch((e: unknown) => e);
      expect(refused).toBeInstanceOf(AppError);
      expect(refused).toMatchObject({ status: 409, message: LAST_SITE_ADMIN_MESSAGE });
      const [rows] = await db.query('SELECT site_role FROM users WHERE id = :id', { replacements: { id: admin.id }, transaction: t });
      expect(rows).toEqual([{ site_role: 'admin' }]);
    } finally {
      await t.rollback();
    }
    expect(await storedRole(admin.id)).toBe('admin');
  }, 60_000);
});
