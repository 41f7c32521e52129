import { describe, expect, it } from 'vitest';
import { Client, signedInClient, uniqueEmail } from '../helpers/http';
import { latestMailTo, testDb } from '../helpers/db';

const PASSWORD = 'a-long-password-1';

describe('sign-up', () => {
  it('creates the user and a personal workspace they own', async () => {
    const c = new Client();
    const email = uniqueEmail('signup');
    const res = await c.post('/api/v1/auth/sign-up', { name: 'New Person', email, password: PASSWORD });
    expect(res.status).toBe(201);
    const signedIn = await signedInClient(email, PASSWORD);
    const ws = await signedIn.get('/api/v1/workspaces');
    expect(ws.status).toBe(200);
    expect(ws.body.items).toHaveLength(1);
    expect(ws.body.items[0]).toMatchObject({ personal: true, role: 'owner' });
  });

  it('refuses a duplicate e-mail with its own message, changing nothing', async () => {
    const c = new Client();
    const res = await c.post('/api/v1/auth/sign-up', { name: 'Again', email: 'demo@seamline.test', password: PASSWORD });
    expect(res.status).toBe(400);
    expect(res.body.error.issues).toContainEqual({ path: 'email', message: 'an account with that e-mail already exists' });
  });

  it('refuses a weak password and a bad e-mail field by field', async () => {
    const c = new Client();
    const res = await c.post('/api/v1/auth/sign-up', { name: '', email: 'not-an-address', password: 'short' });
    expect(res.status).toBe(400);
    const paths = res.body.error.issues.map((i: { path: string }) => i.path).sort();
    expect(paths).toEqual(['email', 'name', 'password']);
    expect(res.body.error.issues.find((i: { path: string }) => i.path === 'password').message).toMatch(/at least 10 characters/);
  });

  it('answers 415 for a non-JSON body and 400 for broken JSON', async () => {
    const c = new Client();
    expect((await c.post('/api/v1/auth/sign-up', 'name=x', { 'Content-Type': 'text/plain' })).status).toBe(415);
    const broken = await c.post('/api/v1/auth/sign-up', '{"name":', { 'Content-Type': 'application/json' });
    expect(broken.status).toBe(400);
    expect(broken.body.error.code).toBe('invalid');
  });
});

describe('sign-in', () => {
  it('signs the demo owner in and out', async () => {
    const c = await signedInClient('demo@seamline.test');
    const session = await c.get('/api/auth/session');
    expect(session.body.user.email).toBe('demo@seamline.test');
  });

  it('limits failed sign-ins per e-mail with a clear message, stored in PostgreSQL', async () => {
    const email = uniqueEmail('limited');
    await new Client().post('/api/v1/auth/sign-up', { name: 'Limited', email, password: PASSWORD });
    const errors: (string | null)[] = [];
    for (let i = 0; i < 6; i++) errors.push(await new Client().signIn(email, 'wrong-password-x', `10.9.${i}.1`));
    expect(errors.slice(0, 5).every((e) => e && /do not match/.test(e))).toBe(true);
    expect(errors[5]).toMatch(/Too many failed sign-ins/);
    // Even the right password is refused while the limit holds.
    expect(await new Client().signIn(email, PASSWORD, '10.9.99.1')).toMatch(/Too many failed sign-ins/);
    const db = await testDb();
    const rows = (await db.query('SELECT points FROM rate_limits WHERE key = :k', { replacements: { k: `signin-email:${email}` }, type: 'SELECT' })) as { points: number }[];
    expect(rows[0]?.points).toBeGreaterThanOrEqual(5);
  });
});

