/**
 * Library API over HTTP against the running app and real PostgreSQL: the role matrix on every
 * Systems route, revision conflicts, history, soft delete and restore, downloads, names kept
 * verbatim, and last-owner protection. Each run makes its own workspace and people.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { juniperLaneDocument, lindenStreetDocument } from '@/lib/demo/systems';
import { Client } from '../helpers/http';
import { testDb } from '../helpers/db';
import { makeTeam, type Team, type Who, WHO, createTeamSystem as createSystem } from '../helpers/team';


const expected = (who: Who, need: 'viewer' | 'editor', ok: number) =>
  who === 'anonymous' ? 401 : who === 'outsider' ? 404 : who === 'viewer' && need === 'editor' ? 403 : ok;

describe('Systems routes: the role matrix', () => {
  let team: Team;
  beforeAll(async () => {
    team = await makeTeam('matrix');
  }, 120_000);

  type Fixture = { id: string; revision: number };
  interface Case {
    name: string;
    need: 'viewer' | 'editor';
    ok: number;
    /** Makes what the call acts on (a fresh System by default, deleted for the restore route). */
    setup?: (team: Team) => Promise<Fixture>;
    call: (c: Client, f: Fixture) => Promise<{ status: number; text: string }>;
  }
  const fresh = async (t: Team) => createSystem(t);
  const freshDeleted = async (t: Team) => {
    const s = await createSystem(t);
    expect((await t.clients.owner.delete(`/api/v1/systems/${s.id}`)).status).toBe(200);
    return s;
  };
  const cases: Case[] = [
    { name: 'GET /systems/{id}', need: 'viewer', ok: 200, call: (c, f) => c.get(`/api/v1/systems/${f.id}`) },
    { name: 'PUT /systems/{id}', need: 'editor', ok: 200, call: (c, f) => c.put(`/api/v1/systems/${f.id}`, { name: 'Saved by matrix', document: lindenStreetDocument(), revision: f.revision }) },
    { name: 'PATCH /systems/{id} (rename)', need: 'editor', ok: 200, call: (c, f) => c.patch(`/api/v1/systems/${f.id}`, { name: 'Renamed by matrix', revision: f.revision }) },
    { name: 'DELETE /systems/{id}', need: 'editor', ok: 200, call: (c, f) => c.delete(`/api/v1/systems/${f.id}`) },
    { name: 'POST /systems/{id}/restore', need: 'editor', ok: 200, setup: freshDeleted, call: (c, f) => c.post(`/api/v1/systems/${f.id}/restore`) },
    { name: 'POST /systems/{id}/duplicate', need: 'editor', ok: 201, call: (c, f) => c.post(`/api/v1/systems/${f.id}/duplicate`, {}) },
    { name: 'GET /systems/{id}/revisions', need: 'viewer', ok: 200, call: (c, f) => c.get(`/api/v1/systems/${f.id}/revisions`) },
    { name: 'GET /systems/{id}/revisions/1', need: 'viewer', ok: 200, call: (c, f) => c.get(`/api/v1/systems/${f.id}/revisions/1`) },
    { name: 'POST /systems/{id}/revisions/1/restore', need: 'editor', ok: 200, call: (c, f) => c.post(`/api/v1/systems/${f.id}/revisions/1/restore`, { revision: f.revision }) },
    { name: 'POST /systems/{id}/share-links', need: 'editor', ok: 201, call: (c, f) => c.post(`/api/v1/systems/${f.id}/share-links`) },
    { name: 'GET /systems/{id}/share-links', need: 'editor', ok: 200, call: (c, f) => c.get(`/api/v1/systems/${f.id}/share-links`) },
    { name: 'GET /systems/{id}/export?format=json', need: 'viewer', ok: 200, call: (c, f) => c.get(`/api/v1/systems/${f.id}/export?format=json`) },
    { name: 'GET /systems/{id}/export?format=csv', need: 'viewer', ok: 200, call: (c, f) => c.get(`/api/v1/systems/${f.id}/export?format=csv`) },
  ];

  for (const c of cases) {
    it(`${c.name}: anonymous 401, outsider 404, viewer ${c.need === 'editor' ? 403 : c.ok}, editor and owner ${c.ok}`, async () => {
      const got: Record<string, number> = {};
      const want: Record<string, number> = {};
      for (const who of WHO) {
        const f = await (c.setup ?? fresh)(team);
        const res = await c.call(team.clients[who], f);
        got[who] = res.status;
        want[who] = expected(who, c.need, c.ok);
        if (res.status >= 400) expect(JSON.parse(res.text).error.code, `${who}: ${res.text}`).toMatch(/^(unauthorized|not_found|forbidden)$/);
      }
      expect(got).toEqual(want);
    }, 120_000);
  }

  it('POST /systems into the workspace: anonymous 401, outsider 404, viewer 403, editor and owner 201', async () => {
    const got: Record<string, number> = {};
    for (const who of WHO) got[who] = (await team.clients[who].post('/api/v1/systems', { name: `Made by ${who}`, document: lindenStreetDocument(), workspaceId: team.workspaceId })).status;
    expect(got).toEqual({ anonymous: 401, outsider: 404, viewer: 403, editor: 201, owner: 201 });
  }, 60_000);

  it('GET /systems lists the workspace to its members only', async () => {
    const s = await createSystem(team, `Listed ${Date.now()}`);
    expect((await team.clients.anonymous.get('/api/v1/systems')).status).toBe(401);
    for (const who of ['viewer', 'editor', 'owner'] as const) {
      const res = await team.clients[who].get(`/api/v1/systems?workspaceId=${team.workspaceId}&pageSize=100`);
      expect(res.status).toBe(200);
      expect(res.body.items.map((i: { id: string }) => i.id)).toContain(s.id);
    }
    const outsider = await team.clients.outsider.get(`/api/v1/systems?workspaceId=${team.workspaceId}`);
    expect(outsider.status).toBe(200);
    expect(outsider.body).toMatchObject({ items: [], total: 0 });
  }, 60_000);
});

