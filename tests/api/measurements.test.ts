import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { testDb } from '../helpers/db';
import { Client, signedInClient } from '../helpers/http';

/** An invented measurement: 1/24-octave points from 20 Hz, awkward decimals so exact read-back is a real check. */
function measurementText(points = 64, phase = true): { text: string; f: number[]; m: number[]; p: number[] } {
  const f: number[] = [];
  const m: number[] = [];
  const p: number[] = [];
  const lines = ['# invented test measurement', 'Frequency (Hz),Magnitude (dB),Phase (deg)'];
  for (let i = 0; i < points; i++) {
    const hz = 20 * 2 ** (i / 24);
    const db = -3 + Math.sin(i / 3) * 4.123456789012345;
    const deg = ((i * 37.7) % 360) - 180;
    f.push(hz);
    m.push(db);
    p.push(deg);
    lines.push(phase ? `${hz},${db},${deg}` : `${hz},${db}`);
  }
  return { text: lines.join('\n'), f, m, p };
}

function form(text: string, fields: Record<string, string> = {}, fileName = 'seat-1-mains.csv', type = 'text/csv'): FormData {
  const fd = new FormData();
  fd.set('file', new Blob([text], { type }), fileName);
  for (const [k, v] of Object.entries(fields)) fd.set(k, v);
  return fd;
}

async function rowCount(): Promise<number> {
  const db = await testDb();
  const rows = (await db.query('SELECT count(*)::int AS n FROM measurements', { type: 'SELECT' })) as { n: number }[];
  return rows[0]!.n;
}

