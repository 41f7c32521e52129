import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { assertInDelta } from '../helpers/assert-in-delta';
import { Client, signedInClient } from '../helpers/http';

// POST /api/v1/measured/compare: runs as differences from a reference run (common practice). The oracle is built by
// construction: a run made as reference + d(f) must come back as d(f).

/** 1/24-octave points 10 Hz … 10 kHz and an invented room-like reference curve (ripple in log-frequency, nothing real). */
const HZ = Array.from({ length: 240 }, (_, i) => 10 * 2 ** (i / 24));
const REFERENCE = HZ.map((f) => 82 + 4 * Math.sin(3 * Math.log2(f)) - 10 * Math.log10(1 + (45 / f) ** 4));
/** A tilt linear in log2(f): resampling is linear in log-frequency, so it survives exactly. */
const tilt = (f: number) => -2 + 0.75 * Math.log2(f / 100);
const run = (db: (f: number, i: number) => number, hz = HZ) => ({ frequencyHz: hz, magnitudeDb: hz.map(db) });
const csv = (c: { frequencyHz: number[]; magnitudeDb: number[] }) => ['# invented run', ...c.frequencyHz.map((f, i) => `${f},${c.magnitudeDb[i]}`)].join('\n');
const form = (text: string, fields: Record<string, string>) => {
  const fd = new FormData();
  fd.set('file', new Blob([text], { type: 'text/csv' }), 'run.csv');
  for (const [k, v] of Object.entries(fields)) fd.set(k, v);
  return fd;
};

