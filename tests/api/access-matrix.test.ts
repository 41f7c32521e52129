import { beforeAll, describe, expect, it } from 'vitest';
import { API_OPERATIONS } from '@/lib/openapi/operations';
import { addMember } from '@/lib/data/workspaces';
import { juniperLaneDocument } from '@/lib/demo/systems';
import { demoProfile } from '@/lib/demo/profiles';
import { apiRouteFiles } from '../helpers/api-routes';
import { Client, signedInClient, uniqueEmail } from '../helpers/http';
import { testDb } from '../helpers/db';
import { smallSystemFile, smallWorkspaceFile } from '../helpers/transfer';

/**
 * One table over every route in app/api (found by walking the folder, so a new route without an
 * entry fails) × {anonymous, outsider, site admin, viewer, editor, owner}, with the status each
 * must get. Outsiders and site admins are told nothing about a workspace's content (404).
 *
 * Programs with the owner's personal access tokens (`Authorization: Bearer`) are callers too: a read token for the
 * workspace acts as its viewer, a write token as its editor (never an owner), a token for another workspace as an
 * outsider; a revoked or expired token is 401 wherever it is sent. Routes only a browser session may use (account,
 * tokens, making workspaces, accepting invitations) answer 403 to every working token — listed in SESSION_ONLY.
 */
type SessionRole = 'anonymous' | 'outsider' | 'admin' | 'viewer' | 'editor' | 'owner';
type TokenRole = 'readToken' | 'writeToken' | 'otherWorkspaceToken' | 'revokedToken' | 'expiredToken';
/** A deleted account's session cookie and access token, kept after DELETE /api/v1/account: anonymous and refused. */
type DeletedRole = 'deletedSession' | 'deletedToken';
type Role = SessionRole | TokenRole | DeletedRole;
const SESSION_ROLES: SessionRole[] = ['anonymous', 'outsider', 'admin', 'viewer', 'editor', 'owner'];
const TOKEN_ROLES: TokenRole[] = ['readToken', 'writeToken', 'otherWorkspaceToken', 'revokedToken', 'expiredToken'];
const ROLES: Role[] = [...SESSION_ROLES, ...TOKEN_ROLES, 'deletedSession', 'deletedToken'];
type Expect = Record<SessionRole, number>;

/** Routes a token may not use at all, whatever its scope. */
const SESSION_ONLY = new Set(['POST /api/v1/workspaces', 'POST /api/v1/invitations/[token]', 'GET /api/v1/tokens', 'POST /api/v1/tokens', 'DELETE /api/v1/tokens/[id]', 'GET /api/v1/account/deletion-plan', 'DELETE /api/v1/account', 'POST /api/v1/workspaces/import']);
/** Routes outside /api/v1 that ignore Authorization altogether. */
const NO_TOKEN_CHECK = new Set(['GET /api/health']);

/** What each token caller must get, from the session roles' row (independent of the code: the rule above). */
function withTokens(key: string, e: Expect): Record<Role, number> {
  const refused = NO_TOKEN_CHECK.has(key) ? e.anonymous : 401;
  const working = (status: number) => (SESSION_ONLY.has(key) ? 403 : status);
  return {
    ...e,
    readToken: working(e.viewer),
    writeToken: working(e.editor),
    otherWorkspaceToken: working(e.outsider),
    revokedToken: refused,
    expiredToken: refused,
    deletedSession: e.anonymous,
    deletedToken: refused,
  };
}

const open = (ok: number): Expect => ({ anonymous: ok, outsider: ok, admin: ok, viewer: ok, editor: ok, owner: ok });
const signedIn = (ok: number): Expect => ({ anonymous: 401, outsider: ok, admin: ok, viewer: ok, editor: ok, owner: ok });
const read = (ok = 200): Expect => ({ anonymous: 401, outsider: 404, admin: 404, viewer: ok, editor: ok, owner: ok });
const write = (ok = 200): Expect => ({ anonymous: 401, outsider: 404, admin: 404, viewer: 403, editor: ok, owner: ok });
const ownerOnly = (ok = 200): Expect => ({ anonymous: 401, outsider: 404, admin: 404, viewer: 403, editor: 403, owner: ok });

