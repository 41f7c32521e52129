import { describe, expect, it } from 'vitest';
import { testDb } from '../helpers/db';
import { Client, signedInClient, uniqueEmail } from '../helpers/http';

/**
 * The Account page's token list (issue 18 follow-up): every active token, and revoked or expired ones for 30 days after
 * they ended — the oracle is that rule applied to dates the test sets in the table itself (a day either side of the edge).
 */

const PASSWORD = 'a-long-password-1';

async function freshUser(): Promise<{ client: Client; workspaceId: string }> {
  const email = uniqueEmail('token-list');
  const res = await new Client().post('/api/v1/auth/sign-up', { name: 'Token lister (invented)', email, password: PASSWORD });
  expect(res.status, res.text).toBe(201);
  const client = await signedInClient(email, PASSWORD);
  return { client, workspaceId: (await client.get('/api/v1/workspaces')).body.items[0].id as string };
}

describe('the access token list', () => {
  it('lists active tokens always, and revoked or expired ones until 30 days after they ended; the old ones stay refused', async () => {
    const { client, workspaceId } = await freshUser();
    const names = ['active', 'active, expires later', 'revoked 29 days ago', 'revoked 31 days ago', 'expired 29 days ago', 'expired 31 days ago', 'revoked today'];
    const made: Record<string, { id: string; token: string }> = {};
    for (const name of names) {
      const res = await client.post('/api/v1/tokens', { name, workspaceId, scope: 'read', ...(name === 'active, expires later' ? { expiresInDays: 7 } : {}) });
      expect(res.status, res.text).toBe(201);
      made[name] = { id: res.body.id, token: res.body.token };
    }
    expect((await client.delete(`/api/v1/tokens/${made['revoked today']!.id}`)).status).toBe(200);
    const db = await testDb();
    const set = (name: string, column: 'revoked_at' | 'expires_at', daysAgo: number) =>
      db.query(`UPDATE access_tokens SET ${column} = now() - (:days * interval '1 day') WHERE id = :id`, { replacements: { id: made[name]!.id, days: daysAgo } });
    await set('revoked 29 days ago', 'revoked_at', 29);
    await set('revoked 31 days ago', 'revoked_at', 31);
    await set('expired 29 days ago', 'expires_at', 29);
    await set('expired 31 days ago', 'expires_at', 31);

    const list = await client.get('/api/v1/tokens');
    expect(list.status, list.text).toBe(200);
    const listed = Object.fromEntries((list.body.items as { name: string; status: string }[]).map((t) => [t.name, t.status]));
    expect(listed).toEqual({
      active: 'active',
      'active, expires later': 'active',
      'revoked 29 days ago': 'revoked',
      'expired 29 days ago': 'expired',
      'revoked today': 'revoked',
    });
    // Out of the list is not back in use: each ended token is still refused, the active one still works.
    for (const name of ['revoked 31 days ago', 'expired 31 days ago', 'revoked 29 days ago', 'expired 29 days ago']) {
      expect((await new Client({ Authorization: `Bearer ${made[name]!.token}` }).get('/api/v1/systems')).status, name).toBe(401);
    }
    expect((await new Client({ Authorization: `Bearer ${made.active!.token}` }).get('/api/v1/systems')).status).toBe(200);
  }, 60_000);
});