describe('POST /api/v1/measured/compare', () => {
  let owner: Client;
  let other: Client;
  let systemId: string;
  const made: string[] = [];

  beforeAll(async () => {
    [owner, other] = await Promise.all([signedInClient('demo@seamline.test'), signedInClient('other@seamline.test')]);
    const ws = await owner.get('/api/v1/workspaces');
    const larkspurId = ws.body.items.find((w: { name: string }) => w.name === 'Larkspur AV').id;
    const systems = await owner.get(`/api/v1/systems?workspaceId=${larkspurId}`);
    systemId = systems.body.items.find((s: { name: string }) => s.name === 'Juniper Lane screening room').id;
  });

  afterAll(async () => {
    for (const id of made) await owner.delete(`/api/v1/measurements/${id}`);
  });

  it('inline runs need no session: reference + a tilt comes back as the tilt on the common range (by construction), levels as measured', async () => {
    const narrower = HZ.filter((f) => f >= 20 && f <= 5000);
    const res = await new Client().post('/api/v1/measured/compare', {
      reference: run((_f, i) => REFERENCE[i]!),
      others: [run((f) => REFERENCE[HZ.indexOf(f)]! + tilt(f), narrower)],
      smoothingFraction: 0,
      pointsPerOctave: 24,
    });
    expect(res.status, res.text).toBe(200);
    expect(res.body).toMatchObject({ levels: 'as measured', matchLevelBandHz: null, reference: { name: 'Reference' }, differences: [{ name: 'Run 1', levelOffsetDb: 0 }] });
    assertInDelta(res.body.rangeHz.startHz, narrower[0]!, 1e-3);
    assertInDelta(res.body.rangeHz.stopHz, narrower[narrower.length - 1]!, 1e-2);
    const f: number[] = res.body.frequencyHz;
    // Answers carry 3 decimals (dB) and 6 significant digits (Hz).
    assertInDelta(res.body.differences[0].differenceDb, f.map(tilt), 2e-3);
    // Worked by hand: the tilt is −3.74 dB at 20 Hz and +2.23 dB at 4.97 kHz, so the largest is at the bottom of the range.
    assertInDelta(res.body.differences[0].largest.frequencyHz, 20, 1e-3);
    assertInDelta(res.body.differences[0].largest.differenceDb, -2 + 0.75 * Math.log2(0.2), 2e-3);
  });

  it('smoothing a constant difference leaves it constant; matching over a band takes it out (by construction)', async () => {
    const body = { reference: run((_f, i) => REFERENCE[i]!), others: [run((_f, i) => REFERENCE[i]! - 2.5)], smoothingFraction: 3 };
    const asMeasured = await new Client().post('/api/v1/measured/compare', body);
    expect(asMeasured.status, asMeasured.text).toBe(200);
    expect(asMeasured.body.differences[0]).toMatchObject({ minDb: -2.5, maxDb: -2.5, largest: { differenceDb: -2.5 } });
    const matched = await new Client().post('/api/v1/measured/compare', { ...body, matchLevelBandHz: { startHz: 200, stopHz: 2000 } });
    expect(matched.status, matched.text).toBe(200);
    expect(matched.body).toMatchObject({ levels: 'matched', matchLevelBandHz: { startHz: 200, stopHz: 2000 }, differences: [{ levelOffsetDb: 2.5, minDb: 0, maxDb: 0 }] });
  });

  it('refuses with 400 naming the field: runs sharing under an octave, a band outside their range, no others, a bad smoothing', async () => {
    const c = new Client();
    const issuePaths = (r: { body: { error: { issues: { path: string }[] } } }) => r.body.error.issues.map((i) => i.path);
    const apart = await c.post('/api/v1/measured/compare', { reference: run((_f, i) => REFERENCE[i]!), others: [run(() => 80, HZ.filter((f) => f >= 6000))] });
    expect(apart.status).toBe(400);
    expect(issuePaths(apart)).toContain('others');
    const band = await c.post('/api/v1/measured/compare', { reference: run((_f, i) => REFERENCE[i]!), others: [run((_f, i) => REFERENCE[i]!)], matchLevelBandHz: { startHz: 5000, stopHz: 20000 } });
    expect(band.status).toBe(400);
    expect(issuePaths(band)).toContain('matchLevelBandHz');
    const none = await c.post('/api/v1/measured/compare', { reference: run((_f, i) => REFERENCE[i]!), others: [] });
    expect(none.status).toBe(400);
    expect(issuePaths(none)).toContain('others');
    const smoothing = await c.post('/api/v1/measured/compare', { reference: run((_f, i) => REFERENCE[i]!), others: [run((_f, i) => REFERENCE[i]!)], smoothingFraction: 2.5 });
    expect(smoothing.status).toBe(400);
    expect(issuePaths(smoothing)).toContain('smoothingFraction');
  });

  it('stored runs are read with the caller’s rights (401 signed out, 404 outside the workspace) and keep their names; stored and inline mix', async () => {
    const a = await owner.post('/api/v1/measurements', form(csv(run((_f, i) => REFERENCE[i]!)), { name: 'Compare test, switch A (invented)', systemId, seat: 'Compare Test Seat', role: 'C', runLabel: 'switch A' }));
    expect(a.status, a.text).toBe(201);
    made.push(a.body.id);
    const b = await owner.post('/api/v1/measurements', form(csv(run((f, i) => REFERENCE[i]! + tilt(f))), { name: 'Compare test, switch B (invented)', systemId, seat: 'Compare Test Seat', role: 'C', runLabel: 'switch B' }));
    expect(b.status, b.text).toBe(201);
    made.push(b.body.id);

    const body = { reference: { measurementId: a.body.id }, others: [{ measurementId: b.body.id }, { name: 'Inline copy', ...run((_f, i) => REFERENCE[i]! + 1) }], pointsPerOctave: 24 };
    expect((await new Client().post('/api/v1/measured/compare', body)).status).toBe(401);
    expect((await other.post('/api/v1/measured/compare', body)).status).toBe(404);
    const mine = await owner.post('/api/v1/measured/compare', body);
    expect(mine.status, mine.text).toBe(200);
    expect(mine.body.reference.name).toBe('Compare test, switch A (invented)');
    expect(mine.body.differences.map((d: { name: string }) => d.name)).toEqual(['Compare test, switch B (invented)', 'Inline copy']);
    // The stored text holds the values as written (full precision here), so the tilt comes back within the answer's rounding.
    assertInDelta(mine.body.differences[0].differenceDb, (mine.body.frequencyHz as number[]).map(tilt), 2e-3);
    assertInDelta(mine.body.differences[1].differenceDb, (mine.body.frequencyHz as number[]).map(() => 1), 2e-3);
  });
});