interface Fixture {
  workspaceId: string;
  systemId: string;
  lessonId: string;
  stepId: string;
  profileId: string;
  measurementId: string;
  shareToken: string;
  users: Record<Exclude<SessionRole, 'anonymous'>, { id: string; email: string }>;
  ownerTokenId: string;
  clients: Record<Role, Client>;
}

interface Call {
  path: string;
  body?: unknown;
  form?: FormData;
}

type Builder = (f: Fixture, role: Role) => Promise<Call> | Call;

const owner = (f: Fixture) => f.clients.owner;

async function freshSystem(f: Fixture): Promise<{ id: string; revision: number }> {
  const res = await owner(f).post('/api/v1/systems', { name: 'Matrix scratch', document: juniperLaneDocument(), workspaceId: f.workspaceId });
  if (res.status !== 201) throw new Error(`fixture: system ${res.status}`);
  return res.body;
}
async function systemRevision(f: Fixture, id: string): Promise<number> {
  return (await owner(f).get(`/api/v1/systems/${id}`)).body.revision;
}
async function lessonRevision(f: Fixture, id: string): Promise<number> {
  return (await owner(f).get(`/api/v1/lessons/${id}`)).body.revision;
}
async function freshLesson(f: Fixture): Promise<{ id: string; revision: number; stepId: string }> {
  const l = await owner(f).post('/api/v1/lessons', { title: 'Matrix lesson', workspaceId: f.workspaceId });
  const s = await owner(f).post(`/api/v1/lessons/${l.body.id}/steps`, { step: { title: 'One', panel: 'blend', document: juniperLaneDocument() } });
  return { id: l.body.id, revision: s.body.revision, stepId: s.body.steps[0].id };
}
function measurementForm(f: Fixture): FormData {
  const lines = ['# invented test curve', ...Array.from({ length: 12 }, (_, i) => `${(20 * 1.2 ** i).toFixed(3)},${(-i * 0.5).toFixed(2)}`)];
  const form = new FormData();
  form.set('file', new Blob([lines.join('\n')], { type: 'text/plain' }), 'curve.txt');
  form.set('name', 'Matrix curve (invented)');
  form.set('workspaceId', f.workspaceId);
  return form;
}
const profileBody = (f: Fixture) => {
  const { id: _id, ...fields } = demoProfile('quillon-b6');
  void _id;
  return { ...fields, name: 'Matrix profile (invented)', workspaceId: f.workspaceId };
};
function documentedExample(routePath: string): Call {
  const op = API_OPERATIONS.find((o) => o.method === 'POST' && o.path === routePath);
  const example = op?.examples.find((e) => e.status === 200);
  if (!example) throw new Error(`the API page has no working example for POST ${routePath}`);
  return { path: routePath, body: example.body };
}

