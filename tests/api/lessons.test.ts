/**
 * Lessons API over HTTP against the running app and real PostgreSQL: CRUD, Step order and
 * reorder, snapshot independence, share links (create, open, revoke), the role matrix and the
 * revision conflict. Each run makes its own workspace and people.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { createUserWithWorkspace } from '@/lib/data/users';
import { addMember, createWorkspace } from '@/lib/data/workspaces';
import { getLessonByShareToken } from '@/lib/data/share-links';
import { juniperLaneDocument, lindenStreetDocument } from '@/lib/demo/systems';
import { Client, signedInClient, uniqueEmail } from '../helpers/http';
import { testDb } from '../helpers/db';

const PASSWORD = 'lesson-test-password';
type Who = 'anonymous' | 'outsider' | 'viewer' | 'editor' | 'owner';
const WHO: Who[] = ['anonymous', 'outsider', 'viewer', 'editor', 'owner'];

interface Team {
  workspaceId: string;
  clients: Record<Who, Client>;
}

async function makeTeam(label: string): Promise<Team> {
  await testDb();
  const ids: Record<string, string> = {};
  const clients = { anonymous: new Client() } as Team['clients'];
  for (const who of ['owner', 'editor', 'viewer', 'outsider'] as const) {
    const email = uniqueEmail(`${label}-${who}`);
    const u = await createUserWithWorkspace({ email, name: `${label} ${who}`, password: PASSWORD });
    ids[who] = u.id;
    clients[who] = await signedInClient(email, PASSWORD);
  }
  const workspaceId = (await createWorkspace({ id: ids.owner!, siteRole: 'member' }, `${label} class (invented)`)).id;
  await addMember(workspaceId, ids.editor!, 'editor');
  await addMember(workspaceId, ids.viewer!, 'viewer');
  return { workspaceId, clients };
}

const stepBody = (title: string, document: unknown = lindenStreetDocument(), extra: Record<string, unknown> = {}) => ({
  step: { title, points: `Points of ${title}`, panel: 'blend', traces: ['mains', 'subs', 'sum'], sweep: null, document, ...extra },
});

async function newLesson(team: Team, title = 'Summation (invented)') {
  const res = await team.clients.owner.post('/api/v1/lessons', { title, description: 'for the tests', workspaceId: team.workspaceId });
  expect(res.status, res.text).toBe(201);
  return res.body as { id: string; revision: number; steps: { id: string; title: string; position: number }[] };
}

async function lessonWithSteps(team: Team, titles: string[]) {
  let lesson = await newLesson(team);
  for (const t of titles) {
    const res = await team.clients.owner.post(`/api/v1/lessons/${lesson.id}/steps`, stepBody(t));
    expect(res.status, res.text).toBe(201);
    lesson = res.body;
  }
  return lesson;
}

const expected = (who: Who, need: 'viewer' | 'editor', ok: number) => (who === 'anonymous' ? 401 : who === 'outsider' ? 404 : who === 'viewer' && need === 'editor' ? 403 : ok);

describe('Lessons: create, read, update, delete', () => {
  let team: Team;
  beforeAll(async () => {
    team = await makeTeam('lesson-crud');
  }, 120_000);

  it('POST /lessons → 201; GET /lessons lists it with its Step count; GET /lessons/{id} has steps', async () => {
    const lesson = await lessonWithSteps(team, ['First', 'Second']);
    expect(lesson.revision).toBe(3);
    const list = await team.clients.viewer.get(`/api/v1/lessons?workspaceId=${team.workspaceId}`);
    expect(list.status).toBe(200);
    const item = list.body.items.find((l: { id: string }) => l.id === lesson.id);
    expect(item).toMatchObject({ title: 'Summation (invented)', stepCount: 2, role: 'viewer' });
    const got = await team.clients.viewer.get(`/api/v1/lessons/${lesson.id}`);
    expect(got.status).toBe(200);
    expect(got.body.steps.map((s: { title: string; position: number }) => [s.position, s.title])).toEqual([
      [1, 'First'],
      [2, 'Second'],
    ]);
    expect(got.body.steps[0].document).toEqual(lindenStreetDocument());
  });

  it('PUT /lessons/{id} saves title and description and bumps the revision', async () => {
    const lesson = await newLesson(team);
    const res = await team.clients.editor.put(`/api/v1/lessons/${lesson.id}`, { title: 'Renamed (invented)', description: 'new words', revision: lesson.revision });
    expect(res.status, res.text).toBe(200);
    expect(res.body).toMatchObject({ title: 'Renamed (invented)', description: 'new words', revision: lesson.revision + 1 });
  });

  it('DELETE /lessons/{id} hides it from the list and GET answers 404', async () => {
    const lesson = await newLesson(team);
    expect((await team.clients.owner.delete(`/api/v1/lessons/${lesson.id}`)).status).toBe(200);
    expect((await team.clients.owner.get(`/api/v1/lessons/${lesson.id}`)).status).toBe(404);
    const list = await team.clients.owner.get('/api/v1/lessons');
    expect(list.body.items.some((l: { id: string }) => l.id === lesson.id)).toBe(false);
  });

  it('bad input names the field and changes nothing', async () => {
    const lesson = await lessonWithSteps(team, ['Only']);
    const noTitle = await team.clients.owner.post('/api/v1/lessons', { title: '   ' });
    expect(noTitle.status).toBe(400);
    expect(noTitle.body.error.issues[0].path).toBe('title');

    const badPanel = await team.clients.owner.post(`/api/v1/lessons/${lesson.id}/steps`, stepBody('x', lindenStreetDocument(), { panel: 'sideways' }));
    expect(badPanel.status).toBe(400);
    expect(badPanel.body.error.issues.some((i: { path: string }) => i.path === 'step.panel')).toBe(true);

    const badSweep = await team.clients.owner.post(`/api/v1/lessons/${lesson.id}/steps`, stepBody('x', lindenStreetDocument(), { sweep: { parameter: 'crossoverHz', from: 60, to: 9000, durationS: 6 } }));
    expect(badSweep.status).toBe(400);
    expect(badSweep.body.error.issues.some((i: { path: string }) => i.path === 'step.sweep.to')).toBe(true);

    const doc = lindenStreetDocument();
    const badDoc = await team.clients.owner.post(`/api/v1/lessons/${lesson.id}/steps`, stepBody('x', { ...doc, room: { ...doc.room, lengthM: -1 } }));
    expect(badDoc.status).toBe(400);
    expect(badDoc.body.error.issues.some((i: { path: string }) => i.path === 'step.document.room.lengthM')).toBe(true);

    const after = await team.clients.owner.get(`/api/v1/lessons/${lesson.id}`);
    expect(after.body.revision).toBe(lesson.revision);
    expect(after.body.steps).toHaveLength(1);
  });

  it('a filter sweep takes slope choices and round-trips', async () => {
    const lesson = await newLesson(team);
    const sweep = { parameter: 'filter', from: 'butterworth-2', to: 'linkwitz-riley-4', durationS: 5 };
    const res = await team.clients.owner.post(`/api/v1/lessons/${lesson.id}/steps`, stepBody('Slopes', lindenStreetDocument(), { sweep }));
    expect(res.status, res.text).toBe(201);
    expect(res.body.steps[0].sweep).toEqual(sweep);
    const wrong = await team.clients.owner.post(`/api/v1/lessons/${lesson.id}/steps`, stepBody('Slopes', lindenStreetDocument(), { sweep: { ...sweep, to: 'linkwitz-riley-6' } }));
    expect(wrong.status).toBe(400);
  });
});

describe('Lessons: Step order', () => {
  let team: Team;
  beforeAll(async () => {
    team = await makeTeam('lesson-order');
  }, 120_000);

  const titles = (body: { steps: { title: string; position: number }[] }) => body.steps.map((s) => `${s.position}:${s.title}`);

  it('reorder puts the Steps in the given order, numbered 1…n', async () => {
    const lesson = await lessonWithSteps(team, ['A', 'B', 'C', 'D']);
    const [a, b, c, d] = lesson.steps.map((s) => s.id);
    const res = await team.clients.editor.post(`/api/v1/lessons/${lesson.id}/steps/reorder`, { revision: lesson.revision, stepIds: [d, b, a, c] });
    expect(res.status, res.text).toBe(200);
    expect(titles(res.body)).toEqual(['1:D', '2:B', '3:A', '4:C']);
    const again = await team.clients.viewer.get(`/api/v1/lessons/${lesson.id}`);
    expect(titles(again.body)).toEqual(['1:D', '2:B', '3:A', '4:C']);
  });

  it('reorder must name every Step exactly once (400, nothing changed)', async () => {
    const lesson = await lessonWithSteps(team, ['A', 'B', 'C']);
    const [a, b] = lesson.steps.map((s) => s.id);
    for (const stepIds of [[a, b], [a, a, b]]) {
      const res = await team.clients.owner.post(`/api/v1/lessons/${lesson.id}/steps/reorder`, { revision: lesson.revision, stepIds });
      expect(res.status).toBe(400);
      expect(res.body.error.issues[0].path).toBe('stepIds');
    }
    const after = await team.clients.owner.get(`/api/v1/lessons/${lesson.id}`);
    expect(titles(after.body)).toEqual(['1:A', '2:B', '3:C']);
    expect(after.body.revision).toBe(lesson.revision);
  });

  it('insert at a position, update a Step, delete a Step: the rest close up', async () => {
    let lesson = await lessonWithSteps(team, ['A', 'B', 'C']);
    const inserted = await team.clients.owner.post(`/api/v1/lessons/${lesson.id}/steps`, { ...stepBody('Between'), position: 2, revision: lesson.revision });
    expect(inserted.status, inserted.text).toBe(201);
    expect(titles(inserted.body)).toEqual(['1:A', '2:Between', '3:B', '4:C']);
    lesson = inserted.body;

    const b = lesson.steps.find((s) => s.title === 'B')!;
    const updated = await team.clients.editor.put(`/api/v1/lessons/${lesson.id}/steps/${b.id}`, { revision: lesson.revision, step: { title: 'B, renamed', points: '**bold** point', panel: 'timing', sweep: { parameter: 'subDelayMs', from: 0, to: 5, durationS: 4 } } });
    expect(updated.status, updated.text).toBe(200);
    const bAfter = updated.body.steps.find((s: { id: string }) => s.id === b.id);
    expect(bAfter).toMatchObject({ title: 'B, renamed', points: '**bold** point', panel: 'timing', sweep: { parameter: 'subDelayMs', from: 0, to: 5, durationS: 4 } });
    lesson = updated.body;

    const between = lesson.steps.find((s) => s.title === 'Between')!;
    const deleted = await team.clients.owner.delete(`/api/v1/lessons/${lesson.id}/steps/${between.id}?revision=${lesson.revision}`);
    expect(deleted.status, deleted.text).toBe(200);
    expect(titles(deleted.body)).toEqual(['1:A', '2:B, renamed', '3:C']);
  });
});

describe('Lessons: a Step is a snapshot', () => {
  it('editing the source System later does not change the Step', async () => {
    const team = await makeTeam('lesson-snapshot');
    const system = await team.clients.owner.post('/api/v1/systems', { name: 'Source room (invented)', document: juniperLaneDocument(), workspaceId: team.workspaceId });
    expect(system.status, system.text).toBe(201);
    const lesson = await newLesson(team);
    const added = await team.clients.owner.post(`/api/v1/lessons/${lesson.id}/steps`, { step: { title: 'From the Library', points: '', panel: 'blend', traces: ['sum'], sweep: null, fromSystemId: system.body.id } });
    expect(added.status, added.text).toBe(201);
    const before = added.body.steps[0].document;
    expect(before.bassManagement.crossoverHz).toBe(80);

    const changed = juniperLaneDocument();
    changed.bassManagement.crossoverHz = 120;
    changed.subs[0]!.invert = true;
    const saved = await team.clients.owner.put(`/api/v1/systems/${system.body.id}`, { name: 'Source room (invented)', document: changed, revision: system.body.revision });
    expect(saved.status, saved.text).toBe(200);

    const after = await team.clients.owner.get(`/api/v1/lessons/${lesson.id}`);
    expect(after.body.steps[0].document).toEqual(before);
    expect(after.body.steps[0].document.bassManagement.crossoverHz).toBe(80);

    // A System the caller cannot read cannot be copied into a Step.
    const foreign = await team.clients.outsider.post('/api/v1/systems', { name: 'Not yours (invented)', document: juniperLaneDocument() });
    const denied = await team.clients.owner.post(`/api/v1/lessons/${lesson.id}/steps`, { step: { title: 'x', panel: 'blend', fromSystemId: foreign.body.id } });
    expect(denied.status).toBe(404);
  }, 120_000);
});

describe('Lessons: share links', () => {
  it('create → the student page and getLessonByShareToken open it signed out → revoke → gone', async () => {
    const team = await makeTeam('lesson-share');
    const lesson = await lessonWithSteps(team, ['Shared step <script>alert(1)</script>']);
    const created = await team.clients.editor.post(`/api/v1/lessons/${lesson.id}/share-links`);
    expect(created.status, created.text).toBe(201);
    const { token, url } = created.body as { token: string; url: string };
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(url).toContain(token);

    const shared = await getLessonByShareToken(token);
    expect(shared?.title).toBe('Summation (invented)');
    expect(shared?.steps.map((s) => s.title)).toEqual(['Shared step <script>alert(1)</script>']);
    expect(JSON.stringify(shared)).not.toContain(team.workspaceId);

    const page = await new Client().get(new URL(url).pathname);
    expect(page.status).toBe(200);
    expect(page.text).toContain('Summation (invented)');
    // The title is text, never markup.
    expect(page.text).not.toContain('<script>alert(1)</script>');

    const list = await team.clients.owner.get(`/api/v1/lessons/${lesson.id}/share-links`);
    expect(list.body.items.map((l: { token: string }) => l.token)).toContain(token);
    expect((await team.clients.viewer.get(`/api/v1/lessons/${lesson.id}/share-links`)).status).toBe(403);
    expect((await team.clients.viewer.delete(`/api/v1/lessons/${lesson.id}/share-links?token=${token}`)).status).toBe(403);

    const revoked = await team.clients.owner.delete(`/api/v1/lessons/${lesson.id}/share-links?token=${token}`);
    expect(revoked.status, revoked.text).toBe(200);
    expect(revoked.body.revokedAt).not.toBeNull();
    expect(await getLessonByShareToken(token)).toBeNull();
    expect((await new Client().get(new URL(url).pathname)).status).toBe(404);
    expect(await getLessonByShareToken('not-a-real-token-at-all-000000000000')).toBeNull();
  }, 120_000);

  it('a deleted Lesson’s link stops answering', async () => {
    const team = await makeTeam('lesson-share-del');
    const lesson = await lessonWithSteps(team, ['One']);
    const { token } = (await team.clients.owner.post(`/api/v1/lessons/${lesson.id}/share-links`)).body;
    expect(await getLessonByShareToken(token)).not.toBeNull();
    await team.clients.owner.delete(`/api/v1/lessons/${lesson.id}`);
    expect(await getLessonByShareToken(token)).toBeNull();
  }, 120_000);
});

describe('Lessons: the role matrix', () => {
  let team: Team;
  beforeAll(async () => {
    team = await makeTeam('lesson-matrix');
  }, 120_000);

  type Fixture = { id: string; revision: number; stepIds: string[] };
  const cases: { name: string; need: 'viewer' | 'editor'; ok: number; call: (c: Client, f: Fixture) => Promise<{ status: number; text: string }> }[] = [
    { name: 'GET /lessons/{id}', need: 'viewer', ok: 200, call: (c, f) => c.get(`/api/v1/lessons/${f.id}`) },
    { name: 'PUT /lessons/{id}', need: 'editor', ok: 200, call: (c, f) => c.put(`/api/v1/lessons/${f.id}`, { title: 'Matrix', description: '', revision: f.revision }) },
    { name: 'DELETE /lessons/{id}', need: 'editor', ok: 200, call: (c, f) => c.delete(`/api/v1/lessons/${f.id}`) },
    { name: 'POST /lessons/{id}/steps', need: 'editor', ok: 201, call: (c, f) => c.post(`/api/v1/lessons/${f.id}/steps`, stepBody('Matrix step')) },
    { name: 'PUT /lessons/{id}/steps/{stepId}', need: 'editor', ok: 200, call: (c, f) => c.put(`/api/v1/lessons/${f.id}/steps/${f.stepIds[0]}`, { revision: f.revision, step: { title: 'Changed' } }) },
    { name: 'DELETE /lessons/{id}/steps/{stepId}', need: 'editor', ok: 200, call: (c, f) => c.delete(`/api/v1/lessons/${f.id}/steps/${f.stepIds[0]}?revision=${f.revision}`) },
    { name: 'POST /lessons/{id}/steps/reorder', need: 'editor', ok: 200, call: (c, f) => c.post(`/api/v1/lessons/${f.id}/steps/reorder`, { revision: f.revision, stepIds: [...f.stepIds].reverse() }) },
    { name: 'POST /lessons/{id}/share-links', need: 'editor', ok: 201, call: (c, f) => c.post(`/api/v1/lessons/${f.id}/share-links`) },
  ];

  for (const k of cases) {
    for (const who of WHO) {
      const want = expected(who, k.need, k.ok);
      it(`${k.name} as ${who} → ${want}`, async () => {
        const lesson = await lessonWithSteps(team, ['One', 'Two']);
        const res = await k.call(team.clients[who], { id: lesson.id, revision: lesson.revision, stepIds: lesson.steps.map((s) => s.id) });
        expect(res.status, res.text).toBe(want);
        if (want >= 400) {
          // Refused calls change nothing.
          const after = await team.clients.owner.get(`/api/v1/lessons/${lesson.id}`);
          expect(after.status).toBe(200);
          expect(after.body.revision).toBe(lesson.revision);
        }
      });
    }
  }

  it('GET /lessons: anonymous 401; an outsider does not see the workspace’s Lessons; outsider asking for the workspace → 404', async () => {
    const lesson = await newLesson(team);
    expect((await team.clients.anonymous.get('/api/v1/lessons')).status).toBe(401);
    const theirs = await team.clients.outsider.get('/api/v1/lessons');
    expect(theirs.status).toBe(200);
    expect(theirs.body.items.some((l: { id: string }) => l.id === lesson.id)).toBe(false);
    expect((await team.clients.outsider.get(`/api/v1/lessons?workspaceId=${team.workspaceId}`)).status).toBe(404);
    expect((await team.clients.viewer.post('/api/v1/lessons', { title: 'Viewer lesson', workspaceId: team.workspaceId })).status).toBe(403);
  });
});

describe('Lessons: revision conflicts', () => {
  it('a stale revision is 409 with currentRevision and changes nothing, for every write', async () => {
    const team = await makeTeam('lesson-conflict');
    const lesson = await lessonWithSteps(team, ['A', 'B']);
    const stale = lesson.revision;
    // Someone else saves first.
    const first = await team.clients.editor.put(`/api/v1/lessons/${lesson.id}`, { title: 'Editor was first', description: '', revision: stale });
    expect(first.status).toBe(200);
    const current = first.body.revision as number;
    const [a, b] = lesson.steps.map((s) => s.id);

    const attempts = [
      () => team.clients.owner.put(`/api/v1/lessons/${lesson.id}`, { title: 'Owner was late', description: '', revision: stale }),
      () => team.clients.owner.post(`/api/v1/lessons/${lesson.id}/steps/reorder`, { revision: stale, stepIds: [b, a] }),
      () => team.clients.owner.put(`/api/v1/lessons/${lesson.id}/steps/${a}`, { revision: stale, step: { title: 'late' } }),
      () => team.clients.owner.delete(`/api/v1/lessons/${lesson.id}/steps/${a}?revision=${stale}`),
      () => team.clients.owner.post(`/api/v1/lessons/${lesson.id}/steps`, { ...stepBody('late'), revision: stale }),
    ];
    for (const attempt of attempts) {
      const res = await attempt();
      expect(res.status, res.text).toBe(409);
      expect(res.body.error.code).toBe('conflict');
      expect(res.body.error.currentRevision).toBe(current);
    }
    const after = await team.clients.owner.get(`/api/v1/lessons/${lesson.id}`);
    expect(after.body).toMatchObject({ title: 'Editor was first', revision: current });
    expect(after.body.steps.map((s: { title: string }) => s.title)).toEqual(['A', 'B']);

    // Appending without a revision is always safe.
    const append = await team.clients.owner.post(`/api/v1/lessons/${lesson.id}/steps`, stepBody('C'));
    expect(append.status).toBe(201);
    expect(append.body.revision).toBe(current + 1);
  }, 120_000);
});
