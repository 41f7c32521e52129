/**
 * Share links over HTTP against the running app and real PostgreSQL: who may create, list and
 * revoke them, the public page /s/{token} (200, then 404 once revoked), and copying a shared System
 * into a workspace where the visitor is an editor.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { juniperLaneDocument } from '@/lib/demo/systems';
import { Client } from '../helpers/http';
import { makeTeam, type Team, createTeamSystem as createSystem } from '../helpers/team';


describe('share links', () => {
  let team: Team;
  beforeAll(async () => {
    team = await makeTeam('share');
  }, 120_000);

  it('an editor creates a 256-bit link; the page is open to anyone until it is revoked, then 404', async () => {
    const name = 'Shared <b>screening</b> room (invented)';
    const s = await createSystem(team, name, juniperLaneDocument());
    const created = await team.clients.editor.post(`/api/v1/systems/${s.id}/share-links`);
    expect(created.status).toBe(201);
    const { token, url } = created.body;
    // 32 bytes of base64url: 43 characters of [A-Za-z0-9_-].
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(url).toMatch(new RegExp(`/s/${token}$`));
    const other = await team.clients.owner.post(`/api/v1/systems/${s.id}/share-links`);
    expect(other.body.token).not.toBe(token);

    const listed = await team.clients.owner.get(`/api/v1/systems/${s.id}/share-links`);
    expect(listed.body.items.map((l: { token: string }) => l.token).sort()).toEqual([token, other.body.token].sort());
    expect(listed.body.items.find((l: { token: string }) => l.token === token)).toMatchObject({ createdByName: 'share editor', revokedAt: null });

    const page = await new Client().get(`/s/${token}`);
    expect(page.status).toBe(200);
    expect(page.text).toContain('Shared &lt;b&gt;screening&lt;/b&gt; room (invented)');
    expect(page.text).not.toContain('<b>screening</b>');
    expect(page.text).toContain('Settings sheet');

    // Viewers and outsiders cannot revoke; anonymous callers are asked to sign in.
    expect((await team.clients.viewer.delete(`/api/v1/share-links/${token}`)).status).toBe(403);
    expect((await team.clients.outsider.delete(`/api/v1/share-links/${token}`)).status).toBe(404);
    expect((await team.clients.anonymous.delete(`/api/v1/share-links/${token}`)).status).toBe(401);
    expect((await new Client().get(`/s/${token}`)).status).toBe(200);

    const revoked = await team.clients.editor.delete(`/api/v1/share-links/${token}`);
    expect(revoked.status).toBe(200);
    expect(revoked.body.revokedAt).not.toBeNull();
    expect((await new Client().get(`/s/${token}`)).status).toBe(404);
    expect((await team.clients.owner.get(`/s/${token}`)).status).toBe(404);
    // The other link still works, and the revoked one is gone from the list.
    expect((await new Client().get(`/s/${other.body.token}`)).status).toBe(200);
    const after = await team.clients.owner.get(`/api/v1/systems/${s.id}/share-links`);
    expect(after.body.items.map((l: { token: string }) => l.token)).toEqual([other.body.token]);
    // Revoking twice is harmless.
    expect((await team.clients.editor.delete(`/api/v1/share-links/${token}`)).status).toBe(200);
  }, 120_000);

  it('unknown and malformed tokens are 404', async () => {
    expect((await new Client().get('/s/AAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAA')).status).toBe(404);
    expect((await new Client().get('/s/not%20a%20token')).status).toBe(404);
    expect((await team.clients.owner.delete('/api/v1/share-links/AAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAA')).status).toBe(404);
  }, 60_000);

  it("a deleted System's link answers 404 until the System is restored", async () => {
    const s = await createSystem(team);
    const { token } = (await team.clients.owner.post(`/api/v1/systems/${s.id}/share-links`)).body;
    await team.clients.owner.delete(`/api/v1/systems/${s.id}`);
    expect((await new Client().get(`/s/${token}`)).status).toBe(404);
    await team.clients.owner.post(`/api/v1/systems/${s.id}/restore`);
    expect((await new Client().get(`/s/${token}`)).status).toBe(200);
  }, 60_000);

  it('the shared page shows the latest saved revision', async () => {
    const s = await createSystem(team, 'Before the save');
    const { token } = (await team.clients.owner.post(`/api/v1/systems/${s.id}/share-links`)).body;
    await team.clients.owner.put(`/api/v1/systems/${s.id}`, { name: 'After the save', document: s.document, revision: 1 });
    const page = await new Client().get(`/s/${token}`);
    expect(page.text).toContain('After the save');
  }, 60_000);
});

describe('copying a shared System', () => {
  let team: Team;
  let token = '';
  let source: Awaited<ReturnType<typeof createSystem>>;
  beforeAll(async () => {
    team = await makeTeam('copy');
    source = await createSystem(team, 'Copy me (invented)', juniperLaneDocument());
    token = (await team.clients.owner.post(`/api/v1/systems/${source.id}/share-links`)).body.token;
  }, 120_000);

  it('a signed-in visitor copies it into a workspace where they are an editor, as revision 1', async () => {
    const ws = await team.clients.outsider.get('/api/v1/workspaces');
    const personal = ws.body.items.find((w: { personal: boolean }) => w.personal);
    const copy = await team.clients.outsider.post(`/api/v1/shared/${token}/copy`, { workspaceId: personal.id });
    expect(copy.status).toBe(201);
    expect(copy.body).toMatchObject({ name: 'Copy me (invented) (copy)', revision: 1, workspaceId: personal.id, ownerName: 'copy outsider' });
    expect(copy.body.document).toEqual(source.document);
    const history = await team.clients.outsider.get(`/api/v1/systems/${copy.body.id}/revisions`);
    expect(history.body.items[0].note).toMatch(/copied from a share link/);
    // The copy is theirs: the source's team cannot see it, and editing it leaves the source alone.
    expect((await team.clients.owner.get(`/api/v1/systems/${copy.body.id}`)).status).toBe(404);
    await team.clients.outsider.put(`/api/v1/systems/${copy.body.id}`, { name: 'Mine now', document: copy.body.document, revision: 1 });
    expect((await team.clients.owner.get(`/api/v1/systems/${source.id}`)).body.name).toBe('Copy me (invented)');
    const named = await team.clients.outsider.post(`/api/v1/shared/${token}/copy`, { workspaceId: personal.id, name: 'My variant' });
    expect(named.body.name).toBe('My variant');
  }, 60_000);

  it('refuses anonymous visitors (401), a workspace where they only view (403) or are not a member (404)', async () => {
    expect((await team.clients.anonymous.post(`/api/v1/shared/${token}/copy`, { workspaceId: team.workspaceId })).status).toBe(401);
    expect((await team.clients.viewer.post(`/api/v1/shared/${token}/copy`, { workspaceId: team.workspaceId })).status).toBe(403);
    expect((await team.clients.outsider.post(`/api/v1/shared/${token}/copy`, { workspaceId: team.workspaceId })).status).toBe(404);
    const bad = await team.clients.outsider.post(`/api/v1/shared/${token}/copy`, { workspaceId: 'nope' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues[0].path).toBe('workspaceId');
  }, 60_000);

  it('a revoked link can no longer be copied', async () => {
    const { token: t } = (await team.clients.owner.post(`/api/v1/systems/${source.id}/share-links`)).body;
    await team.clients.owner.delete(`/api/v1/share-links/${t}`);
    const ws = (await team.clients.outsider.get('/api/v1/workspaces')).body.items[0];
    expect((await team.clients.outsider.post(`/api/v1/shared/${t}/copy`, { workspaceId: ws.id })).status).toBe(404);
  }, 60_000);
});