const MATRIX: Record<string, { expect: Expect; build: Builder }> = {
  'GET /api/health': { expect: open(200), build: () => ({ path: '/api/health' }) },
  'GET /api/v1/admin/users': { expect: { anonymous: 401, outsider: 404, admin: 200, viewer: 404, editor: 404, owner: 404 }, build: () => ({ path: '/api/v1/admin/users' }) },
  // The viewer made a member again: the role it has, so nothing changes whoever gets through.
  'PATCH /api/v1/admin/users/[id]': {
    expect: { anonymous: 401, outsider: 404, admin: 200, viewer: 404, editor: 404, owner: 404 },
    build: (f) => ({ path: `/api/v1/admin/users/${f.users.viewer.id}`, body: { siteRole: 'member' } }),
  },
  'POST /api/v1/auth/sign-up': { expect: open(201), build: () => ({ path: '/api/v1/auth/sign-up', body: { name: 'Matrix signup', email: uniqueEmail('matrix'), password: 'a-long-password-1' } }) },
  'POST /api/v1/auth/password-reset': { expect: open(202), build: () => ({ path: '/api/v1/auth/password-reset', body: { email: uniqueEmail('nobody') } }) },
  'POST /api/v1/auth/password-reset/confirm': { expect: open(400), build: () => ({ path: '/api/v1/auth/password-reset/confirm', body: { token: 'x'.repeat(43), password: 'a-long-password-1' } }) },
  'GET /api/v1/invitations/[token]': { expect: open(404), build: () => ({ path: `/api/v1/invitations/${'y'.repeat(43)}` }) },
  'POST /api/v1/invitations/[token]': { expect: signedIn(404), build: () => ({ path: `/api/v1/invitations/${'y'.repeat(43)}` }) },
  'GET /api/v1/tokens': { expect: signedIn(200), build: () => ({ path: '/api/v1/tokens' }) },
  'GET /api/v1/account/deletion-plan': { expect: signedIn(200), build: () => ({ path: '/api/v1/account/deletion-plan' }) },
  // The words not typed: refused after the caller is checked and before the password is (no failed sign-in is counted).
  'DELETE /api/v1/account': { expect: signedIn(400), build: () => ({ path: '/api/v1/account', body: { password: 'not-read-here', confirm: 'not the words', workspaces: [] } }) },
  // Any member may make a token for the workspace (a viewer a read one); the others are not in it.
  'POST /api/v1/tokens': { expect: read(201), build: (f) => ({ path: '/api/v1/tokens', body: { name: 'Matrix token', workspaceId: f.workspaceId, scope: 'read', expiresInDays: 1 } }) },
  // The owner's own token: only the owner may revoke it; to anyone else it does not exist.
  'DELETE /api/v1/tokens/[id]': { expect: { anonymous: 401, outsider: 404, admin: 404, viewer: 404, editor: 404, owner: 200 }, build: (f) => ({ path: `/api/v1/tokens/${f.ownerTokenId}` }) },

  'GET /api/v1/openapi.json': { expect: open(200), build: () => ({ path: '/api/v1/openapi.json' }) },

  // Compute routes: open to everyone; the body is the API page's own working example.
  'POST /api/v1/blend': { expect: open(200), build: () => documentedExample('/api/v1/blend') },
  'POST /api/v1/crossover-sweep': { expect: open(200), build: () => documentedExample('/api/v1/crossover-sweep') },
  'POST /api/v1/timing': { expect: open(200), build: () => documentedExample('/api/v1/timing') },
  'POST /api/v1/room-modes': { expect: open(200), build: () => documentedExample('/api/v1/room-modes') },
  'POST /api/v1/room-response': { expect: open(200), build: () => documentedExample('/api/v1/room-response') },
  'POST /api/v1/seat-balance': { expect: open(200), build: () => documentedExample('/api/v1/seat-balance') },
  'POST /api/v1/layout': { expect: open(200), build: () => documentedExample('/api/v1/layout') },
  'POST /api/v1/headroom': { expect: open(200), build: () => documentedExample('/api/v1/headroom') },
  'POST /api/v1/measured/predict': { expect: open(200), build: () => documentedExample('/api/v1/measured/predict') },
  'POST /api/v1/measured/extension': { expect: open(200), build: () => documentedExample('/api/v1/measured/extension') },
  'POST /api/v1/measured/compare': { expect: open(200), build: () => documentedExample('/api/v1/measured/compare') },
  'POST /api/v1/processor-filters': { expect: open(200), build: () => documentedExample('/api/v1/processor-filters') },
  'POST /api/v1/eq-design': { expect: open(200), build: () => documentedExample('/api/v1/eq-design') },

  'GET /api/v1/workspaces': { expect: signedIn(200), build: () => ({ path: '/api/v1/workspaces' }) },
  'POST /api/v1/workspaces': { expect: signedIn(201), build: () => ({ path: '/api/v1/workspaces', body: { name: 'Matrix side workspace' } }) },
  'GET /api/v1/workspaces/[id]': { expect: read(), build: (f) => ({ path: `/api/v1/workspaces/${f.workspaceId}` }) },
  'PATCH /api/v1/workspaces/[id]': { expect: ownerOnly(), build: (f) => ({ path: `/api/v1/workspaces/${f.workspaceId}`, body: { name: 'Matrix workspace' } }) },
  'GET /api/v1/workspaces/[id]/members': { expect: read(), build: (f) => ({ path: `/api/v1/workspaces/${f.workspaceId}/members` }) },
  'PATCH /api/v1/workspaces/[id]/members/[userId]': { expect: ownerOnly(), build: (f) => ({ path: `/api/v1/workspaces/${f.workspaceId}/members/${f.users.editor.id}`, body: { role: 'editor' } }) },
  'DELETE /api/v1/workspaces/[id]/members/[userId]': {
    // Owners remove members; a member may remove only themselves (leaving), so the others are refused.
    expect: ownerOnly(),
    build: async (f) => {
      const extra = await createUser('leaver');
      await addMember(f.workspaceId, extra.id, 'viewer');
      return { path: `/api/v1/workspaces/${f.workspaceId}/members/${extra.id}` };
    },
  },
  'GET /api/v1/workspaces/[id]/invitations': { expect: read(), build: (f) => ({ path: `/api/v1/workspaces/${f.workspaceId}/invitations` }) },
  'POST /api/v1/workspaces/[id]/invitations': { expect: ownerOnly(201), build: (f) => ({ path: `/api/v1/workspaces/${f.workspaceId}/invitations`, body: { email: uniqueEmail('invited'), role: 'viewer' } }) },
  'DELETE /api/v1/workspaces/[id]/invitations/[invitationId]': {
    expect: ownerOnly(),
    build: async (f) => {
      const inv = await owner(f).post(`/api/v1/workspaces/${f.workspaceId}/invitations`, { email: uniqueEmail('withdrawn'), role: 'viewer' });
      return { path: `/api/v1/workspaces/${f.workspaceId}/invitations/${inv.body.id}` };
    },
  },

  // Workspace export and import (issue 19): the export lists the members' e-mails (owners only); a whole-workspace file
  // becomes a new workspace of any signed-in browser session (tokens 403); a System file goes in for editors and write tokens.
  'GET /api/v1/workspaces/[id]/export': { expect: ownerOnly(), build: (f) => ({ path: `/api/v1/workspaces/${f.workspaceId}/export` }) },
  'POST /api/v1/workspaces/import': { expect: signedIn(201), build: () => ({ path: '/api/v1/workspaces/import', body: smallWorkspaceFile('matrix') }) },
  'POST /api/v1/workspaces/[id]/systems/import': { expect: write(201), build: (f) => ({ path: `/api/v1/workspaces/${f.workspaceId}/systems/import`, body: smallSystemFile('matrix') }) },
  'GET /api/v1/systems/[id]/export/history': { expect: write(), build: (f) => ({ path: `/api/v1/systems/${f.systemId}/export/history` }) },

  'GET /api/v1/systems': { expect: signedIn(200), build: () => ({ path: '/api/v1/systems' }) },
  'POST /api/v1/systems': { expect: write(201), build: (f) => ({ path: '/api/v1/systems', body: { name: 'Matrix new', document: juniperLaneDocument(), workspaceId: f.workspaceId } }) },
  'GET /api/v1/systems/[id]': { expect: read(), build: (f) => ({ path: `/api/v1/systems/${f.systemId}` }) },
  'PUT /api/v1/systems/[id]': { expect: write(), build: async (f) => ({ path: `/api/v1/systems/${f.systemId}`, body: { name: 'Matrix system', document: juniperLaneDocument(), revision: await systemRevision(f, f.systemId) } }) },
  'PATCH /api/v1/systems/[id]': { expect: write(), build: async (f) => ({ path: `/api/v1/systems/${f.systemId}`, body: { name: 'Matrix system', revision: await systemRevision(f, f.systemId) } }) },
  'DELETE /api/v1/systems/[id]': { expect: write(), build: async (f) => ({ path: `/api/v1/systems/${(await freshSystem(f)).id}` }) },
  'POST /api/v1/systems/[id]/restore': {
    expect: write(),
    build: async (f) => {
      const s = await freshSystem(f);
      await owner(f).delete(`/api/v1/systems/${s.id}`);
      return { path: `/api/v1/systems/${s.id}/restore` };
    },
  },
  'POST /api/v1/systems/[id]/duplicate': { expect: write(201), build: (f) => ({ path: `/api/v1/systems/${f.systemId}/duplicate`, body: {} }) },
  'GET /api/v1/systems/[id]/export': { expect: read(), build: (f) => ({ path: `/api/v1/systems/${f.systemId}/export?format=json` }) },
  'GET /api/v1/systems/[id]/revisions': { expect: read(), build: (f) => ({ path: `/api/v1/systems/${f.systemId}/revisions` }) },
  'GET /api/v1/systems/[id]/revisions/[revision]': { expect: read(), build: (f) => ({ path: `/api/v1/systems/${f.systemId}/revisions/1` }) },
  'PATCH /api/v1/systems/[id]/revisions/[revision]': { expect: write(), build: (f) => ({ path: `/api/v1/systems/${f.systemId}/revisions/1`, body: { note: 'Matrix note' } }) },
  'POST /api/v1/systems/[id]/revisions/[revision]/restore': {
    expect: write(),
    build: async (f) => ({ path: `/api/v1/systems/${f.systemId}/revisions/1/restore`, body: { revision: await systemRevision(f, f.systemId) } }),
  },
  'POST /api/v1/systems/[id]/share-links': { expect: write(201), build: (f) => ({ path: `/api/v1/systems/${f.systemId}/share-links` }) },
  'GET /api/v1/systems/[id]/share-links': { expect: write(200), build: (f) => ({ path: `/api/v1/systems/${f.systemId}/share-links` }) },
  'DELETE /api/v1/share-links/[token]': {
    expect: write(200),
    build: async (f) => ({ path: `/api/v1/share-links/${(await owner(f).post(`/api/v1/systems/${f.systemId}/share-links`)).body.token}` }),
  },
  'POST /api/v1/shared/[token]/copy': { expect: write(201), build: (f) => ({ path: `/api/v1/shared/${f.shareToken}/copy`, body: { workspaceId: f.workspaceId } }) },

  'GET /api/v1/profiles': { expect: signedIn(200), build: () => ({ path: '/api/v1/profiles' }) },
  'POST /api/v1/profiles': { expect: write(201), build: (f) => ({ path: '/api/v1/profiles', body: profileBody(f) }) },
  'GET /api/v1/profiles/[id]': { expect: read(), build: (f) => ({ path: `/api/v1/profiles/${f.profileId}` }) },
  'PUT /api/v1/profiles/[id]': {
    expect: write(),
    build: (f) => {
      const { workspaceId: _w, ...fields } = profileBody(f);
      void _w;
      return { path: `/api/v1/profiles/${f.profileId}`, body: fields };
    },
  },
  'DELETE /api/v1/profiles/[id]': { expect: write(), build: async (f) => ({ path: `/api/v1/profiles/${(await owner(f).post('/api/v1/profiles', profileBody(f))).body.id}` }) },

  'GET /api/v1/measurements': { expect: signedIn(200), build: () => ({ path: '/api/v1/measurements' }) },
  'POST /api/v1/measurements': { expect: write(201), build: (f) => ({ path: '/api/v1/measurements', form: measurementForm(f) }) },
  'GET /api/v1/measurements/[id]': { expect: read(), build: (f) => ({ path: `/api/v1/measurements/${f.measurementId}` }) },
  'PATCH /api/v1/measurements/[id]': { expect: write(), build: (f) => ({ path: `/api/v1/measurements/${f.measurementId}`, body: { runLabel: 'Matrix run' } }) },
  'DELETE /api/v1/measurements/[id]': {
    expect: write(),
    build: async (f) => ({ path: `/api/v1/measurements/${(await owner(f).request('POST', '/api/v1/measurements', measurementForm(f))).body.id}` }),
  },

  'GET /api/v1/lessons': { expect: signedIn(200), build: () => ({ path: '/api/v1/lessons' }) },
  'POST /api/v1/lessons': { expect: write(201), build: (f) => ({ path: '/api/v1/lessons', body: { title: 'Matrix new lesson', workspaceId: f.workspaceId } }) },
  'GET /api/v1/lessons/[id]': { expect: read(), build: (f) => ({ path: `/api/v1/lessons/${f.lessonId}` }) },
  'PUT /api/v1/lessons/[id]': { expect: write(), build: async (f) => ({ path: `/api/v1/lessons/${f.lessonId}`, body: { title: 'Matrix lesson', description: '', revision: await lessonRevision(f, f.lessonId) } }) },
  'DELETE /api/v1/lessons/[id]': { expect: write(), build: async (f) => ({ path: `/api/v1/lessons/${(await freshLesson(f)).id}` }) },
  'POST /api/v1/lessons/[id]/steps': { expect: write(201), build: (f) => ({ path: `/api/v1/lessons/${f.lessonId}/steps`, body: { step: { title: 'Added', panel: 'timing', document: juniperLaneDocument() } } }) },
  'PUT /api/v1/lessons/[id]/steps/[stepId]': {
    expect: write(),
    build: async (f) => ({ path: `/api/v1/lessons/${f.lessonId}/steps/${f.stepId}`, body: { revision: await lessonRevision(f, f.lessonId), step: { title: 'Renamed step' } } }),
  },
  'DELETE /api/v1/lessons/[id]/steps/[stepId]': {
    expect: write(),
    build: async (f) => {
      const l = await freshLesson(f);
      return { path: `/api/v1/lessons/${l.id}/steps/${l.stepId}?revision=${l.revision}` };
    },
  },
  'POST /api/v1/lessons/[id]/steps/reorder': {
    expect: write(),
    build: async (f) => {
      const l = (await owner(f).get(`/api/v1/lessons/${f.lessonId}`)).body;
      return { path: `/api/v1/lessons/${f.lessonId}/steps/reorder`, body: { revision: l.revision, stepIds: l.steps.map((s: { id: string }) => s.id).reverse() } };
    },
  },
  'POST /api/v1/lessons/[id]/share-links': { expect: write(201), build: (f) => ({ path: `/api/v1/lessons/${f.lessonId}/share-links` }) },
  'GET /api/v1/lessons/[id]/share-links': { expect: write(200), build: (f) => ({ path: `/api/v1/lessons/${f.lessonId}/share-links` }) },
  'DELETE /api/v1/lessons/[id]/share-links': {
    expect: write(200),
    build: async (f) => ({ path: `/api/v1/lessons/${f.lessonId}/share-links?token=${(await owner(f).post(`/api/v1/lessons/${f.lessonId}/share-links`)).body.token}` }),
  },
};

