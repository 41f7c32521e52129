import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Client, signedInClient } from '../helpers/http';
import { LR4, wholeSystem } from '../helpers/compute-route';

// Timing and the Crossover sweep on measured curves through the API: inline curves anonymously, stored ones with the
// caller's rights, refusals naming the field. The curves are invented: a sealed mains (|H|² = x⁴/(1 + x⁴), x = f/50 Hz;
// Small 1972) 3 m away and a sealed sub (x = f/25 Hz) 4 m away, with their air delay in the phase (−360·f·d/c).
const HZ = Array.from({ length: 241 }, (_, i) => 10 * 2 ** (i / 24));
const C = 343.2; // m/s at 20 °C (Kinsler et al. 2000)
const sealed = (cornerHz: number, distanceM: number) => ({
  frequencyHz: HZ,
  magnitudeDb: HZ.map((f) => 10 * Math.log10((f / cornerHz) ** 4 / (1 + (f / cornerHz) ** 4))),
  // Second-order Butterworth high-pass phase 180° − atan2(√2·x, 1 − x²), plus the air delay, wrapped.
  phaseDeg: HZ.map((f) => {
    const x = f / cornerHz;
    const deg = 180 - (Math.atan2(Math.SQRT2 * x, 1 - x * x) * 180) / Math.PI - (360 * f * distanceM) / C;
    return deg - 360 * Math.round(deg / 360);
  }),
});
const csv = (c: ReturnType<typeof sealed>) => ['# invented', ...c.frequencyHz.map((f, i) => `${f},${c.magnitudeDb[i]},${c.phaseDeg[i]}`)].join('\n');
const form = (text: string, fields: Record<string, string>) => {
  const fd = new FormData();
  fd.set('file', new Blob([text], { type: 'text/csv' }), 'curve.csv');
  for (const [k, v] of Object.entries(fields)) fd.set(k, v);
  return fd;
};
const measuredBody = (mains: object, sub: object, extra: object = {}) =>
  wholeSystem(0, { mains: { name: 'L', distanceM: 0, measured: mains }, subs: [{ name: 'Sub', distanceM: 0, measured: sub }], ...extra });

describe('Timing and the Crossover sweep on measured curves (POST /api/v1/timing, /api/v1/crossover-sweep)', () => {
  const anonymous = new Client();
  let owner: Client;
  let other: Client;
  const made: string[] = [];

  beforeAll(async () => {
    [owner, other] = await Promise.all([signedInClient('demo@seamline.test'), signedInClient('other@seamline.test')]);
    for (const [curve, role] of [[sealed(50, 3), 'mains'], [sealed(25, 4), 'sub']] as const) {
      const res = await owner.request('POST', '/api/v1/measurements', form(csv(curve), { name: `Decisions ${role} ${Date.now()}`, role, seat: 'Row 1 centre' }));
      expect(res.status).toBe(201);
      made.push(res.body.id);
    }
  });
  afterAll(async () => {
    for (const id of made) await owner.delete(`/api/v1/measurements/${id}`);
  });

  it('inline curves need no session; the advice is the model’s for the same speakers and distances; the answer says what it ran on', async () => {
    const res = await anonymous.post('/api/v1/timing', measuredBody(sealed(50, 3), sealed(25, 4)));
    expect(res.status).toBe(200);
    expect(res.body.measured.sources.map((s: { name: string }) => s.name)).toEqual(['L', 'Sub']);
    expect(res.body.measured.note).toMatch(/measured phase/);
    expect(res.body.mains).toMatchObject({ arrivalMs: null, arrivalFrom: null });
    // The oracle: the same two speakers as the model knows them (sealed, Butterworth Q, 3 m and 4 m away).
    const q = Math.SQRT1_2;
    const model = await anonymous.post('/api/v1/timing', wholeSystem(0, { mains: { name: 'L', distanceM: 3, rolloff: { kind: 'sealed', cornerHz: 50, q } }, subs: [{ name: 'Sub', distanceM: 4, rolloff: { kind: 'sealed', cornerHz: 25, q } }] }));
    const [got, want] = [res.body.subs[0].advice, model.body.subs[0].advice];
    expect(got.keep).toBe(want.keep);
    expect(Math.abs(got.set.mainsDelayMs - got.set.subs[0].delayMs - (want.set.mainsDelayMs - want.set.subs[0].delayMs))).toBeLessThan(0.06);
    expect(got.set.subs[0].invert).toBe(want.set.subs[0].invert);
    const sweep = await anonymous.post('/api/v1/crossover-sweep', measuredBody(sealed(50, 3), sealed(25, 4), { pairings: [{ mainsFilter: LR4, subFilter: LR4 }], candidatesHz: [60, 80, 100] }));
    expect(sweep.status).toBe(200);
    // In-room −3 dB of the invented sealed mains: 50 Hz by construction (their level over 200 Hz–2 kHz is ≈ 0 dB).
    expect(Math.abs(sweep.body.mainsMinus3DbHz - 50)).toBeLessThan(1);
  });

  it('stored measurements by id: the owner gets the same answer as inline; signed out 401; another account 404', async () => {
    const [mainsId, subId] = made;
    const byId = measuredBody({ measurementId: mainsId }, { measurementId: subId });
    const stored = await owner.post('/api/v1/timing', byId);
    const inline = await owner.post('/api/v1/timing', measuredBody(sealed(50, 3), sealed(25, 4)));
    expect(stored.status).toBe(200);
    expect(stored.body.subs[0].advice.set).toEqual(inline.body.subs[0].advice.set);
    expect((await anonymous.post('/api/v1/timing', byId)).status).toBe(401);
    expect((await other.post('/api/v1/timing', byId)).status).toBe(404);
  });

  it('refuses a measured source with a distance or a roll-off, and crossover points the curves cannot judge, naming the field', async () => {
    const withDistance = measuredBody(sealed(50, 3), sealed(25, 4));
    (withDistance.mains as { distanceM: number }).distanceM = 3;
    const a = await anonymous.post('/api/v1/timing', withDistance);
    expect(a.status).toBe(400);
    expect(a.body.error.issues.map((i: { path: string }) => i.path)).toContain('mains.distanceM');
    const short = { frequencyHz: HZ.slice(0, 130), magnitudeDb: sealed(50, 3).magnitudeDb.slice(0, 130), phaseDeg: sealed(50, 3).phaseDeg.slice(0, 130) };
    const b = await anonymous.post('/api/v1/crossover-sweep', measuredBody(short, sealed(25, 4), { pairings: [{ mainsFilter: LR4, subFilter: LR4 }], candidatesHz: [60, 120] }));
    expect(b.status).toBe(400);
    expect(b.body.error.issues.map((i: { path: string }) => i.path)).toEqual(['candidatesHz.1']);
    expect(b.body.error.message).toMatch(/120 Hz needs the mains measured over 60–480 Hz/);
  });
});