describe('password reset', () => {
  it('mails a link that works exactly once', async () => {
    const email = uniqueEmail('reset');
    await new Client().post('/api/v1/auth/sign-up', { name: 'Resetter', email, password: PASSWORD });
    const since = Date.now();
    const asked = await new Client().post('/api/v1/auth/password-reset', { email });
    expect(asked.status).toBe(202);
    const mail = await latestMailTo(email, since);
    expect(mail.subject).toMatch(/Reset your Seamline password/);
    const link = mail.links.find((l) => l.includes('/reset/'));
    expect(link).toBeDefined();
    const token = link!.split('/reset/')[1]!;

    const first = await new Client().post('/api/v1/auth/password-reset/confirm', { token, password: 'the-new-password-2' });
    expect(first.status).toBe(200);
    const second = await new Client().post('/api/v1/auth/password-reset/confirm', { token, password: 'another-password-3' });
    expect(second.status).toBe(400);
    expect(second.body.error.message).toMatch(/already been used/);

    expect(await new Client().signIn(email, 'the-new-password-2')).toBeNull();
    expect(await new Client().signIn(email, PASSWORD)).toMatch(/do not match/);
  });

  it('does not reveal whether an address has an account', async () => {
    const res = await new Client().post('/api/v1/auth/password-reset', { email: uniqueEmail('nobody') });
    expect(res.status).toBe(202);
  });

  it('refuses an expired link with its own message', async () => {
    const email = uniqueEmail('expired');
    await new Client().post('/api/v1/auth/sign-up', { name: 'Late', email, password: PASSWORD });
    const since = Date.now();
    await new Client().post('/api/v1/auth/password-reset', { email });
    const token = (await latestMailTo(email, since)).links.find((l) => l.includes('/reset/'))!.split('/reset/')[1]!;
    const db = await testDb();
    await db.query("UPDATE password_reset_tokens SET expires_at = now() - interval '1 minute' WHERE user_id = (SELECT id FROM users WHERE email = :email)", { replacements: { email } });
    const res = await new Client().post('/api/v1/auth/password-reset/confirm', { token, password: 'the-new-password-2' });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/expired/);
  });
});

describe('invitations', () => {
  it('an accepted invitation gives the invited role, once', async () => {
    const owner = await signedInClient('demo@seamline.test');
    const larkspur = (await owner.get('/api/v1/workspaces')).body.items.find((w: { name: string }) => w.name === 'Larkspur AV');
    const email = uniqueEmail('invitee');
    const since = Date.now();
    const invited = await owner.post(`/api/v1/workspaces/${larkspur.id}/invitations`, { email, role: 'editor' });
    expect(invited.status).toBe(201);
    const link = (await latestMailTo(email, since)).links.find((l) => l.includes('/invite/'))!;
    const token = link.split('/invite/')[1]!;

    await new Client().post('/api/v1/auth/sign-up', { name: 'Invitee', email, password: PASSWORD });
    const invitee = await signedInClient(email, PASSWORD);
    const accepted = await invitee.post(`/api/v1/invitations/${token}`);
    expect(accepted.status).toBe(200);
    expect(accepted.body).toEqual({ workspaceId: larkspur.id, role: 'editor' });
    const mine = (await invitee.get('/api/v1/workspaces')).body.items.find((w: { id: string }) => w.id === larkspur.id);
    expect(mine.role).toBe('editor');
    const again = await invitee.post(`/api/v1/invitations/${token}`);
    expect(again.status).toBe(400);
    expect(again.body.error.message).toMatch(/already been accepted/);
  });

  it('only an owner may invite; an outsider is told nothing (404)', async () => {
    const viewer = await signedInClient('viewer@seamline.test');
    const larkspur = (await viewer.get('/api/v1/workspaces')).body.items.find((w: { name: string }) => w.name === 'Larkspur AV');
    expect((await viewer.post(`/api/v1/workspaces/${larkspur.id}/invitations`, { email: uniqueEmail('x'), role: 'viewer' })).status).toBe(403);
    const other = await signedInClient('other@seamline.test');
    expect((await other.post(`/api/v1/workspaces/${larkspur.id}/invitations`, { email: uniqueEmail('x'), role: 'viewer' })).status).toBe(404);
    expect((await new Client().post(`/api/v1/workspaces/${larkspur.id}/invitations`, { email: uniqueEmail('x'), role: 'viewer' })).status).toBe(401);
  });
});

describe('workspace members', () => {
  it('never removes or demotes the last owner', async () => {
    const email = uniqueEmail('solo');
    await new Client().post('/api/v1/auth/sign-up', { name: 'Solo', email, password: PASSWORD });
    const solo = await signedInClient(email, PASSWORD);
    const ws = (await solo.get('/api/v1/workspaces')).body.items[0];
    const me = (await solo.get('/api/auth/session')).body.user.id;
    const demote = await solo.patch(`/api/v1/workspaces/${ws.id}/members/${me}`, { role: 'viewer' });
    expect(demote.status).toBe(409);
    expect(demote.body.error.message).toMatch(/at least one owner/);
    expect((await solo.delete(`/api/v1/workspaces/${ws.id}/members/${me}`)).status).toBe(409);
  });
});