/** Every `METHOD /path` the app serves, from the route files themselves (next-auth's own routes aside). */
function discoverRoutes(): string[] {
  const found: string[] = [];
  for (const { route, source } of apiRouteFiles()) {
    if (route.startsWith('/api/auth/')) continue;
    for (const m of source.matchAll(/export (?:const|async function) (GET|POST|PUT|PATCH|DELETE)\b/g)) found.push(`${m[1]} ${route}`);
  }
  return found.sort();
}

let counter = 0;
async function createUser(prefix: string): Promise<{ id: string; email: string }> {
  const email = uniqueEmail(`${prefix}${counter++}`);
  const res = await new Client().post('/api/v1/auth/sign-up', { name: `Matrix ${prefix}`, email, password: 'a-long-password-1' });
  if (res.status !== 201) throw new Error(`fixture: sign-up ${res.status}`);
  return { id: res.body.id, email };
}

describe('access matrix over every route', () => {
  const fixture = {} as Fixture;

  beforeAll(async () => {
    await testDb();
    const users = {
      owner: await createUser('owner'),
      editor: await createUser('editor'),
      viewer: await createUser('viewer'),
      outsider: await createUser('outsider'),
      admin: { id: '', email: 'admin@seamline.test' },
    };
    const password = (r: string) => (r === 'admin' ? 'seamline-demo' : 'a-long-password-1');
    const clients = { anonymous: new Client() } as Record<Role, Client>;
    for (const r of ['owner', 'editor', 'viewer', 'outsider', 'admin'] as const) clients[r] = await signedInClient(users[r].email, password(r));
    fixture.users = users;
    fixture.clients = clients;
    const ws = await clients.owner.post('/api/v1/workspaces', { name: 'Matrix workspace' });
    fixture.workspaceId = ws.body.id;
    // The owner's tokens, made on the API as the Account page makes them.
    const token = async (scope: 'read' | 'write', workspaceId = fixture.workspaceId) => {
      const res = await clients.owner.post('/api/v1/tokens', { name: `Matrix ${scope} token`, workspaceId, scope });
      if (res.status !== 201) throw new Error(`fixture: token ${res.status} ${res.text}`);
      return res.body as { id: string; token: string };
    };
    const bearer = (t: { token: string }) => new Client({ Authorization: `Bearer ${t.token}` });
    const personal = (await clients.owner.get('/api/v1/workspaces')).body.items.find((w: { personal: boolean }) => w.personal).id as string;
    const [readToken, writeToken, otherToken, revokedToken, expiredToken, revocable] = [
      await token('read'),
      await token('write'),
      await token('write', personal),
      await token('write'),
      await token('write'),
      await token('read'),
    ];
    await clients.owner.delete(`/api/v1/tokens/${revokedToken.id}`);
    await (await testDb()).query("UPDATE access_tokens SET expires_at = now() - interval '1 second' WHERE id = :id", { replacements: { id: expiredToken.id } });
    fixture.ownerTokenId = revocable.id;
    // An account that is then deleted: its cookie and its token stay in their clients.
    const gone = await createUser('deleted');
    const goneClient = await signedInClient(gone.email, 'a-long-password-1');
    const gonePersonal = (await goneClient.get('/api/v1/workspaces')).body.items[0].id as string;
    const goneToken = (await goneClient.post('/api/v1/tokens', { name: 'Matrix doomed token', workspaceId: gonePersonal, scope: 'write' })).body as { token: string };
    const deleted = await goneClient.request('DELETE', '/api/v1/account', { password: 'a-long-password-1', confirm: 'delete my account', workspaces: [{ workspaceId: gonePersonal, action: 'delete' }] });
    if (deleted.status !== 200) throw new Error(`fixture: account deletion ${deleted.status} ${deleted.text}`);
    Object.assign(clients, { deletedSession: goneClient, deletedToken: bearer(goneToken) });
    Object.assign(clients, {
      readToken: bearer(readToken),
      writeToken: bearer(writeToken),
      otherWorkspaceToken: bearer(otherToken),
      revokedToken: bearer(revokedToken),
      expiredToken: bearer(expiredToken),
    });
    await addMember(fixture.workspaceId, users.editor.id, 'editor');
    await addMember(fixture.workspaceId, users.viewer.id, 'viewer');
    fixture.systemId = (await freshSystem(fixture)).id;
    const lesson = await freshLesson(fixture);
    fixture.lessonId = lesson.id;
    fixture.stepId = lesson.stepId;
    fixture.profileId = (await clients.owner.post('/api/v1/profiles', profileBody(fixture))).body.id;
    fixture.measurementId = (await clients.owner.request('POST', '/api/v1/measurements', measurementForm(fixture))).body.id;
    fixture.shareToken = (await clients.owner.post(`/api/v1/systems/${fixture.systemId}/share-links`)).body.token;
    for (const [k, v] of Object.entries(fixture)) if (v === undefined) throw new Error(`fixture ${k} missing`);
  }, 120_000);

  it('has an entry for every route in app/api, and no entry for a route that does not exist', () => {
    const routes = discoverRoutes();
    expect(routes.filter((r) => !(r in MATRIX)), 'routes without an entry in the access matrix').toEqual([]);
    expect(Object.keys(MATRIX).filter((k) => !routes.includes(k)), 'entries for routes that do not exist').toEqual([]);
  });

  for (const [key, entry] of Object.entries(MATRIX)) {
    const expected = withTokens(key, entry.expect);
    it(`${key}: ${ROLES.map((r) => `${r} ${expected[r]}`).join(', ')}`, async () => {
      const [method] = key.split(' ') as [string];
      const got: Partial<Record<Role, number>> = {};
      for (const role of ROLES) {
        const call = await entry.build(fixture, role);
        const res = await fixture.clients[role].request(method, call.path, call.form ?? call.body);
        got[role] = res.status;
        if (res.status >= 400) expect(res.body?.error?.message, `${key} as ${role}: an error answer has a message`).toBeTypeOf('string');
      }
      expect(got).toEqual(expected);
    }, 90_000);
  }
});
