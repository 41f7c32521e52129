import { QueryTypes } from 'sequelize';
import { describe, expect, it } from 'vitest';
import { isLastSiteAdmin } from '@/lib/data/account-deletion-plan';
import { createUserWithWorkspace } from '@/lib/data/users';
import { addMember } from '@/lib/data/workspaces';
import { demoProfile } from '@/lib/demo/profiles';
import { lindenStreetDocument } from '@/lib/demo/systems';
import { hashToken, newToken } from '@/lib/tokens';
import { Invitation, PasswordResetToken } from '@/models';
import { testDb } from '../helpers/db';
import { Client, signedInClient, uniqueEmail } from '../helpers/http';

/**
 * Leaving a workspace and deleting an account (issue 19): a member who leaves loses access at once, the last owner must
 * hand ownership over first; a deleted account hands its workspaces over or deletes them as decided, in one
 * transaction, its sessions and tokens stop working, and nothing of anyone else is lost. The oracle for "nothing else
 * changed" is the rule itself, applied to the rows read before: the account's own rows gone, its author columns NULL
 * (ON DELETE SET NULL), everything else byte for byte the same.
 */

const PASSWORD = 'a-long-password-1';
const CONFIRM = 'delete my account';
/** A client address of this run alone, so its deliberate failed passwords never count against anyone else's. */
const ADDRESS = `10.19.${Math.floor(Math.random() * 250)}.${Math.floor(Math.random() * 250)}`;
const FROM = { 'X-Forwarded-For': ADDRESS };

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- rows are compared whole
type Row = Record<string, any>;

interface Person {
  id: string;
  email: string;
  name: string;
  client: Client;
  personalId: string;
}

let counter = 0;
async function person(label: string): Promise<Person> {
  const email = uniqueEmail(`i19-${label}${counter++}`);
  const name = `Leaver ${label} (invented)`;
  const res = await new Client().post('/api/v1/auth/sign-up', { name, email, password: PASSWORD });
  expect(res.status, res.text).toBe(201);
  const client = await signedInClient(email, PASSWORD);
  const personalId = (await client.get('/api/v1/workspaces')).body.items[0].id as string;
  return { id: res.body.id, email, name, client, personalId };
}

async function workspace(owner: Person, name: string): Promise<string> {
  const res = await owner.client.post('/api/v1/workspaces', { name: `${name} (invented)` });
  expect(res.status, res.text).toBe(201);
  return res.body.id;
}

async function system(who: Person, workspaceId: string, name = 'Den (invented)'): Promise<{ id: string; revision: number }> {
  const res = await who.client.post('/api/v1/systems', { name, document: lindenStreetDocument(), workspaceId });
  expect(res.status, res.text).toBe(201);
  return res.body;
}

async function save(who: Person, id: string, name: string): Promise<number> {
  const current = (await who.client.get(`/api/v1/systems/${id}`)).body;
  const res = await who.client.put(`/api/v1/systems/${id}`, { name, document: current.document, revision: current.revision });
  expect(res.status, res.text).toBe(200);
  return res.body.revision;
}

/** A Lesson with one Step, a Speaker profile, a measurement and a share link in the workspace: one of everything. */
async function fillWorkspace(who: Person, workspaceId: string, systemId: string) {
  const lesson = await who.client.post('/api/v1/lessons', { title: 'Why it cancels (invented)', workspaceId });
  expect(lesson.status, lesson.text).toBe(201);
  expect((await who.client.post(`/api/v1/lessons/${lesson.body.id}/steps`, { step: { title: 'One', panel: 'blend', document: lindenStreetDocument() } })).status).toBe(201);
  const { id: _id, ...profile } = demoProfile('quillon-b6');
  void _id;
  expect((await who.client.post('/api/v1/profiles', { ...profile, name: 'Leaver profile (invented)', workspaceId })).status).toBe(201);
  const form = new FormData();
  form.set('file', new Blob([Array.from({ length: 12 }, (_, i) => `${(20 * 1.2 ** i).toFixed(3)},${(-i * 0.5).toFixed(2)}`).join('\n')], { type: 'text/plain' }), 'curve.txt');
  form.set('name', 'Leaver curve (invented)');
  form.set('workspaceId', workspaceId);
  expect((await who.client.request('POST', '/api/v1/measurements', form)).status).toBe(201);
  expect((await who.client.post(`/api/v1/systems/${systemId}/share-links`)).status).toBe(201);
  return lesson.body.id as string;
}

