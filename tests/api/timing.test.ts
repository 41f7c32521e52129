import { describe, expect, it } from 'vitest';
import { POST } from '@/app/api/v1/timing/route';
import { assertInDelta } from '../helpers/assert-in-delta';

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- answers are read loosely; the assertions check the shapes
type Json = Record<string, any>;

async function post(body: unknown, headers: Record<string, string> = { 'content-type': 'application/json' }): Promise<{ status: number; body: Json }> {
  const res = await POST(new Request('http://x/api/v1/timing', { method: 'POST', headers, body: typeof body === 'string' ? body : JSON.stringify(body) }), undefined as never);
  return { status: res.status, body: (await res.json()) as Json };
}

const LR4 = { family: 'linkwitz-riley', order: 4 };
const BW2 = { family: 'butterworth', order: 2 };

const base = (extra: Json = {}) => ({
  temperatureC: 20,
  crossoverHz: 80,
  mainsHighpass: LR4,
  subLowpass: LR4,
  mains: { name: 'L', distanceM: 3.4 },
  subs: [{ name: 'Sub', distanceM: 3.4 }],
  ...extra,
});

describe('POST /api/v1/timing', () => {
  it('gives arrival times from distance and temperature: 3.4 m at 20 °C = 9.906 ms (c = 343.21 m/s, Kinsler et al. 2000)', async () => {
    const { status, body: b } = await post(base());
    expect(status).toBe(200);
    assertInDelta(b.speedOfSoundMps, 343.21, 0.01, 'c');
    assertInDelta(b.mains.arrivalMs, 3.4 * 2.914, 0.002, 'mains arrival');
    assertInDelta(b.subs[0].arrivalMs, 3.4 * 2.914, 0.002, 'sub arrival');
    expect(b.group).toBeNull();
  });

  it('LR4 pair at equal distances is in phase at the crossover and needs nothing (Linkwitz 1976)', async () => {
    const { body: b } = await post(base());
    const s = b.subs[0];
    assertInDelta(s.phaseDifferenceDeg, 0, 0.1, 'phase difference');
    assertInDelta(s.recommendation.addDelayMs, 0, 0.05, 'added delay');
    expect(s.recommendation.invert).toBe(false);
    expect(s.recommendation.flatnessDb).toBeLessThan(0.01);
    // The Timing window holds the recommendation; the level curve has both polarities on one delay axis.
    expect(s.timingWindowMs[0]).toBeLessThanOrEqual(0);
    expect(s.timingWindowMs[1]).toBeGreaterThanOrEqual(0);
    const lvd = s.levelVersusDelay;
    expect(lvd.normalDb).toHaveLength(lvd.subMinusMainsDelayMs.length);
    expect(lvd.invertedDb).toHaveLength(lvd.subMinusMainsDelayMs.length);
    assertInDelta(lvd.subMinusMainsDelayMs[0], -20, 1e-6, 'scan start');
    assertInDelta(lvd.subMinusMainsDelayMs.at(-1), 20, 1e-6, 'scan end');
    // At zero delay the two polarities read 0 dB and a null (LR4: in phase, Linkwitz 1976).
    const zero = lvd.subMinusMainsDelayMs.findIndex((d: number) => Math.abs(d) < 1e-6);
    assertInDelta(lvd.normalDb[zero], 0, 0.01, 'normal at 0 ms');
    expect(lvd.invertedDb[zero]).toBeLessThan(-40);
  });

  it('a sub 1 m farther arrives 2.914 ms late, 83.9° behind at 80 Hz; the mains get that delay (REFERENCES.md)', async () => {
    const { body: b } = await post(base({ subs: [{ name: 'Sub', distanceM: 4.4 }] }));
    const s = b.subs[0];
    assertInDelta(s.leadMs, -2.914, 0.002, 'lead');
    assertInDelta(s.delayPhaseDeg, 83.9, 0.1, 'phase from the delay');
    assertInDelta(s.phaseDifferenceDeg, 83.9, 0.2, 'phase difference (LR4 adds none)');
    assertInDelta(s.filterPhaseDeg, 0, 0.2, "filters' own phase");
    expect(s.recommendation.addTo).toBe('mains');
    assertInDelta(s.recommendation.mainsDelayMs, 2.914, 0.02, 'mains delay');
    expect(s.recommendation.subDelayMs).toBe(0);
  });

  it("counts the filters' own phase: BW2 low-pass and high-pass are 180° apart at the corner, so it inverts the sub (REFERENCES.md)", async () => {
    const { body: b } = await post(base({ mainsHighpass: BW2, subLowpass: BW2 }));
    const s = b.subs[0];
    assertInDelta(Math.abs(s.phaseDifferenceDeg), 180, 0.2, 'phase difference');
    assertInDelta(Math.abs(s.filterPhaseDeg), 180, 0.2, "filters' phase");
    expect(s.recommendation.invert).toBe(true);
    expect(s.recommendation.flipPolarity).toBe(true);
  });

  it('aligns several subs to each other and to the mains, only with positive delays', async () => {
    const { status, body: b } = await post(base({ subs: [{ name: 'Front', distanceM: 3.4, gainDb: -6 }, { name: 'Back', distanceM: 4.4, gainDb: -6 }] }));
    expect(status).toBe(200);
    expect(b.subs).toHaveLength(2);
    const g = b.group;
    expect(g.subs.map((s: Json) => s.name)).toEqual(['Front', 'Back']);
    const delays = [g.mainsDelayMs, ...g.subs.map((s: Json) => s.delayMs)];
    for (const d of delays) expect(d).toBeGreaterThanOrEqual(0);
    expect(Math.min(...delays)).toBe(0);
    // The nearer sub waits for the farther one: 1 m = 2.914 ms at 20 °C (REFERENCES.md).
    assertInDelta(g.subs[0].delayMs - g.subs[1].delayMs, 2.914, 0.05, 'sub-to-sub');
    expect(g.flatnessDb).toBeLessThanOrEqual(g.flatnessBeforeDb + 1e-9);
  });

  describe('bad fields are answered 400 with their path', () => {
    const cases: [string, string, Json][] = [
      ['crossover below 20 Hz', 'crossoverHz', base({ crossoverHz: 10 })],
      ['crossover missing', 'crossoverHz', { ...base(), crossoverHz: undefined }],
      ['Linkwitz–Riley order 3', 'mainsHighpass.order', base({ mainsHighpass: { family: 'linkwitz-riley', order: 3 } })],
      ['Butterworth order 12', 'subLowpass.order', base({ subLowpass: { family: 'butterworth', order: 12 } })],
      ['mains distance missing', 'mains.distanceM', base({ mains: { name: 'L' } })],
      ['negative sub distance', 'subs.1.distanceM', base({ subs: [{ name: 'A', distanceM: 3 }, { name: 'B', distanceM: -2 }] })],
      ['negative sub delay', 'subs.0.delayMs', base({ subs: [{ name: 'A', distanceM: 3, delayMs: -1 }] })],
      ['invert not boolean', 'subs.0.invert', base({ subs: [{ name: 'A', distanceM: 3, invert: 1 }] })],
      ['no subs', 'subs', base({ subs: [] })],
      ['nine subs', 'subs', base({ subs: Array.from({ length: 9 }, (_, i) => ({ name: `S${i}`, distanceM: 3 })) })],
      ['unknown sub roll-off kind', 'subs.0.rolloff.kind', base({ subs: [{ name: 'A', distanceM: 3, rolloff: { kind: 'horn', cornerHz: 20 } }] })],
      ['bad roll-off in a chain', 'subs.0.rolloff.1.q', base({ subs: [{ name: 'A', distanceM: 3, rolloff: [{ kind: 'vented', cornerHz: 20 }, { kind: 'lowpass', cornerHz: 200, q: 99 }] }] })],
      ['step of zero', 'stepMs', base({ stepMs: 0 })],
      ['temperature as text', 'temperatureC', base({ temperatureC: 'warm' })],
      ['misspelt field', 'mains', base({ mains: { name: 'L', distanceM: 3, distance: 3 } })],
    ];
    it.each(cases)('%s → %s', async (_, where, request) => {
      const { status, body: b } = await post(request);
      expect(status).toBe(400);
      expect(b.error.issues.map((i: { path: string }) => i.path)).toContain(where);
    });
  });

  it('refuses bodies over 256 kB with 413 and non-JSON with 415', async () => {
    expect((await post(JSON.stringify({ ...base(), padding: 'x'.repeat(300 * 1024) }))).status).toBe(413);
    expect((await post('<xml/>', { 'content-type': 'application/xml' })).status).toBe(415);
  });
});
