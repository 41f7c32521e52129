/**
 * Revision notes over HTTP against the running app and real PostgreSQL: a note typed when saving, shown in the
 * history and on the revision's own answer; changed afterwards by an editor with PATCH …/revisions/{n} (trimmed,
 * at most 200 characters, empty removes it); viewers 403, outsiders 404 (they learn nothing), anonymous 401.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { lindenStreetDocument } from '@/lib/demo/systems';
import { makeTeam, type Team, WHO, createTeamSystem } from '../helpers/team';

type Json = Record<string, unknown>;

describe('Revision notes', () => {
  let team: Team;
  beforeAll(async () => {
    team = await makeTeam('notes');
  }, 120_000);

  const history = async (id: string) => (await team.clients.viewer.get(`/api/v1/systems/${id}/revisions`)).body.items as Json[];
  const noteOf = async (id: string, revision: number) => (await history(id)).find((r) => r.revision === revision)?.note;

  it('a note typed when saving is stored trimmed with that revision and listed in the history; a save without one has none', async () => {
    const s = await createTeamSystem(team, 'Noted room (invented)');
    const saved = await team.clients.editor.put(`/api/v1/systems/${s.id}`, { name: s.name, document: lindenStreetDocument(), revision: 1, note: '  moved subs to the front corners  ' });
    expect(saved.status, saved.text).toBe(200);
    expect(saved.body.revision).toBe(2);
    expect(await noteOf(s.id, 2)).toBe('moved subs to the front corners');
    const plain = await team.clients.editor.put(`/api/v1/systems/${s.id}`, { name: s.name, document: lindenStreetDocument(), revision: 2 });
    expect(plain.status, plain.text).toBe(200);
    expect(await noteOf(s.id, 3)).toBeNull();
    expect(await noteOf(s.id, 1)).toBe('created');
    // The revision's own answer carries its note too.
    expect((await team.clients.viewer.get(`/api/v1/systems/${s.id}/revisions/2`)).body.note).toBe('moved subs to the front corners');
  }, 60_000);

  it('an editor changes a note after the fact; only the note changes (no new revision); an empty note removes it', async () => {
    const s = await createTeamSystem(team, 'Renoted room (invented)');
    const res = await team.clients.editor.patch(`/api/v1/systems/${s.id}/revisions/1`, { note: ' first layout, subs at the back ' });
    expect(res.status, res.text).toBe(200);
    expect(res.body).toMatchObject({ revision: 1, note: 'first layout, subs at the back' });
    expect(await noteOf(s.id, 1)).toBe('first layout, subs at the back');
    const system = (await team.clients.owner.get(`/api/v1/systems/${s.id}`)).body;
    expect(system.revision).toBe(1);
    expect(system.document).toEqual(s.document);
    const cleared = await team.clients.owner.patch(`/api/v1/systems/${s.id}/revisions/1`, { note: '   ' });
    expect(cleared.status, cleared.text).toBe(200);
    expect(cleared.body.note).toBeNull();
  }, 60_000);

  it('a note of 200 characters is kept; 201 is refused 400 naming the field, and nothing changes', async () => {
    const s = await createTeamSystem(team, 'Long note room (invented)');
    const ok = await team.clients.editor.patch(`/api/v1/systems/${s.id}/revisions/1`, { note: 'n'.repeat(200) });
    expect(ok.status, ok.text).toBe(200);
    const long = await team.clients.editor.patch(`/api/v1/systems/${s.id}/revisions/1`, { note: 'n'.repeat(201) });
    expect(long.status).toBe(400);
    expect(long.body.error.issues).toEqual([{ path: 'note', message: 'note must be at most 200 characters' }]);
    expect(await noteOf(s.id, 1)).toBe('n'.repeat(200));
    const missing = await team.clients.editor.patch(`/api/v1/systems/${s.id}/revisions/1`, {});
    expect(missing.status).toBe(400);
    expect(missing.body.error.issues.map((i: Json) => i.path)).toEqual(['note']);
    const onSave = await team.clients.editor.put(`/api/v1/systems/${s.id}`, { name: s.name, document: lindenStreetDocument(), revision: 1, note: 'x'.repeat(201) });
    expect(onSave.status).toBe(400);
    expect(onSave.body.error.issues.map((i: Json) => i.path)).toEqual(['note']);
    expect((await team.clients.owner.get(`/api/v1/systems/${s.id}`)).body.revision).toBe(1);
  }, 60_000);

  it('access: anonymous 401, outsider 404, viewer 403, editor and owner 200; an unknown revision is 404', async () => {
    const s = await createTeamSystem(team, 'Guarded note room (invented)');
    const got: Record<string, number> = {};
    for (const who of WHO) got[who] = (await team.clients[who].patch(`/api/v1/systems/${s.id}/revisions/1`, { note: `by ${who}` })).status;
    expect(got).toEqual({ anonymous: 401, outsider: 404, viewer: 403, editor: 200, owner: 200 });
    expect(await noteOf(s.id, 1)).toBe('by owner');
    expect((await team.clients.editor.patch(`/api/v1/systems/${s.id}/revisions/9`, { note: 'nowhere' })).status).toBe(404);
    expect((await team.clients.editor.patch(`/api/v1/systems/${s.id}/revisions/zero`, { note: 'nowhere' })).status).toBe(404);
  }, 60_000);
});
