/**
 * Speaker profiles over HTTP against the running app and real PostgreSQL: the role matrix,
 * validation by field, create/read/update/delete, and the seeded invented demo profiles.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { Client, signedInClient } from '../helpers/http';
import { makeTeam, type Team, WHO } from '../helpers/team';


const SUB = {
  name: 'Fenwick F10 test sub (invented)',
  kind: 'sub',
  lowRolloff: { kind: 'sealed', cornerHz: 28, q: 0.65 },
  highRolloff: { kind: 'lowpass', cornerHz: 180, q: 0.7 },
  sensitivityDb: 87,
  sensitivityReference: '1W',
  ratedPowerW: 350,
  impedanceOhm: 4,
  notes: 'Invented for a test.',
};

describe('Speaker profiles', () => {
  let team: Team;
  beforeAll(async () => {
    team = await makeTeam('profiles');
  }, 120_000);

  async function freshProfile() {
    const res = await team.clients.owner.post('/api/v1/profiles', { ...SUB, workspaceId: team.workspaceId });
    expect(res.status, res.text).toBe(201);
    return res.body as { id: string };
  }

  it('role matrix: reads for members, writes for editors and owners', async () => {
    const routes: { name: string; need: 'viewer' | 'editor'; ok: number; call: (c: Client, id: string) => Promise<{ status: number }> }[] = [
      { name: 'GET /profiles/{id}', need: 'viewer', ok: 200, call: (c, id) => c.get(`/api/v1/profiles/${id}`) },
      { name: 'PUT /profiles/{id}', need: 'editor', ok: 200, call: (c, id) => c.put(`/api/v1/profiles/${id}`, { ...SUB, impedanceOhm: 8 }) },
      { name: 'DELETE /profiles/{id}', need: 'editor', ok: 200, call: (c, id) => c.delete(`/api/v1/profiles/${id}`) },
      { name: 'POST /profiles', need: 'editor', ok: 201, call: (c) => c.post('/api/v1/profiles', { ...SUB, workspaceId: team.workspaceId }) },
    ];
    const got: Record<string, Record<string, number>> = {};
    const want: Record<string, Record<string, number>> = {};
    for (const r of routes) {
      got[r.name] = {};
      want[r.name] = {};
      for (const who of WHO) {
        const { id } = await freshProfile();
        got[r.name]![who] = (await r.call(team.clients[who], id)).status;
        want[r.name]![who] = who === 'anonymous' ? 401 : who === 'outsider' ? 404 : who === 'viewer' && r.need === 'editor' ? 403 : r.ok;
      }
    }
    expect(got).toEqual(want);
    expect((await team.clients.anonymous.get('/api/v1/profiles')).status).toBe(401);
    const outsiderList = await team.clients.outsider.get(`/api/v1/profiles?workspaceId=${team.workspaceId}`);
    expect(outsiderList.body).toEqual({ items: [], total: 0 });
  }, 180_000);

  it('create, read, list by kind, update and delete', async () => {
    const created = await team.clients.editor.post('/api/v1/profiles', { ...SUB, workspaceId: team.workspaceId });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ ...SUB, workspaceId: team.workspaceId, createdByName: 'profiles editor' });
    const id = created.body.id;
    const main = await team.clients.editor.post('/api/v1/profiles', {
      ...SUB,
      name: 'Fenwick M5 test monitor (invented)',
      kind: 'main',
      lowRolloff: { kind: 'vented', cornerHz: 48 },
      highRolloff: { kind: 'none' },
      sensitivityReference: '2.83V',
      workspaceId: team.workspaceId,
    });
    expect(main.status).toBe(201);
    const subs = await team.clients.viewer.get(`/api/v1/profiles?workspaceId=${team.workspaceId}&kind=sub&q=F10`);
    expect(subs.body.items.map((p: { id: string }) => p.id)).toContain(id);
    expect(subs.body.items.every((p: { kind: string }) => p.kind === 'sub')).toBe(true);
    const mains = await team.clients.viewer.get(`/api/v1/profiles?workspaceId=${team.workspaceId}&kind=main`);
    expect(mains.body.items.map((p: { name: string }) => p.name)).toEqual(['Fenwick M5 test monitor (invented)']);

    const updated = await team.clients.editor.put(`/api/v1/profiles/${id}`, { ...SUB, name: 'Fenwick F10 mk2 (invented)', ratedPowerW: 500, notes: '' });
    expect(updated.status).toBe(200);
    expect(updated.body).toMatchObject({ id, name: 'Fenwick F10 mk2 (invented)', ratedPowerW: 500, notes: '' });
    expect((await team.clients.viewer.get(`/api/v1/profiles/${id}`)).body.ratedPowerW).toBe(500);

    expect((await team.clients.editor.delete(`/api/v1/profiles/${id}`)).status).toBe(200);
    expect((await team.clients.viewer.get(`/api/v1/profiles/${id}`)).status).toBe(404);
    expect((await team.clients.editor.delete(`/api/v1/profiles/${id}`)).status).toBe(404);
  }, 60_000);

  it('bad fields are named and change nothing', async () => {
    const { id } = await freshProfile();
    const bad = await team.clients.editor.put(`/api/v1/profiles/${id}`, { ...SUB, sensitivityDb: 200, lowRolloff: { kind: 'sealed', cornerHz: 28 }, kind: 'tweeter' });
    expect(bad.status).toBe(400);
    const paths = bad.body.error.issues.map((i: { path: string }) => i.path).sort();
    expect(paths).toEqual(['kind', 'lowRolloff.q', 'sensitivityDb']);
    expect(bad.body.error.issues.find((i: { path: string }) => i.path === 'sensitivityDb').message).toBe('sensitivityDb must be at most 130');
    expect((await team.clients.viewer.get(`/api/v1/profiles/${id}`)).body).toMatchObject(SUB);
    const noName = await team.clients.editor.post('/api/v1/profiles', { ...SUB, name: '' });
    expect(noName.status).toBe(400);
    expect(noName.body.error.issues[0]).toEqual({ path: 'name', message: 'name is required' });
    expect((await team.clients.editor.get('/api/v1/profiles/not-an-id')).status).toBe(404);
    expect((await team.clients.editor.get('/api/v1/profiles?kind=tweeter')).status).toBe(400);
  }, 60_000);

  it("without a workspaceId a profile goes to the caller's personal workspace", async () => {
    const res = await team.clients.outsider.post('/api/v1/profiles', SUB);
    expect(res.status).toBe(201);
    const personal = (await team.clients.outsider.get('/api/v1/workspaces')).body.items.find((w: { personal: boolean }) => w.personal);
    expect(res.body.workspaceId).toBe(personal.id);
  }, 60_000);
});

describe('the seeded demo', () => {
  it('Larkspur AV holds the four invented demo profiles, two mains and two subs', async () => {
    const demo = await signedInClient('demo@seamline.test');
    const larkspur = (await demo.get('/api/v1/workspaces')).body.items.find((w: { name: string }) => w.name === 'Larkspur AV');
    const res = await demo.get(`/api/v1/profiles?workspaceId=${larkspur.id}`);
    const names = res.body.items.map((p: { name: string }) => p.name);
    for (const n of ['Quillon B6 bookshelf (invented)', 'Quillon T8 tower (invented)', 'Marrow S12 sealed sub (invented)', 'Marrow V15 vented sub (invented)']) expect(names).toContain(n);
    expect(res.body.items.filter((p: { kind: string }) => p.kind === 'main').length).toBeGreaterThanOrEqual(2);
    const viewer = await signedInClient('viewer@seamline.test');
    expect((await viewer.get(`/api/v1/profiles?workspaceId=${larkspur.id}`)).body.total).toBe(res.body.total);
    const other = await signedInClient('other@seamline.test');
    expect((await other.get(`/api/v1/profiles?workspaceId=${larkspur.id}`)).body.total).toBe(0);
  }, 60_000);
});