async function token(who: Person, workspaceId: string): Promise<Client> {
  const res = await who.client.post('/api/v1/tokens', { name: 'Leaver token (invented)', workspaceId, scope: 'write' });
  expect(res.status, res.text).toBe(201);
  return new Client({ Authorization: `Bearer ${res.body.token}` });
}

const deleteAccount = (who: Person, body: unknown) => who.client.request('DELETE', '/api/v1/account', body, FROM);

// ---------------------------------------------------------------- rows, read straight from PostgreSQL

const WORKSPACE_TABLES: Record<string, string> = {
  workspaces: 'SELECT to_jsonb(t) AS row FROM workspaces t WHERE t.id = :w',
  memberships: 'SELECT to_jsonb(t) AS row FROM memberships t WHERE t.workspace_id = :w',
  systems: 'SELECT to_jsonb(t) AS row FROM systems t WHERE t.workspace_id = :w',
  system_revisions: 'SELECT to_jsonb(t) AS row FROM system_revisions t JOIN systems s ON s.id = t.system_id WHERE s.workspace_id = :w',
  lessons: 'SELECT to_jsonb(t) AS row FROM lessons t WHERE t.workspace_id = :w',
  lesson_steps: 'SELECT to_jsonb(t) AS row FROM lesson_steps t JOIN lessons l ON l.id = t.lesson_id WHERE l.workspace_id = :w',
  speaker_profiles: 'SELECT to_jsonb(t) AS row FROM speaker_profiles t WHERE t.workspace_id = :w',
  measurements: 'SELECT to_jsonb(t) AS row FROM measurements t WHERE t.workspace_id = :w',
  share_links: 'SELECT to_jsonb(t) AS row FROM share_links t WHERE t.workspace_id = :w',
  invitations: 'SELECT to_jsonb(t) AS row FROM invitations t WHERE t.workspace_id = :w',
  access_tokens: 'SELECT to_jsonb(t) AS row FROM access_tokens t WHERE t.workspace_id = :w',
};

/** Every row of a workspace, table by table, in id order. */
async function workspaceRows(workspaceId: string): Promise<Record<string, Row[]>> {
  const db = await testDb();
  const out: Record<string, Row[]> = {};
  for (const [table, sql] of Object.entries(WORKSPACE_TABLES)) {
    const rows = (await db.query(sql, { replacements: { w: workspaceId }, type: QueryTypes.SELECT })) as { row: Row }[];
    out[table] = rows.map((r) => r.row).sort((a, b) => String(a.id).localeCompare(String(b.id)));
  }
  return out;
}

/** A user's own rows (the account, memberships, tokens, reset links, invitations sent). */
async function userRows(userId: string): Promise<Record<string, Row[]>> {
  const db = await testDb();
  const q = async (sql: string) => ((await db.query(sql, { replacements: { u: userId }, type: QueryTypes.SELECT })) as { row: Row }[]).map((r) => r.row).sort((a, b) => String(a.id).localeCompare(String(b.id)));
  return {
    users: await q('SELECT to_jsonb(t) AS row FROM users t WHERE t.id = :u'),
    memberships: await q('SELECT to_jsonb(t) AS row FROM memberships t WHERE t.user_id = :u'),
    access_tokens: await q('SELECT to_jsonb(t) AS row FROM access_tokens t WHERE t.user_id = :u'),
    password_reset_tokens: await q('SELECT to_jsonb(t) AS row FROM password_reset_tokens t WHERE t.user_id = :u'),
    invitations_sent: await q('SELECT to_jsonb(t) AS row FROM invitations t WHERE t.invited_by_id = :u'),
  };
}

const AUTHOR_COLUMNS = ['owner_id', 'last_editor_id', 'author_id', 'created_by_id', 'invited_by_id'];

/**
 * The rule, applied to rows read before: the deleted user's memberships and tokens and the open invitations they sent
 * are gone, every column naming them as an author is NULL, and nothing else differs.
 */
function afterDeletionOf(before: Record<string, Row[]>, userId: string): Record<string, Row[]> {
  const out: Record<string, Row[]> = {};
  for (const [table, rows] of Object.entries(before)) {
    out[table] = rows
      .filter((r) => !((table === 'memberships' || table === 'access_tokens') && r.user_id === userId))
      .filter((r) => !(table === 'invitations' && r.invited_by_id === userId && r.accepted_at === null))
      .map((r) => Object.fromEntries(Object.entries(r).map(([k, v]) => [k, AUTHOR_COLUMNS.includes(k) && v === userId ? null : v])));
  }
  return out;
}