describe('saving: revisions and conflicts', () => {
  let team: Team;
  beforeAll(async () => {
    team = await makeTeam('save');
  }, 120_000);

  it('two concurrent saves of one revision: exactly one 200 and one 409 with currentRevision, the loser changing nothing', async () => {
    for (let round = 0; round < 5; round++) {
      const s = await createSystem(team, `Race ${round}`);
      const docA = { ...lindenStreetDocument(), notes: 'editor wins' };
      const docB = { ...lindenStreetDocument(), notes: 'owner wins' };
      const [a, b] = await Promise.all([
        team.clients.editor.put(`/api/v1/systems/${s.id}`, { name: 'By editor', document: docA, revision: 1 }),
        team.clients.owner.put(`/api/v1/systems/${s.id}`, { name: 'By owner', document: docB, revision: 1 }),
      ]);
      expect([a.status, b.status].sort()).toEqual([200, 409]);
      const [winner, loser] = a.status === 200 ? [a, b] : [b, a];
      expect(loser.body.error.code).toBe('conflict');
      expect(loser.body.error.currentRevision).toBe(2);
      const now = await team.clients.owner.get(`/api/v1/systems/${s.id}`);
      expect(now.body.revision).toBe(2);
      expect(now.body.name).toBe(winner.body.name);
      expect(now.body.document.notes).toBe(winner.body.document.notes);
      const history = await team.clients.owner.get(`/api/v1/systems/${s.id}/revisions`);
      expect(history.body.items.map((r: { revision: number }) => r.revision)).toEqual([2, 1]);
    }
  }, 120_000);

  it('a stale revision is refused with 409 and the current revision; saving again on it succeeds', async () => {
    const s = await createSystem(team);
    expect((await team.clients.editor.put(`/api/v1/systems/${s.id}`, { name: 'First', document: s.document, revision: 1 })).status).toBe(200);
    const stale = await team.clients.owner.put(`/api/v1/systems/${s.id}`, { name: 'Stale', document: s.document, revision: 1 });
    expect(stale.status).toBe(409);
    expect(stale.body.error).toMatchObject({ code: 'conflict', currentRevision: 2 });
    expect(stale.body.error.message).toMatch(/revision 2/);
    const retry = await team.clients.owner.put(`/api/v1/systems/${s.id}`, { name: 'Stale, reapplied', document: s.document, revision: 2 });
    expect(retry.status).toBe(200);
    expect(retry.body.revision).toBe(3);
  }, 60_000);

  it('an invalid save names the field and changes nothing', async () => {
    const s = await createSystem(team);
    const bad = { ...s.document, room: { ...s.document.room, lengthM: -3 } };
    const res = await team.clients.editor.put(`/api/v1/systems/${s.id}`, { name: 'Broken', document: bad, revision: 1 });
    expect(res.status).toBe(400);
    expect(res.body.error.issues.map((i: { path: string }) => i.path)).toContain('document.room.lengthM');
    const missing = await team.clients.editor.put(`/api/v1/systems/${s.id}`, { name: 'No revision', document: s.document });
    expect(missing.status).toBe(400);
    expect(missing.body.error.issues[0].path).toBe('revision');
    const now = await team.clients.editor.get(`/api/v1/systems/${s.id}`);
    expect(now.body).toMatchObject({ revision: 1, name: s.name });
    expect(now.body.document.room.lengthM).toBe(s.document.room.lengthM);
  }, 60_000);

  it('history records who and when; a revision can be read and restored as a new revision', async () => {
    const s = await createSystem(team, 'History room (invented)', juniperLaneDocument());
    const changed = { ...s.document, bassManagement: { ...s.document.bassManagement, crossoverHz: 100 } };
    const two = await team.clients.editor.put(`/api/v1/systems/${s.id}`, { name: 'History room, 100 Hz', document: changed, revision: 1 });
    expect(two.status).toBe(200);
    const history = await team.clients.viewer.get(`/api/v1/systems/${s.id}/revisions`);
    expect(history.status).toBe(200);
    const [r2, r1] = history.body.items;
    expect(r2).toMatchObject({ revision: 2, name: 'History room, 100 Hz', authorName: 'save editor' });
    expect(r1).toMatchObject({ revision: 1, name: 'History room (invented)', authorName: 'save owner', note: 'created' });
    expect(Date.parse(r2.createdAt)).toBeGreaterThanOrEqual(Date.parse(r1.createdAt));

    const old = await team.clients.viewer.get(`/api/v1/systems/${s.id}/revisions/1`);
    expect(old.body.document.bassManagement.crossoverHz).toBe(s.document.bassManagement.crossoverHz);
    expect((await team.clients.viewer.get(`/api/v1/systems/${s.id}/revisions/9`)).status).toBe(404);
    expect((await team.clients.viewer.get(`/api/v1/systems/${s.id}/revisions/x`)).status).toBe(404);

    // Restoring needs the current revision: a stale one is a conflict.
    expect((await team.clients.editor.post(`/api/v1/systems/${s.id}/revisions/1/restore`, { revision: 1 })).status).toBe(409);
    const restored = await team.clients.editor.post(`/api/v1/systems/${s.id}/revisions/1/restore`, { revision: 2 });
    expect(restored.status).toBe(200);
    expect(restored.body).toMatchObject({ revision: 3, name: 'History room (invented)' });
    expect(restored.body.document.bassManagement.crossoverHz).toBe(s.document.bassManagement.crossoverHz);
    const after = await team.clients.viewer.get(`/api/v1/systems/${s.id}/revisions`);
    expect(after.body.items.map((r: { revision: number; note: string | null }) => [r.revision, r.note])).toEqual([
      [3, 'restored revision 1'],
      [2, null],
      [1, 'created'],
    ]);
  }, 60_000);

  it('rename and duplicate are revisions and copies, never overwrites', async () => {
    const s = await createSystem(team, 'Original (invented)');
    const renamed = await team.clients.editor.patch(`/api/v1/systems/${s.id}`, { name: 'Renamed (invented)', revision: 1 });
    expect(renamed.body).toMatchObject({ revision: 2, name: 'Renamed (invented)' });
    const copy = await team.clients.editor.post(`/api/v1/systems/${s.id}/duplicate`, {});
    expect(copy.status).toBe(201);
    expect(copy.body).toMatchObject({ name: 'Renamed (invented) (copy)', revision: 1, workspaceId: team.workspaceId });
    expect(copy.body.id).not.toBe(s.id);
    expect(copy.body.document).toEqual(renamed.body.document);
    const named = await team.clients.editor.post(`/api/v1/systems/${s.id}/duplicate`, { name: 'Variant B' });
    expect(named.body.name).toBe('Variant B');
  }, 60_000);
});

