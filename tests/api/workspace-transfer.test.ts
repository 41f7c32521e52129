import { unzipSync, strFromU8 } from 'fflate';
import { beforeAll, describe, expect, it } from 'vitest';
import { demoProfile } from '@/lib/demo/profiles';
import { juniperLaneDocument, lindenStreetDocument } from '@/lib/demo/systems';
import { Client, sessionCookie, signedInClient, uniqueEmail } from '../helpers/http';
import { makeTeam, type Team } from '../helpers/team';
import { baseUrl } from '../helpers/env';
import { comparable, rowCounts, smallWorkspaceFile } from '../helpers/transfer';
import { uploadForm } from '../helpers/wav-upload';
import { wavBytes } from '../helpers/wav-bytes';

/**
 * Workspace export and import (issue 19): a workspace goes out as one file and comes back whole. The oracle for what an
 * export holds is the API's own reads of the same rows (revisions, measurements, profiles, Lessons); the round trip
 * exports, imports into an empty workspace and exports again, and the two files must be equal apart from ids, keys,
 * the export time and people who are not members where the file went (tests/helpers/transfer.ts `comparable`).
 */

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- files are read as plain JSON
type Json = any;
const PASSWORD = 'a-long-password-1';
const MARK = `xfer${Date.now().toString(36)}`;

async function freshUser(label: string): Promise<{ client: Client; email: string; id: string }> {
  const email = uniqueEmail(`${MARK}-${label}`);
  const res = await new Client().post('/api/v1/auth/sign-up', { name: `Transfer ${label} (invented)`, email, password: PASSWORD });
  if (res.status !== 201) throw new Error(`sign-up ${res.status} ${res.text}`);
  return { client: await signedInClient(email, PASSWORD), email, id: res.body.id };
}

async function exportOf(client: Client, workspaceId: string): Promise<{ file: Json; res: Awaited<ReturnType<Client['get']>> }> {
  const res = await client.get(`/api/v1/workspaces/${workspaceId}/export`);
  expect(res.status, res.text.slice(0, 300)).toBe(200);
  return { file: JSON.parse(res.text), res };
}

async function importFile(client: Client, file: unknown, query = ''): Promise<Json> {
  const res = await client.post(`/api/v1/workspaces/import${query}`, file);
  expect(res.status, res.text.slice(0, 500)).toBe(201);
  return res.body;
}

/** Nothing secret in a file: no password hash, access token, invitation, reset or share token. */
function expectNoSecrets(text: string) {
  for (const word of ['password', 'passwordHash', 'tokenHash', 'token_hash', 'slp_', '$2a$', '$2b$', 'shareLink', '/s/']) expect(text, `the file holds "${word}"`).not.toContain(word);
}

/** An invented impulse: a decaying 100 Hz ring 10 ms into a 0.5 s file at 48 kHz, peak 0.5 (made up for the test). */
function inventedImpulse(): number[] {
  const raw = Array.from({ length: 24_000 }, (_, n) => (n < 480 ? 0 : Math.exp(-(n - 480) / 300) * Math.sin((2 * Math.PI * 100 * (n - 480)) / 48_000 + 0.3)));
  const peak = Math.max(...raw.map(Math.abs));
  return raw.map((x) => (0.5 * x) / peak);
}

function textCurve(offsetDb: number): Blob {
  const lines = Array.from({ length: 24 }, (_, i) => `${(20 * 1.15 ** i).toFixed(3)},${(offsetDb - i * 0.25).toFixed(2)},${(90 - i * 7).toFixed(1)}`);
  return new Blob([`# invented curve\n${lines.join('\n')}`], { type: 'text/plain' });
}