const count = async (sql: string, replacements: Record<string, unknown>) => ((await (await testDb()).query(sql, { replacements, type: QueryTypes.SELECT })) as { n: number }[])[0]!.n;

// ---------------------------------------------------------------- the tests

describe('leaving a workspace', () => {
  it('a member who leaves loses access at once; the last owner is refused until someone else owns it, then leaves too', async () => {
    const owner = await person('owner');
    const member = await person('member');
    const heir = await person('heir');
    const ws = await workspace(owner, 'Leaving test');
    await addMember(ws, member.id, 'editor');
    const s = await system(owner, ws);
    expect((await member.client.get(`/api/v1/systems/${s.id}`)).status).toBe(200);

    expect((await member.client.delete(`/api/v1/workspaces/${ws}/members/${member.id}`)).status).toBe(200);
    expect((await member.client.get(`/api/v1/systems/${s.id}`)).status).toBe(404);
    expect((await member.client.get(`/api/v1/workspaces/${ws}`)).status).toBe(404);
    expect((await member.client.get(`/api/v1/systems?workspaceId=${ws}`)).body.items).toEqual([]);

    const refused = await owner.client.delete(`/api/v1/workspaces/${ws}/members/${owner.id}`);
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toBe('A workspace needs at least one owner, and you are its only one: make another member an owner before you leave.');
    expect((await owner.client.get(`/api/v1/systems/${s.id}`)).status).toBe(200);

    await addMember(ws, heir.id, 'viewer');
    expect((await owner.client.patch(`/api/v1/workspaces/${ws}/members/${heir.id}`, { role: 'owner' })).status).toBe(200);
    expect((await owner.client.delete(`/api/v1/workspaces/${ws}/members/${owner.id}`)).status).toBe(200);
    expect((await owner.client.get(`/api/v1/systems/${s.id}`)).status).toBe(404);
    const kept = await heir.client.get(`/api/v1/systems/${s.id}`);
    expect(kept.status).toBe(200);
    // What the leaver saved stays, still under their name: their account exists.
    expect(kept.body.ownerName).toBe(owner.name);
    expect((await heir.client.get(`/api/v1/workspaces/${ws}`)).body).toMatchObject({ role: 'owner', memberCount: 1 });
  }, 120_000);
});

