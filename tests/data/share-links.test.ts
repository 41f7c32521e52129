/**
 * Share links in the data layer, against the test database: one page address for Systems and Lessons, a link that
 * does not work is null (the page answers 404), and a database outage behind a link is thrown, so the API answers 503
 * (DEVELOPERS.md: "a database outage → 503") instead of passing for a dead link.
 */
import { ConnectionRefusedError } from 'sequelize';
import { afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Caller } from '@/lib/access';
import { config } from '@/lib/config';
import { lindenStreetDocument } from '@/lib/demo/systems';
import { createLesson } from '@/lib/data/lessons';
import { createMeasurement } from '@/lib/data/measurements';
import { copySharedSystem, createLessonShareLink, createShareLink, getSharedMeasurements, getSharedSystem, listShareLinks, revokeShareLink } from '@/lib/data/share-links';
import { parseMeasurementText } from '@/lib/measurements/parse-measurement';
import { createSystem, deleteSystem, getSystemUnchecked } from '@/lib/data/systems';
import { createUserWithWorkspace } from '@/lib/data/users';
import { json, route } from '@/lib/http';
import { System } from '@/models';
import { testDb } from '../helpers/db';
import { uniqueEmail } from '../helpers/http';

const outage = () => new ConnectionRefusedError(new Error('connect ECONNREFUSED 127.0.0.1:5432'));

describe('share links (data layer)', () => {
  let owner: Caller;
  let workspaceId = '';
  let systemId = '';

  beforeAll(async () => {
    await testDb();
    const user = await createUserWithWorkspace({ email: uniqueEmail('share-data'), name: 'share data owner', password: 'long-enough-password' });
    owner = { id: user.id, siteRole: user.siteRole };
    const system = await createSystem(owner, { name: 'Shared den (invented)', document: lindenStreetDocument() });
    systemId = system.id;
    workspaceId = system.workspaceId;
  });

  afterEach(() => {
    vi.restoreAllMocks();
  });

  it('System and Lesson links answer the same page address, /s/{token}, on creating, listing and revoking', async () => {
    const link = await createShareLink(owner, systemId);
    expect(link.url).toBe(`${config.appUrl}/s/${link.token}`);
    expect(link).toMatchObject({ systemId, createdByName: 'share data owner', revokedAt: null });
    expect((await listShareLinks(owner, systemId)).find((l) => l.token === link.token)?.url).toBe(link.url);
    const revoked = await revokeShareLink(owner, link.token);
    expect(revoked.url).toBe(link.url);
    expect(revoked.revokedAt).not.toBeNull();

    const lesson = await createLesson(owner, { title: 'Shared lesson (invented)', workspaceId });
    const lessonLink = await createLessonShareLink(owner, lesson.id);
    expect(lessonLink.url).toBe(`${config.appUrl}/s/${lessonLink.token}`);
    expect(lessonLink.lessonId).toBe(lesson.id);
  });

  it('a live link opens its System; an unknown, malformed or revoked token is null', async () => {
    const { token } = await createShareLink(owner, systemId);
    expect((await getSharedSystem(token))?.id).toBe(systemId);
    expect(await getSharedSystem('A'.repeat(43))).toBeNull();
    expect(await getSharedSystem('not a token')).toBeNull();
    await revokeShareLink(owner, token);
    expect(await getSharedSystem(token)).toBeNull();
  });

  it('a link gives its System’s own measurements, read-only, and never another System’s or the rest of the workspace’s', async () => {
    const parsed = parseMeasurementText(Array.from({ length: 8 }, (_, i) => `${20 * 2 ** i},${80 + i}`).join('\n'));
    if (!parsed.ok) throw new Error(parsed.message);
    const other = await createSystem(owner, { name: 'Other den (invented)', document: lindenStreetDocument() });
    await createMeasurement(owner, { workspaceId, systemId }, { name: 'own sub (invented)', role: 'sub' }, parsed.measurement);
    await createMeasurement(owner, { workspaceId, systemId: other.id }, { name: 'other system (invented)', role: 'sub' }, parsed.measurement);
    await createMeasurement(owner, { workspaceId, systemId: null }, { name: 'workspace only (invented)', role: 'mains' }, parsed.measurement);
    const link = await createShareLink(owner, systemId);
    const shared = await getSharedMeasurements(link.token);
    expect(shared!.items.map((m) => m.name)).toEqual(['own sub (invented)']);
    expect(shared!.items[0]).toMatchObject({ systemId, role: 'sub', pointCount: 8, frequencyHz: [20, 40, 80, 160, 320, 640, 1280, 2560], magnitudeDb: [80, 81, 82, 83, 84, 85, 86, 87] });
    expect(shared!.items[0]).not.toHaveProperty('createdByName');
    expect(shared!.items[0]).not.toHaveProperty('workspaceId');
    expect(shared!.omitted).toBe(0);
    await revokeShareLink(owner, link.token);
    expect(await getSharedMeasurements(link.token)).toBeNull();
    expect(await getSharedMeasurements('not-a-token')).toBeNull();
  });

  it('a link to a deleted System is null', async () => {
    const doomed = await createSystem(owner, { name: 'Deleted den (invented)', document: lindenStreetDocument() });
    const { token } = await createShareLink(owner, doomed.id);
    await deleteSystem(owner, doomed.id);
    expect(await getSharedSystem(token)).toBeNull();
  });

  it('getSystemUnchecked: null for an unknown id, and for an id that cannot be a UUID without asking the database', async () => {
    expect(await getSystemUnchecked('00000000-0000-4000-8000-000000000000')).toBeNull();
    const lookup = vi.spyOn(System, 'findByPk');
    expect(await getSystemUnchecked('-'.repeat(36))).toBeNull();
    expect(await getSystemUnchecked('not-a-uuid')).toBeNull();
    expect(lookup).not.toHaveBeenCalled();
    expect((await getSystemUnchecked(systemId))?.role).toBe('viewer');
  });

  it('a database outage behind a live link is thrown, not taken for a missing System', async () => {
    const { token } = await createShareLink(owner, systemId);
    vi.spyOn(System, 'findByPk').mockRejectedValueOnce(outage());
    await expect(getSystemUnchecked(systemId)).rejects.toBeInstanceOf(ConnectionRefusedError);
    vi.spyOn(System, 'findByPk').mockRejectedValueOnce(outage());
    await expect(getSharedSystem(token)).rejects.toBeInstanceOf(ConnectionRefusedError);
  });

  it('a route copying from a link answers 503 with Retry-After during an outage (404 only for a dead link)', async () => {
    const { token } = await createShareLink(owner, systemId);
    const handler = route(async () => json(await copySharedSystem(owner, token, { workspaceId })));
    vi.spyOn(System, 'findByPk').mockRejectedValueOnce(outage());
    const down = await handler(new Request('http://localhost/'), {});
    expect(down.status).toBe(503);
    expect(down.headers.get('Retry-After')).toBe('5');
    expect(((await down.json()) as { error: { code: string } }).error.code).toBe('unavailable');

    await revokeShareLink(owner, token);
    expect((await handler(new Request('http://localhost/'), {})).status).toBe(404);
  });
});