describe('the Library list, soft delete and restore', () => {
  let team: Team;
  beforeAll(async () => {
    team = await makeTeam('list');
  }, 120_000);

  it('searches, filters by tag, sorts and pages', async () => {
    const tag = `t${Date.now().toString(36)}`;
    for (const name of ['Cedar room', 'alder room', 'Birch room']) {
      await createSystem(team, name, { ...lindenStreetDocument(), tags: [tag] });
    }
    await createSystem(team, 'Untagged cedar', lindenStreetDocument());
    const base = `/api/v1/systems?workspaceId=${team.workspaceId}`;
    const byTag = await team.clients.viewer.get(`${base}&tag=${tag}&sort=name`);
    expect(byTag.body.total).toBe(3);
    const names = byTag.body.items.map((i: { name: string }) => i.name);
    // Case-insensitive by name.
    expect(names).toEqual(['alder room', 'Birch room', 'Cedar room']);
    expect(byTag.body.tags).toContain(tag);
    const desc = await team.clients.viewer.get(`${base}&tag=${tag}&sort=-name`);
    expect(desc.body.items.map((i: { name: string }) => i.name)).toEqual([...names].reverse());
    const q = await team.clients.viewer.get(`${base}&q=cedar`);
    expect(q.body.items.map((i: { name: string }) => i.name).sort()).toEqual(['Cedar room', 'Untagged cedar']);
    const page1 = await team.clients.viewer.get(`${base}&pageSize=2&page=1&sort=-updated`);
    const page2 = await team.clients.viewer.get(`${base}&pageSize=2&page=2&sort=-updated`);
    expect(page1.body.total).toBe(4);
    expect(page1.body.items).toHaveLength(2);
    expect(page2.body.items).toHaveLength(2);
    expect(page1.body.items[0].name).toBe('Untagged cedar');
    const seen = new Set([...page1.body.items, ...page2.body.items].map((i: { id: string }) => i.id));
    expect(seen.size).toBe(4);
    expect(page1.body.items[0]).toMatchObject({ ownerName: 'list owner', lastEditorName: 'list owner' });
    const bad = await team.clients.viewer.get(`${base}&sort=colour&page=0`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(['page', 'sort']);
    // A % in the search is a character, not a wildcard.
    expect((await team.clients.viewer.get(`${base}&q=%25`)).body.total).toBe(0);
  }, 60_000);

  it('a deleted System leaves the list, shows under recently deleted, and comes back whole', async () => {
    const s = await createSystem(team, 'Deleted then restored (invented)', juniperLaneDocument());
    await team.clients.editor.put(`/api/v1/systems/${s.id}`, { name: s.name, document: { ...s.document, notes: 'second' }, revision: 1 });
    expect((await team.clients.editor.delete(`/api/v1/systems/${s.id}`)).status).toBe(200);
    expect((await team.clients.owner.get(`/api/v1/systems/${s.id}`)).status).toBe(404);
    expect((await team.clients.owner.put(`/api/v1/systems/${s.id}`, { name: 'x', document: s.document, revision: 2 })).status).toBe(404);
    const live = await team.clients.owner.get(`/api/v1/systems?workspaceId=${team.workspaceId}&pageSize=100`);
    expect(live.body.items.map((i: { id: string }) => i.id)).not.toContain(s.id);
    const deleted = await team.clients.owner.get(`/api/v1/systems?workspaceId=${team.workspaceId}&deleted=1`);
    const row = deleted.body.items.find((i: { id: string }) => i.id === s.id);
    expect(row.deletedAt).not.toBeNull();
    const restored = await team.clients.editor.post(`/api/v1/systems/${s.id}/restore`);
    expect(restored.status).toBe(200);
    expect(restored.body).toMatchObject({ id: s.id, revision: 2, deletedAt: null });
    expect(restored.body.document.notes).toBe('second');
    expect((await team.clients.owner.get(`/api/v1/systems/${s.id}/revisions`)).body.items).toHaveLength(2);
  }, 60_000);

  it('after 30 days a deleted System can no longer be restored', async () => {
    const s = await createSystem(team);
    await team.clients.owner.delete(`/api/v1/systems/${s.id}`);
    const db = await testDb();
    await db.query("UPDATE systems SET deleted_at = now() - interval '31 days' WHERE id = :id", { replacements: { id: s.id } });
    expect((await team.clients.owner.post(`/api/v1/systems/${s.id}/restore`)).status).toBe(404);
    const deleted = await team.clients.owner.get(`/api/v1/systems?workspaceId=${team.workspaceId}&deleted=1&pageSize=100`);
    expect(deleted.body.items.map((i: { id: string }) => i.id)).not.toContain(s.id);
  }, 60_000);

  it('names are stored verbatim and escaped in the Library page', async () => {
    const name = `<script>alert("x")</script> & Ümlaut 'quoted'`;
    const s = await createSystem(team, name);
    expect((await team.clients.viewer.get(`/api/v1/systems/${s.id}`)).body.name).toBe(name);
    const page = await team.clients.viewer.get(`/library?q=${encodeURIComponent('alert')}`);
    expect(page.status).toBe(200);
    expect(page.text).not.toContain('<script>alert("x")');
    expect(page.text).toContain('&lt;script&gt;alert');
  }, 60_000);

  it('unknown or malformed ids are 404, bad bodies 400/415', async () => {
    expect((await team.clients.owner.get('/api/v1/systems/00000000-0000-4000-8000-000000000000')).status).toBe(404);
    expect((await team.clients.owner.get('/api/v1/systems/not-an-id')).status).toBe(404);
    expect((await team.clients.owner.post('/api/v1/systems', 'name=x', { 'Content-Type': 'text/plain' })).status).toBe(415);
    const noName = await team.clients.owner.post('/api/v1/systems', { name: '  ', document: lindenStreetDocument() });
    expect(noName.status).toBe(400);
    expect(noName.body.error.issues[0]).toEqual({ path: 'name', message: 'name is required' });
  }, 60_000);
});

describe('downloads', () => {
  it('JSON is the document with its name and revision; CSV is the Settings sheet, one row per channel and sub, then the seat-to-seat spread', async () => {
    const team = await makeTeam('download');
    const s = await createSystem(team, 'Juniper, "quoted" (invented)', juniperLaneDocument());
    const j = await team.clients.viewer.get(`/api/v1/systems/${s.id}/export?format=json`);
    expect(j.headers.get('content-disposition')).toMatch(/attachment; filename="juniper-quoted-invented-r1\.json"/);
    expect(JSON.parse(j.text)).toMatchObject({ name: s.name, revision: 1, document: s.document });
    const c = await team.clients.viewer.get(`/api/v1/systems/${s.id}/export?format=csv`);
    expect(c.headers.get('content-type')).toMatch(/text\/csv/);
    const lines = c.text.trim().split('\r\n');
    expect(lines[0]).toBe('system,revision,kind,id,label,profile,distanceM,distanceSource,delayMs,trimDb,gainDb,polarity,crossoverHz,filter,slope,count,ownDelayMs,bandHz,meanSpreadDb,maxSpreadDb,maxSpreadHz,meanLevelDb');
    const doc = juniperLaneDocument();
    // Then the seat-to-seat spread, all subs neutral and with the System's settings.
    expect(lines).toHaveLength(1 + doc.speakers.length + doc.subs.length + 2);
    expect(lines.slice(-2).map((l) => l.match(/^"[^"]*(?:""[^"]*)*",1,([a-z-]+),([a-z]+),/)?.slice(1))).toEqual([['seat-spread', 'neutral'], ['seat-spread', 'system']]);
    expect(lines[1]).toMatch(/^"Juniper, ""quoted"" \(invented\)",1,channel,l,L,/);
    expect((await team.clients.viewer.get(`/api/v1/systems/${s.id}/export?format=pdf`)).status).toBe(400);
  }, 120_000);
});

describe('workspaces: last-owner protection', () => {
  it('the last owner can neither leave nor be demoted; with a second owner both work', async () => {
    const team = await makeTeam('owners');
    const { owner, editor } = team.clients;
    const leave = await owner.delete(`/api/v1/workspaces/${team.workspaceId}/members/${team.ids.owner}`);
    expect(leave.status).toBe(409);
    expect(leave.body.error.message).toMatch(/at least one owner/);
    expect((await owner.patch(`/api/v1/workspaces/${team.workspaceId}/members/${team.ids.owner}`, { role: 'editor' })).status).toBe(409);
    expect((await editor.patch(`/api/v1/workspaces/${team.workspaceId}/members/${team.ids.editor}`, { role: 'owner' })).status).toBe(403);
    expect((await owner.patch(`/api/v1/workspaces/${team.workspaceId}/members/${team.ids.editor}`, { role: 'owner' })).status).toBe(200);
    expect((await owner.patch(`/api/v1/workspaces/${team.workspaceId}/members/${team.ids.owner}`, { role: 'editor' })).status).toBe(200);
    const members = await editor.get(`/api/v1/workspaces/${team.workspaceId}/members`);
    const roles = Object.fromEntries(members.body.items.map((m: { userId: string; role: string }) => [m.userId, m.role]));
    expect(roles[team.ids.editor]).toBe('owner');
    expect(roles[team.ids.owner]).toBe('editor');
    // The one owner left cannot leave either.
    expect((await editor.delete(`/api/v1/workspaces/${team.workspaceId}/members/${team.ids.editor}`)).status).toBe(409);
    expect((await team.clients.viewer.delete(`/api/v1/workspaces/${team.workspaceId}/members/${team.ids.viewer}`)).status).toBe(200);
    expect((await team.clients.viewer.get(`/api/v1/systems?workspaceId=${team.workspaceId}`)).body.total).toBe(0);
  }, 120_000);
});