describe('a rich workspace: export, import into an empty workspace, export again', () => {
  let team: Team;
  const emails = {} as Record<'owner' | 'editor' | 'viewer', string>;
  let systemId = '';
  let profiles: { main: string; sub: string };
  let file1: Json;
  let file1Text = '';
  let imported: Json;
  let file2: Json;

  beforeAll(async () => {
    team = await makeTeam(`${MARK}-rich`);
    for (const who of ['owner', 'editor', 'viewer'] as const) emails[who] = (await team.clients.owner.get(`/api/v1/workspaces/${team.workspaceId}/members`)).body.items.find((m: Json) => m.userId === team.ids[who]).email;
    const owner = team.clients.owner;
    const profile = async (id: string, name: string) => {
      const { id: _id, ...fields } = demoProfile(id);
      void _id;
      const res = await owner.post('/api/v1/profiles', { ...fields, name, workspaceId: team.workspaceId });
      expect(res.status, res.text).toBe(201);
      return res.body.id as string;
    };
    profiles = { main: await profile('quillon-b6', 'Main A (invented)'), sub: await profile('marrow-s12', 'Sub B (invented)') };
    // Revision 1 names the Library profile its main-speaker profile was copied from.
    const doc = juniperLaneDocument();
    doc.profiles = doc.profiles.map((p) => (p.id === 'quillon-b6' ? { ...p, libraryId: profiles.main } : p));
    const created = await owner.post('/api/v1/systems', { name: 'Screening room (invented)', document: doc, workspaceId: team.workspaceId, note: 'first' });
    expect(created.status, created.text).toBe(201);
    systemId = created.body.id;
    const moved = { ...doc, subs: doc.subs.map((s, i) => (i === 0 ? { ...s, delayMs: 2.5 } : s)) };
    expect((await team.clients.editor.put(`/api/v1/systems/${systemId}`, { name: 'Screening room (invented)', document: moved, revision: 1, note: 'editor delayed sub 1' })).status).toBe(200);
    expect((await owner.patch(`/api/v1/systems/${systemId}/revisions/1`, { note: 'first save, noted later' })).status).toBe(200);
    expect((await owner.patch(`/api/v1/systems/${systemId}`, { name: 'Screening room, final (invented)', revision: 2 })).status).toBe(200);
    // A deleted System and a deleted Lesson stay behind.
    const gone = await owner.post('/api/v1/systems', { name: 'Gone (invented)', document: lindenStreetDocument(), workspaceId: team.workspaceId });
    expect((await owner.delete(`/api/v1/systems/${gone.body.id}`)).status).toBe(200);
    const goneLesson = await owner.post('/api/v1/lessons', { title: 'Gone lesson (invented)', workspaceId: team.workspaceId });
    expect((await owner.delete(`/api/v1/lessons/${goneLesson.body.id}`)).status).toBe(200);
    // Measurements: text for the System (by the editor), text without a System, an impulse response for the System.
    const form = (fields: Record<string, string>, blob: Blob, name: string) => {
      const f = new FormData();
      f.set('file', blob, name);
      for (const [k, v] of Object.entries(fields)) f.set(k, v);
      return f;
    };
    expect((await team.clients.editor.post('/api/v1/measurements', form({ systemId, name: 'MLP: subs (invented)', seat: 'Row 1 centre (MLP)', role: 'sub', runLabel: 'before' }, textCurve(0), 'a.txt'))).status).toBe(201);
    expect((await owner.post('/api/v1/measurements', form({ workspaceId: team.workspaceId, name: 'Loose curve (invented)' }, textCurve(-3), 'b.txt'))).status).toBe(201);
    const wav = await owner.post('/api/v1/measurements', uploadForm(wavBytes({ sampleRateHz: 48_000, format: 'float32', channels: [inventedImpulse()] }), { systemId, name: 'MLP impulse (invented)', seat: 'Row 1 centre (MLP)', role: 'sub' }));
    expect(wav.status, wav.text).toBe(201);
    // A Lesson of two Steps: a copy of the System, and a document whose sub profile was copied from Sub B, with a sweep.
    const lesson = await owner.post('/api/v1/lessons', { title: 'Why it cancels (invented)', description: 'Invented.', workspaceId: team.workspaceId });
    const second = juniperLaneDocument();
    second.profiles = second.profiles.map((p) => (p.id === 'marrow-s12' ? { ...p, libraryId: profiles.sub } : p));
    expect((await owner.post(`/api/v1/lessons/${lesson.body.id}/steps`, { step: { title: 'As built', panel: 'blend', fromSystemId: systemId } })).status).toBe(201);
    const step2 = { title: 'Sweep the delay', points: '- **watch** the dip', panel: 'timing', traces: ['sum', 'phase'], sweep: { parameter: 'subDelayMs', from: 0, to: 8, durationS: 4 }, document: second };
    expect((await owner.post(`/api/v1/lessons/${lesson.body.id}/steps`, { step: step2 })).status).toBe(201);

    const out = await exportOf(owner, team.workspaceId);
    file1 = out.file;
    file1Text = out.res.text;
    expect(out.res.headers.get('content-disposition')).toMatch(new RegExp(`^attachment; filename="seamline-${MARK}-rich-workspace-invented-\\d{4}-\\d{2}-\\d{2}\\.json"$`));
    imported = await importFile(owner, file1);
    file2 = (await exportOf(owner, imported.workspaceId)).file;
  }, 180_000);

  it('the export holds what the API reads of every row, and no secret', async () => {
    const owner = team.clients.owner;
    expectNoSecrets(file1Text);
    expect(file1).toMatchObject({ format: 'seamline-workspace', version: 1, workspace: { name: `${MARK}-rich workspace (invented)` } });
    expect(file1.members).toEqual([
      { email: emails.owner, role: 'owner' },
      { email: emails.editor, role: 'editor' },
      { email: emails.viewer, role: 'viewer' },
    ]);
    // The live System only, every revision with the note, name, time and author the revision list gives.
    expect(file1.systems.map((s: Json) => s.name)).toEqual(['Screening room, final (invented)']);
    const listed = (await owner.get(`/api/v1/systems/${systemId}/revisions`)).body.items as Json[];
    const revisions = file1.systems[0].revisions;
    expect(revisions.map((r: Json) => [r.revision, r.name, r.note, r.createdAt])).toEqual([...listed].reverse().map((r) => [r.revision, r.name, r.note, r.createdAt]));
    expect(revisions.map((r: Json) => r.note)).toEqual(['first save, noted later', 'editor delayed sub 1', 'renamed']);
    expect(revisions.map((r: Json) => r.authorEmail)).toEqual([emails.owner, emails.editor, emails.owner]);
    // Each document as the API reads that revision, its Library link moved out into libraryKeys.
    for (const r of revisions) {
      const api = (await owner.get(`/api/v1/systems/${systemId}/revisions/${r.revision}`)).body.document;
      expect(r.document).toEqual({ ...api, profiles: api.profiles.map(({ libraryId: _link, ...p }: Json) => (void _link, p)) });
    }
    // The Library profile link became a key naming the exported profile.
    const mainKey = file1.profiles.find((p: Json) => p.name === 'Main A (invented)').key;
    expect(revisions[0].libraryKeys).toEqual({ 'quillon-b6': mainKey });
    expect(revisions[0].document.profiles.every((p: Json) => p.libraryId === undefined)).toBe(true);
    // Measurements: every point as the API reads it, linked by key to the System (or to none).
    const stored = (await owner.get(`/api/v1/measurements?workspaceId=${team.workspaceId}`)).body.items as Json[];
    expect(file1.measurements).toHaveLength(3);
    for (const m of file1.measurements) {
      const row = stored.find((s) => s.name === m.name);
      const full = (await owner.get(`/api/v1/measurements/${row.id}`)).body;
      expect(m.points).toEqual({ frequencyHz: full.frequencyHz, magnitudeDb: full.magnitudeDb, phaseDeg: full.phaseDeg });
      expect(m.systemKey).toBe(full.systemId ? file1.systems[0].key : null);
      expect([m.sourceFormat, m.sampleRateHz, m.arrivalMs, m.impulseWindow, m.runLabel, m.createdAt]).toEqual([full.sourceFormat, full.sampleRateHz, full.arrivalMs, full.impulseWindow, full.runLabel, full.createdAt]);
    }
    expect(file1.measurements.find((m: Json) => m.sourceFormat === 'wav')).toMatchObject({ sampleRateHz: 48_000, createdByEmail: emails.owner });
    expect(file1.measurements.find((m: Json) => m.name === 'MLP: subs (invented)').createdByEmail).toBe(emails.editor);
    // The live Lesson with its Steps in order; the sub profile link of Step 2 as a key.
    expect(file1.lessons.map((l: Json) => l.title)).toEqual(['Why it cancels (invented)']);
    const steps = file1.lessons[0].steps;
    expect(steps.map((s: Json) => [s.title, s.panel, s.sweep?.parameter ?? null])).toEqual([['As built', 'blend', null], ['Sweep the delay', 'timing', 'subDelayMs']]);
    expect(steps[0].libraryKeys).toEqual({ 'quillon-b6': mainKey });
    expect(steps[1].libraryKeys).toEqual({ 'marrow-s12': file1.profiles.find((p: Json) => p.name === 'Sub B (invented)').key });
  });

  it('the import says what it created, credits members and names the others', () => {
    expect(imported.workspaceName).toBe(`${MARK}-rich workspace (invented)`);
    expect(imported.created).toEqual({ profiles: 2, systems: 1, revisions: 3, measurements: 3, lessons: 1, steps: 2 });
    expect(imported.systems.map((s: Json) => s.name)).toEqual(['Screening room, final (invented)']);
    expect(imported.renamed).toEqual([]);
    expect(imported.members).toEqual([
      { email: emails.owner, role: 'owner', alreadyMember: true },
      { email: emails.editor, role: 'editor', alreadyMember: false },
      { email: emails.viewer, role: 'viewer', alreadyMember: false },
    ]);
    expect(imported.formerMembers).toEqual([emails.editor]);
  });

  it('the imported System keeps its revision numbers, notes and times, and links the imported profile', async () => {
    const owner = team.clients.owner;
    const newId = imported.systems[0].id;
    expect(newId).not.toBe(systemId);
    const before = (await owner.get(`/api/v1/systems/${systemId}/revisions`)).body.items as Json[];
    const after = (await owner.get(`/api/v1/systems/${newId}/revisions`)).body.items as Json[];
    expect(after.map((r) => [r.revision, r.name, r.note, r.createdAt])).toEqual(before.map((r) => [r.revision, r.name, r.note, r.createdAt]));
    expect(after.map((r) => r.authorName)).toEqual([before[0].authorName, null, before[2].authorName]);
    const profilesHere = (await owner.get(`/api/v1/profiles?workspaceId=${imported.workspaceId}`)).body.items as Json[];
    const mainHere = profilesHere.find((p) => p.name === 'Main A (invented)');
    expect(mainHere.id).not.toBe(profiles.main);
    const rev1 = (await owner.get(`/api/v1/systems/${newId}/revisions/1`)).body.document;
    expect(rev1.profiles.find((p: Json) => p.id === 'quillon-b6').libraryId).toBe(mainHere.id);
  });

  it('exporting again gives the same file apart from ids, keys, the export time and non-members (and the comparison sees a changed note)', () => {
    const here = new Set([emails.owner]);
    expect(file2.systems.length + file2.measurements.length + file2.lessons.length + file2.profiles.length).toBeGreaterThan(0);
    expect(file2.systems[0].revisions).toHaveLength(3);
    expect(comparable(file2, here)).toEqual(comparable(file1, here));
    const changed = structuredClone(file2);
    changed.systems[0].revisions[1].note = 'a different note';
    expect(comparable(changed, here)).not.toEqual(comparable(file1, here));
  });

  it('fills an existing empty workspace the owner owns, and refuses one that holds anything (nothing changed)', async () => {
    const owner = team.clients.owner;
    const empty = await owner.post('/api/v1/workspaces', { name: `${MARK} empty (invented)` });
    const answer = await importFile(owner, file1, `?workspaceId=${empty.body.id}`);
    expect(answer).toMatchObject({ workspaceId: empty.body.id, workspaceName: `${MARK} empty (invented)`, created: { systems: 1, revisions: 3 } });
    const counts = await rowCounts(team.ids.owner, MARK);
    const again = await owner.post(`/api/v1/workspaces/import?workspaceId=${empty.body.id}`, file1);
    expect(again.status, again.text).toBe(409);
    expect(await rowCounts(team.ids.owner, MARK)).toEqual(counts);
    // Only an owner may fill one: the editor of the team workspace gets 403, an outsider 404.
    const asEditor = await team.clients.editor.post(`/api/v1/workspaces/import?workspaceId=${team.workspaceId}`, file1);
    expect(asEditor.status).toBe(403);
    expect((await team.clients.outsider.post(`/api/v1/workspaces/import?workspaceId=${team.workspaceId}`, file1)).status).toBe(404);
  });

  it('exports one System with its history for an editor, and brings it back into a workspace with clashing names renamed', async () => {
    const res = await team.clients.editor.get(`/api/v1/systems/${systemId}/export/history`);
    expect(res.status).toBe(200);
    expect(res.headers.get('content-disposition')).toMatch(/filename="seamline-screening-room-final-invented-\d{4}-\d{2}-\d{2}\.json"/);
    const file = JSON.parse(res.text);
    expectNoSecrets(res.text);
    expect(file.format).toBe('seamline-system');
    expect(file.system.revisions.map((r: Json) => r.note)).toEqual(file1.systems[0].revisions.map((r: Json) => r.note));
    // Only the profile its documents were copied from, only the measurements taken for it.
    expect(file.profiles.map((p: Json) => p.name)).toEqual(['Main A (invented)']);
    expect(file.measurements.map((m: Json) => m.name).sort()).toEqual(['MLP impulse (invented)', 'MLP: subs (invented)']);
    expect(file.measurements.every((m: Json) => m.systemKey === file.system.key)).toBe(true);
    expect((await team.clients.viewer.get(`/api/v1/systems/${systemId}/export/history`)).status).toBe(403);
    expect((await team.clients.outsider.get(`/api/v1/systems/${systemId}/export/history`)).status).toBe(404);

    const back = await team.clients.editor.post(`/api/v1/workspaces/${team.workspaceId}/systems/import`, file);
    expect(back.status, back.text).toBe(201);
    expect(back.body.created).toEqual({ profiles: 1, systems: 1, revisions: 3, measurements: 2, lessons: 0, steps: 0 });
    expect(back.body.renamed).toEqual([
      { kind: 'profile', from: 'Main A (invented)', to: 'Main A (invented) (imported)' },
      { kind: 'system', from: 'Screening room, final (invented)', to: 'Screening room, final (invented) (imported)' },
    ]);
    const copy = (await team.clients.editor.get(`/api/v1/systems/${back.body.systems[0].id}/revisions`)).body.items as Json[];
    expect(copy.map((r) => r.note)).toEqual(['renamed', 'editor delayed sub 1', 'first save, noted later']);
    const again = await team.clients.editor.get(`/api/v1/systems/${back.body.systems[0].id}/export/history`);
    // Exported again, with the two names put back as they were in the file: the same file.
    const second = JSON.parse(again.text);
    const original = (kind: string, name: string) => back.body.renamed.find((r: Json) => r.kind === kind && r.to === name)?.from ?? name;
    second.system.name = original('system', second.system.name);
    for (const p of second.profiles) p.name = original('profile', p.name);
    const members = new Set([emails.owner, emails.editor, emails.viewer]);
    expect(comparable(second, members)).toEqual(comparable(file, members));
    expect((await team.clients.outsider.post(`/api/v1/workspaces/${team.workspaceId}/systems/import`, file)).status).toBe(404);
    expect((await team.clients.viewer.post(`/api/v1/workspaces/${team.workspaceId}/systems/import`, file)).status).toBe(403);
  });

  it('a viewer or an editor cannot export the workspace, an outsider learns nothing, and a token cannot import', async () => {
    expect((await team.clients.viewer.get(`/api/v1/workspaces/${team.workspaceId}/export`)).status).toBe(403);
    expect((await team.clients.editor.get(`/api/v1/workspaces/${team.workspaceId}/export`)).status).toBe(403);
    expect((await team.clients.outsider.get(`/api/v1/workspaces/${team.workspaceId}/export`)).status).toBe(404);
    expect((await team.clients.anonymous.get(`/api/v1/workspaces/${team.workspaceId}/export`)).status).toBe(401);
    const token = await team.clients.owner.post('/api/v1/tokens', { name: 'Transfer test (invented)', workspaceId: team.workspaceId, scope: 'write' });
    expect(token.status, token.text).toBe(201);
    const bearer = new Client({ Authorization: `Bearer ${token.body.token}` });
    const counts = await rowCounts(team.ids.owner, MARK);
    const refused = await bearer.post('/api/v1/workspaces/import', smallWorkspaceFile(MARK));
    expect(refused.status).toBe(403);
    expect(refused.body.error.message).toMatch(/browser session/);
    expect((await bearer.get(`/api/v1/workspaces/${team.workspaceId}/export`)).status).toBe(403);
    expect(await rowCounts(team.ids.owner, MARK)).toEqual(counts);
  });
});