describe('deleting an account', () => {
  it('hands a shared workspace to the other editor: every System, revision and Lesson survives by "a former member"; the cookie, token and password stop working', async () => {
    const leaver = await person('leaver');
    const editor = await person('editor');
    const ws = await workspace(leaver, 'Handed over');
    await addMember(ws, editor.id, 'editor');
    const s = await system(leaver, ws);
    await save(editor, s.id, 'Den, edited (invented)');
    await save(leaver, s.id, 'Den, final (invented)');
    const lessonId = await fillWorkspace(leaver, ws, s.id);
    const bearer = await token(leaver, ws);
    expect((await bearer.get('/api/v1/systems')).status).toBe(200);
    // An open invitation and a reset link of the leaver's (the dev server cannot send mail: made as the routes make them).
    await testDb();
    await Invitation.create({ workspaceId: ws, email: uniqueEmail('invitee'), role: 'viewer', tokenHash: hashToken(newToken()), invitedById: leaver.id, expiresAt: new Date(Date.now() + 86_400_000) });
    await PasswordResetToken.create({ userId: leaver.id, tokenHash: hashToken(newToken()), expiresAt: new Date(Date.now() + 3_600_000) });

    const plan = await leaver.client.get('/api/v1/account/deletion-plan');
    expect(plan.status, plan.text).toBe(200);
    const shared = plan.body.workspaces.find((w: Row) => w.workspaceId === ws);
    // Counted by hand from what this test made: 1 System saved 3 times, 1 Lesson of 1 Step, 1 profile, 1 measurement, 1 link, 1 other member.
    expect(shared).toEqual({
      workspaceId: ws,
      name: 'Handed over (invented)',
      personal: false,
      role: 'owner',
      onlyOwner: true,
      otherMembers: [{ userId: editor.id, name: editor.name, email: editor.email, role: 'editor' }],
      ifDeleted: { systems: 1, revisions: 3, lessons: 1, steps: 1, profiles: 1, measurements: 1, shareLinks: 1, members: 1 },
    });
    expect(plan.body.workspaces.find((w: Row) => w.workspaceId === leaver.personalId)).toMatchObject({ personal: true, onlyOwner: true, otherMembers: [] });
    expect(plan.body).toMatchObject({ accessTokens: 1, pendingInvitationsSent: 1, blockedReason: null });
    expect((await leaver.client.get('/api/auth/session')).body).toMatchObject({ user: { id: leaver.id, email: leaver.email } });

    const before = await workspaceRows(ws);
    const editorBefore = await userRows(editor.id);
    const done = await deleteAccount(leaver, {
      password: PASSWORD,
      confirm: CONFIRM,
      workspaces: [
        { workspaceId: ws, action: 'transfer', toUserId: editor.id },
        { workspaceId: leaver.personalId, action: 'delete' },
      ],
    });
    expect(done.status, done.text).toBe(200);
    expect(done.body.workspaces).toContainEqual({ workspaceId: ws, name: 'Handed over (invented)', outcome: 'transferred', toUserId: editor.id, toName: editor.name, removed: null });

    // The editor owns it now; everything else in it is as it was, with the leaver's name gone from it.
    const after = await workspaceRows(ws);
    const expected = afterDeletionOf(before, leaver.id);
    const editorMembership = expected.memberships!.find((m) => m.user_id === editor.id)!;
    expect(after.memberships).toEqual([{ ...editorMembership, role: 'owner', updated_at: after.memberships![0]!.updated_at }]);
    expect({ ...after, memberships: [] }).toEqual({ ...expected, memberships: [] });
    expect(after.system_revisions).toHaveLength(3);
    expect(await userRows(editor.id)).toEqual({ ...editorBefore, memberships: editorBefore.memberships!.map((m) => (m.workspace_id === ws ? after.memberships![0] : m)) });

    const seen = await editor.client.get(`/api/v1/systems/${s.id}`);
    expect(seen.body).toMatchObject({ role: 'owner', ownerName: 'a former member', lastEditorName: 'a former member', name: 'Den, final (invented)' });
    const revisions = (await editor.client.get(`/api/v1/systems/${s.id}/revisions`)).body.items as Row[];
    expect(revisions.map((r) => [r.revision, r.authorName]).sort()).toEqual([
      [1, null],
      [2, editor.name],
      [3, null],
    ]);
    expect((await editor.client.get(`/api/v1/lessons/${lessonId}`)).body).toMatchObject({ ownerName: 'a former member', lastEditorName: 'a former member' });
    expect((await editor.client.get(`/api/v1/workspaces/${ws}`)).body).toMatchObject({ role: 'owner', personal: false, memberCount: 1 });

    // The account and everything personal is gone; the personal workspace too.
    expect(await userRows(leaver.id)).toEqual({ users: [], memberships: [], access_tokens: [], password_reset_tokens: [], invitations_sent: [] });
    expect(await count('SELECT count(*)::int AS n FROM workspaces WHERE id = :w', { w: leaver.personalId })).toBe(0);
    expect(await count('SELECT count(*)::int AS n FROM rate_limits WHERE key = :k', { k: `signin-email:${leaver.email}` })).toBe(0);

    // Its session cookie (still held by the client), its token and its password no longer work.
    expect((await leaver.client.get('/api/v1/workspaces')).status).toBe(401);
    expect((await leaver.client.get('/api/v1/account/deletion-plan')).status).toBe(401);
    // A page sends the cookie to sign-in, as it sends an anonymous visitor (a streamed page redirects in its body).
    const page = await leaver.client.get('/account');
    expect(`${page.headers.get('location') ?? ''} ${page.text}`).toContain('/sign-in?callbackUrl=%2Faccount');
    expect(page.text).not.toContain(leaver.email);
    // The browser's own "who is signed in?" (next-auth's session route, read by the header) answers nobody and clears the cookie.
    const who = await leaver.client.get('/api/auth/session');
    expect(who.status).toBe(200);
    expect(who.body).toEqual({});
    expect(who.headers.getSetCookie().join('\n')).toMatch(/session-token=;[^\n]*Max-Age=0/i);
    expect((await bearer.get('/api/v1/systems')).status).toBe(401);
    const again = new Client();
    expect(await again.signIn(leaver.email, PASSWORD, ADDRESS)).toMatch(/do not match an account/);
    expect(again.signedIn).toBe(false);
  }, 180_000);

  it('deletes a workspace with everything in it, leaves one it co-owns, and changes nothing of anyone else', async () => {
    const leaver = await person('deleter');
    const viewer = await person('viewer');
    const coOwner = await person('coowner');
    const doomed = await workspace(leaver, 'Doomed');
    await addMember(doomed, viewer.id, 'viewer');
    const gone = await system(leaver, doomed);
    await save(leaver, gone.id, 'Doomed den (invented)');
    await fillWorkspace(leaver, doomed, gone.id);
    const kept = await workspace(coOwner, 'Co-owned');
    await addMember(kept, leaver.id, 'owner');
    const leaverSystem = await system(leaver, kept, 'Co-owned den (invented)');
    await fillWorkspace(leaver, kept, leaverSystem.id);
    await token(leaver, kept);
    // Others' own things: the viewer's and the co-owner's personal workspaces, with a System each.
    await system(viewer, viewer.personalId);
    await system(coOwner, coOwner.personalId);

    const plan = (await leaver.client.get('/api/v1/account/deletion-plan')).body;
    expect(plan.workspaces.find((w: Row) => w.workspaceId === kept)).toMatchObject({ onlyOwner: false, role: 'owner' });
    expect(plan.workspaces.find((w: Row) => w.workspaceId === doomed).ifDeleted).toEqual({ systems: 1, revisions: 2, lessons: 1, steps: 1, profiles: 1, measurements: 1, shareLinks: 1, members: 1 });

    const others = [viewer.personalId, coOwner.personalId, kept];
    const before = Object.fromEntries(await Promise.all(others.map(async (w) => [w, await workspaceRows(w)] as const)));
    const usersBefore = { viewer: (await userRows(viewer.id)).users, coOwner: await userRows(coOwner.id) };
    const res = await deleteAccount(leaver, {
      password: PASSWORD,
      confirm: CONFIRM,
      workspaces: [
        { workspaceId: doomed, action: 'delete' },
        { workspaceId: leaver.personalId, action: 'delete' },
      ],
    });
    expect(res.status, res.text).toBe(200);
    expect(res.body.workspaces).toContainEqual({ workspaceId: kept, name: 'Co-owned (invented)', outcome: 'left', toUserId: null, toName: null, removed: null });
    expect(res.body.workspaces.find((w: Row) => w.workspaceId === doomed)).toMatchObject({ outcome: 'deleted', removed: { systems: 1, revisions: 2, members: 1 } });

    // The deleted workspace's rows are all gone, table by table.
    const doomedAfter = await workspaceRows(doomed);
    expect(Object.fromEntries(Object.entries(doomedAfter).map(([t, rows]) => [t, rows.length]))).toEqual(Object.fromEntries(Object.keys(WORKSPACE_TABLES).map((t) => [t, 0])));
    expect((await viewer.client.get(`/api/v1/systems/${gone.id}`)).status).toBe(404);

    // Every other workspace: exactly the rows it had, the leaver's memberships and tokens out, their author columns NULL.
    for (const w of others) expect(await workspaceRows(w), `workspace ${w}`).toEqual(afterDeletionOf(before[w]!, leaver.id));
    expect(before[kept]!.systems!.find((r) => r.id === leaverSystem.id)!.owner_id).toBe(leaver.id);
    expect((await userRows(viewer.id)).users).toEqual(usersBefore.viewer);
    expect(await userRows(coOwner.id)).toEqual(usersBefore.coOwner);
    expect((await coOwner.client.get(`/api/v1/systems/${leaverSystem.id}`)).body).toMatchObject({ ownerName: 'a former member', role: 'owner' });
  }, 180_000);

  it('a wrong password is a 400 on password counted as a failed sign-in, and changes nothing; five lock the account like sign-in does', async () => {
    const leaver = await person('wrongpw');
    const s = await system(leaver, leaver.personalId);
    const before = { rows: await workspaceRows(leaver.personalId), user: await userRows(leaver.id) };
    const body = { password: 'not-the-password-1', confirm: CONFIRM, workspaces: [{ workspaceId: leaver.personalId, action: 'delete' }] };
    const res = await deleteAccount(leaver, body);
    expect(res.status).toBe(400);
    expect(res.body.error.issues).toEqual([{ path: 'password', message: 'that is not your password' }]);
    expect(await workspaceRows(leaver.personalId)).toEqual(before.rows);
    expect(await userRows(leaver.id)).toEqual(before.user);
    expect((await leaver.client.get(`/api/v1/systems/${s.id}`)).status).toBe(200);
    // Counted where sign-in counts its failures (rate_limits, key signin-email:<address>).
    expect(await count('SELECT points AS n FROM rate_limits WHERE key = :k', { k: `signin-email:${leaver.email}` })).toBe(1);
    // Four more: the e-mail's five failures are used up, so the right password is refused (429), here and at sign-in.
    for (let i = 0; i < 4; i++) expect((await deleteAccount(leaver, body)).status).toBe(400);
    const locked = await deleteAccount(leaver, { ...body, password: PASSWORD });
    expect(locked.status).toBe(429);
    expect(locked.body.error.message).toMatch(/Too many failed sign-ins/);
    expect(await new Client().signIn(leaver.email, PASSWORD, ADDRESS)).toMatch(/Too many failed sign-ins/);
    expect(await userRows(leaver.id)).toEqual(before.user);
  }, 120_000);

  it('a missing decision for a workspace only the account owns is a 400 naming it; a transfer to a non-member is a 400 on it; nothing changes', async () => {
    const leaver = await person('undecided');
    const stranger = await person('stranger');
    const team = await workspace(leaver, 'Undecided');
    await system(leaver, team);
    const before = { team: await workspaceRows(team), personal: await workspaceRows(leaver.personalId), user: await userRows(leaver.id) };

    const missing = await deleteAccount(leaver, { password: PASSWORD, confirm: CONFIRM, workspaces: [{ workspaceId: leaver.personalId, action: 'delete' }] });
    expect(missing.status).toBe(400);
    expect(missing.body.error.issues).toHaveLength(1);
    expect(missing.body.error.issues[0].path).toBe('workspaces');
    expect(missing.body.error.issues[0].message).toContain('“Undecided (invented)”');
    expect(missing.body.error.issues[0].message).toContain(team);

    const stray = await deleteAccount(leaver, {
      password: PASSWORD,
      confirm: CONFIRM,
      workspaces: [
        { workspaceId: team, action: 'transfer', toUserId: stranger.id },
        { workspaceId: leaver.personalId, action: 'delete' },
      ],
    });
    expect(stray.status).toBe(400);
    expect(stray.body.error.issues).toEqual([{ path: 'workspaces.0.toUserId', message: 'not a member of “Undecided (invented)”: hand it to one of its members' }]);

    const notMine = await deleteAccount(leaver, {
      password: PASSWORD,
      confirm: CONFIRM,
      workspaces: [{ workspaceId: team, action: 'delete' }, { workspaceId: leaver.personalId, action: 'delete' }, { workspaceId: stranger.personalId, action: 'delete' }],
    });
    expect(notMine.status).toBe(400);
    expect(notMine.body.error.issues.map((i: Row) => i.path)).toEqual(['workspaces.2.workspaceId']);

    expect(await workspaceRows(team)).toEqual(before.team);
    expect(await workspaceRows(leaver.personalId)).toEqual(before.personal);
    expect(await userRows(leaver.id)).toEqual(before.user);
    expect((await leaver.client.get('/api/v1/workspaces')).status).toBe(200);
    expect((await stranger.client.get(`/api/v1/workspaces/${stranger.personalId}`)).status).toBe(200);
  }, 120_000);

  it('a site admin may delete their account while another admin remains; with no other admin they would be the last one (the refusal\'s check)', async () => {
    const email = uniqueEmail('i19-admin');
    await testDb();
    const admin = await createUserWithWorkspace({ email, name: 'Leaving admin (invented)', password: PASSWORD, siteRole: 'admin' });
    // Alone: were every other admin a member, this one would be the last (checked in a transaction that is rolled back).
    const db = await testDb();
    const t = await db.transaction();
    try {
      expect(await isLastSiteAdmin({ id: admin.id, siteRole: 'admin' }, t)).toBe(false);
      await db.query("UPDATE users SET site_role = 'member' WHERE site_role = 'admin' AND id <> :id", { replacements: { id: admin.id }, transaction: t });
      expect(await isLastSiteAdmin({ id: admin.id, siteRole: 'admin' }, t)).toBe(true);
    } finally {
      await t.rollback();
    }
    const client = await signedInClient(email, PASSWORD);
    const plan = (await client.get('/api/v1/account/deletion-plan')).body;
    expect(plan.blockedReason).toBeNull();
    const res = await client.request('DELETE', '/api/v1/account', { password: PASSWORD, confirm: CONFIRM, workspaces: [{ workspaceId: plan.workspaces[0].workspaceId, action: 'delete' }] }, FROM);
    expect(res.status, res.text).toBe(200);
    expect((await client.get('/api/v1/admin/users')).status).toBe(401);
  }, 60_000);
});