describe('measurements over HTTP', () => {
  let owner: Client;
  let viewer: Client;
  let other: Client;
  let larkspurId: string;
  let systemId: string;
  const made: string[] = [];

  beforeAll(async () => {
    [owner, viewer, other] = await Promise.all([signedInClient('demo@seamline.test'), signedInClient('viewer@seamline.test'), signedInClient('other@seamline.test')]);
    const ws = await owner.get('/api/v1/workspaces');
    larkspurId = ws.body.items.find((w: { name: string }) => w.name === 'Larkspur AV').id;
    const systems = await owner.get(`/api/v1/systems?workspaceId=${larkspurId}`);
    systemId = systems.body.items.find((s: { name: string }) => s.name === 'Juniper Lane screening room').id;
  });

  afterAll(async () => {
    for (const id of made) await owner.delete(`/api/v1/measurements/${id}`);
  });

  it('upload → list → read back every point exactly → delete', async () => {
    const { text, f, m, p } = measurementText(64);
    const up = await owner.post('/api/v1/measurements', form(text, { name: 'Test seat 1 mains (invented)', systemId, seat: 'Row 1 centre (MLP)', role: 'mains' }));
    expect(up.status, up.text).toBe(201);
    expect(up.body).toMatchObject({ name: 'Test seat 1 mains (invented)', pointCount: 64, startHz: 20, stopHz: f[63], hasPhase: true });
    // A comment and a header above the first number: two lines skipped, data from line 3 (counted by hand).
    expect(up.body).toMatchObject({ skippedLines: 2, firstDataLine: 3 });
    const id = up.body.id as string;
    made.push(id);

    const listed = await owner.get(`/api/v1/measurements?systemId=${systemId}`);
    expect(listed.status).toBe(200);
    const row = listed.body.items.find((x: { id: string }) => x.id === id);
    expect(row).toMatchObject({ workspaceId: larkspurId, systemId, seat: 'Row 1 centre (MLP)', role: 'mains', pointCount: 64 });
    expect(row.frequencyHz).toBeUndefined();

    const read = await owner.get(`/api/v1/measurements/${id}`);
    expect(read.status).toBe(200);
    expect(read.body.pointCount).toBe(64);
    expect(read.body.frequencyHz).toEqual(f);
    expect(read.body.magnitudeDb).toEqual(m);
    expect(read.body.phaseDeg).toEqual(p);

    // The viewer of the workspace reads it too.
    expect((await viewer.get(`/api/v1/measurements/${id}`)).body.magnitudeDb).toEqual(m);

    const del = await owner.delete(`/api/v1/measurements/${id}`);
    expect(del.status).toBe(200);
    expect((await owner.get(`/api/v1/measurements/${id}`)).status).toBe(404);
  });

  it('a two-column file reads back with phaseDeg null; without systemId it goes to the personal workspace', async () => {
    const { text, m } = measurementText(20, false);
    const up = await owner.post('/api/v1/measurements', form(text, { role: 'sub' }, 'sub-only.txt', 'text/plain'));
    expect(up.status, up.text).toBe(201);
    made.push(up.body.id);
    expect(up.body.name).toBe('sub-only');
    expect(up.body.hasPhase).toBe(false);
    const read = await owner.get(`/api/v1/measurements/${up.body.id}`);
    expect(read.body.phaseDeg).toBeNull();
    expect(read.body.magnitudeDb).toEqual(m);
    expect(read.body.workspaceId).not.toBe(larkspurId);
  });

  it('a refused upload answers 400 with line-numbered issues and leaves the table unchanged', async () => {
    const before = await rowCount();
    const lines = measurementText(30).text.split('\n');
    lines[6] = lines[6]!.replace(/,[^,]+,/, ',oops,');
    lines[12] = lines[11]!;
    const r = await owner.post('/api/v1/measurements', form(lines.join('\n'), { systemId }));
    expect(r.status).toBe(400);
    expect(r.body.error.issues).toEqual([
      { path: 'line 7, column 2', message: expect.stringContaining('"oops" is not a number') },
      { path: 'line 13, column 1', message: expect.stringContaining('repeats line 12') },
    ]);
    expect(r.body.error.totalIssues).toBe(2);
    const binary = await owner.post('/api/v1/measurements', form('20,1\n\u0000\u0001', {}, 'x.csv', 'application/octet-stream'));
    expect(binary.status).toBe(400);
    expect(binary.body.error.issues[0].path).toBe('line 2, column 1');
    const short = await owner.post('/api/v1/measurements', form('20,1\n40,2\n'));
    expect(short.status).toBe(400);
    expect(short.body.error.issues[0].message).toContain('at least 8');
    const badField = await owner.post('/api/v1/measurements', form(measurementText(10).text, { role: '<script>' }));
    expect(badField.status).toBe(400);
    expect(badField.body.error.issues[0].path).toBe('role');
    expect(await rowCount()).toBe(before);
  });

  it('413 over 2 MB, 415 for other media types, 400 without a file', async () => {
    const before = await rowCount();
    const big = `${'20,1,0\n'.repeat(310_000)}`;
    expect((await owner.post('/api/v1/measurements', form(big))).status).toBe(413);
    expect((await owner.post('/api/v1/measurements', form(measurementText(10).text, {}, 'picture.png', 'image/png'))).status).toBe(415);
    const asJson = await owner.post('/api/v1/measurements', { file: 'x' });
    expect(asJson.status).toBe(415);
    const noFile = new FormData();
    noFile.set('name', 'nothing');
    const r = await owner.post('/api/v1/measurements', noFile);
    expect(r.status).toBe(400);
    expect(r.body.error.issues[0].path).toBe('file');
    expect(await rowCount()).toBe(before);
  });

  it('role rules: anonymous 401, outsider 404, viewer 403 on writes', async () => {
    const { text } = measurementText(16);
    const up = await owner.post('/api/v1/measurements', form(text, { systemId, name: 'Role test (invented)' }));
    expect(up.status).toBe(201);
    const id = up.body.id as string;
    made.push(id);
    const before = await rowCount();

    const anonymous = new Client();
    expect((await anonymous.get('/api/v1/measurements')).status).toBe(401);
    expect((await anonymous.get(`/api/v1/measurements/${id}`)).status).toBe(401);
    expect((await anonymous.post('/api/v1/measurements', form(text))).status).toBe(401);
    expect((await anonymous.delete(`/api/v1/measurements/${id}`)).status).toBe(401);

    expect((await other.get(`/api/v1/measurements/${id}`)).status).toBe(404);
    expect((await other.delete(`/api/v1/measurements/${id}`)).status).toBe(404);
    expect((await other.post('/api/v1/measurements', form(text, { systemId }))).status).toBe(404);
    expect((await other.post('/api/v1/measurements', form(text, { workspaceId: larkspurId }))).status).toBe(404);
    expect((await other.get('/api/v1/measurements')).body.items.some((x: { id: string }) => x.id === id)).toBe(false);

    expect((await viewer.get(`/api/v1/measurements/${id}`)).status).toBe(200);
    expect((await viewer.delete(`/api/v1/measurements/${id}`)).status).toBe(403);
    expect((await viewer.post('/api/v1/measurements', form(text, { systemId }))).status).toBe(403);
    expect(await rowCount()).toBe(before);
  });

  it('predict from stored measurements needs a session; inline points need none', async () => {
    const { text, f, m, p } = measurementText(120);
    const up = await owner.post('/api/v1/measurements', form(text, { systemId, name: 'Predict test (invented)' }));
    made.push(up.body.id);
    const body = (curve: unknown) => ({
      temperatureC: 20,
      crossoverHz: 80,
      mainsHighpass: { family: 'butterworth', order: 2 },
      subLowpass: { family: 'linkwitz-riley', order: 4 },
      mains: { curve, gainDb: 0, delayMs: 0, invert: false },
      sub: { curve, gainDb: 0, delayMs: 2, invert: false },
    });
    expect((await new Client().post('/api/v1/measured/predict', body({ measurementId: up.body.id }))).status).toBe(401);
    expect((await other.post('/api/v1/measured/predict', body({ measurementId: up.body.id }))).status).toBe(404);
    const stored = await viewer.post('/api/v1/measured/predict', body({ measurementId: up.body.id }));
    expect(stored.status, stored.text).toBe(200);
    const inline = await new Client().post('/api/v1/measured/predict', body({ frequencyHz: f, magnitudeDb: m, phaseDeg: p }));
    expect(inline.status).toBe(200);
    expect(inline.body.predictedSum.magnitudeDb).toEqual(stored.body.predictedSum.magnitudeDb);
    const bad = await new Client().post('/api/v1/measured/predict', body({ frequencyHz: f, magnitudeDb: m.slice(1) }));
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues[0].path).toBe('mains.curve.magnitudeDb');
  });
});