describe('the demo workspace goes out and comes back whole', () => {
  it('export as its owner → import as a new workspace of another account → export again: equal', async () => {
    const demo = await signedInClient('demo@seamline.test');
    const ws = (await demo.get('/api/v1/workspaces')).body.items.find((w: Json) => w.name === 'Larkspur AV' && w.role === 'owner');
    expect(ws, 'the demo account owns "Larkspur AV"').toBeDefined();
    const { file: first, res } = await exportOf(demo, ws.id);
    expectNoSecrets(res.text);
    expect(first.systems.length).toBeGreaterThan(0);
    expect(first.measurements.length).toBeGreaterThan(0);
    expect(first.lessons.length).toBeGreaterThan(0);
    expect(first.profiles.length).toBeGreaterThan(0);
    expect(first.systems.flatMap((s: Json) => s.revisions).some((r: Json) => r.note)).toBe(true);
    // Imported by someone else, so the demo account's own workspace list is left as it was.
    const other = await freshUser('demo-copy');
    const answer = await importFile(other.client, first);
    expect(answer.created).toEqual({
      profiles: first.profiles.length,
      systems: first.systems.length,
      revisions: first.systems.reduce((n: number, s: Json) => n + s.revisions.length, 0),
      measurements: first.measurements.length,
      lessons: first.lessons.length,
      steps: first.lessons.reduce((n: number, l: Json) => n + l.steps.length, 0),
    });
    expect(answer.members.every((m: Json) => !m.alreadyMember)).toBe(true);
    const { file: second } = await exportOf(other.client, answer.workspaceId);
    const here = new Set([other.email]);
    expect(comparable(second, here)).toEqual(comparable(first, here));
    // The Systems open for their new owner.
    const opened = await other.client.get(`/api/v1/systems/${answer.systems[0].id}`);
    expect(opened.status).toBe(200);
    expect(opened.body.name).toBe(first.systems[0].name);
  }, 120_000);
});

describe('a large workspace goes out as a zip and comes back whole', () => {
  let user: Awaited<ReturnType<typeof freshUser>>;

  it('over 8 MB of JSON: the export is a zip of workspace.json and one entry per measurement; importing the zip and exporting again gives the same', async () => {
    user = await freshUser('zip');
    // Four invented measurements of 60 000 points each (about 10 MB of JSON).
    const base = smallWorkspaceFile(MARK);
    base.measurements = Array.from({ length: 4 }, (_, k) => {
      const n = 60_000;
      const frequencyHz = Array.from({ length: n }, (_, i) => 10 + i * (19_990 / n) + k * 1e-3);
      return {
        ...base.measurements[0]!,
        key: `measurement-${k + 1}`,
        name: `Dense ${k + 1} (invented)`,
        points: { frequencyHz, magnitudeDb: frequencyHz.map((f) => Math.sin(f / 37) * 6 - k), phaseDeg: frequencyHz.map((f) => ((f * 7.3) % 360) - 180) },
      };
    });
    const first = await importFile(user.client, base);
    const res = await user.client.get(`/api/v1/workspaces/${first.workspaceId}/export`);
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('application/zip');
    expect(res.headers.get('content-disposition')).toMatch(/\.zip"$/);
    const cookie = await sessionCookie(user.email, PASSWORD);
    const raw = await fetch(`${baseUrl()}/api/v1/workspaces/${first.workspaceId}/export`, { headers: { Cookie: cookie } });
    const zipBytes = new Uint8Array(await raw.arrayBuffer());
    const entries = unzipSync(zipBytes);
    expect(Object.keys(entries).sort()).toEqual(['measurements/measurement-1.json', 'measurements/measurement-2.json', 'measurements/measurement-3.json', 'measurements/measurement-4.json', 'workspace.json']);
    const main = JSON.parse(strFromU8(entries['workspace.json']!));
    expect(main.measurements[0].points).toBeUndefined();
    expect(main.measurements[0].pointsFile).toBe('measurements/measurement-1.json');
    const assembled = { ...main, measurements: main.measurements.map(({ pointsFile, ...m }: Json) => ({ ...m, points: JSON.parse(strFromU8(entries[pointsFile]!)) })) };
    const here = new Set([user.email]);
    expect(comparable(assembled, here)).toEqual(comparable(base, here));

    const again = await fetch(`${baseUrl()}/api/v1/workspaces/import`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/zip', Cookie: cookie },
      body: zipBytes,
    });
    expect(again.status, await again.clone().text()).toBe(201);
    const second = (await again.json()) as Json;
    expect(second.created.measurements).toBe(4);
    const stored = (await user.client.get(`/api/v1/measurements?workspaceId=${second.workspaceId}`)).body.items as Json[];
    const dense = (await user.client.get(`/api/v1/measurements/${stored.find((m) => m.name === 'Dense 3 (invented)').id}`)).body;
    expect(dense.frequencyHz).toEqual(base.measurements[2]!.points.frequencyHz);
    expect(dense.phaseDeg).toEqual(base.measurements[2]!.points.phaseDeg);
  }, 180_000);
});
