import { describe, expect, it } from 'vitest';
import { POST } from '@/app/api/v1/crossover-sweep/route';
import { assertInDelta } from '../helpers/assert-in-delta';

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- answers are read loosely; the assertions check the shapes
type Json = Record<string, any>;

async function post(body: unknown, headers: Record<string, string> = { 'content-type': 'application/json' }): Promise<{ status: number; body: Json }> {
  const res = await POST(new Request('http://x/api/v1/crossover-sweep', { method: 'POST', headers, body: typeof body === 'string' ? body : JSON.stringify(body) }), undefined as never);
  return { status: res.status, body: (await res.json()) as Json };
}

const LR4 = { family: 'linkwitz-riley', order: 4 };
const BW2 = { family: 'butterworth', order: 2 };

const base = (extra: Json = {}) => ({
  temperatureC: 20,
  mainsRolloff: { kind: 'none' },
  subRolloff: { kind: 'none' },
  pairings: [{ mainsFilter: LR4, subFilter: LR4 }],
  ...extra,
});

describe('POST /api/v1/crossover-sweep', () => {
  it('tries 40–150 Hz in 5 Hz steps by default and ranks the rows best first', async () => {
    const { status, body: b } = await post(base({ mainsRolloff: { kind: 'sealed', cornerHz: 62, q: 0.71 }, subRolloff: { kind: 'lowpass', cornerHz: 200, q: 0.7 }, pairings: [{ mainsFilter: BW2, subFilter: LR4 }] }));
    expect(status).toBe(200);
    expect(b.candidatesHz).toEqual(Array.from({ length: 23 }, (_, i) => 40 + 5 * i));
    expect(b.rows).toHaveLength(23);
    expect(b.rows.map((r: Json) => r.rank)).toEqual(Array.from({ length: 23 }, (_, i) => i + 1));
    for (let i = 1; i < b.rows.length; i++) expect(b.rows[i].flatnessDb).toBeGreaterThanOrEqual(b.rows[i - 1].flatnessDb);
    for (const r of b.rows) {
      expect(Math.min(r.subDelayMs, r.mainsDelayMs)).toBe(0); // only positive delays, on one side
      expect(r.deepestDipDb).toBeLessThanOrEqual(0);
      expect(r).toMatchObject({ mainsFilter: BW2, subFilter: LR4 });
    }
    // mainsLowBassDb is read one octave below each candidate: at 40 Hz that is 20 Hz, deep under the sealed box's
    // own 62 Hz roll-off, so the mains carry less there than one octave under a 150 Hz crossover.
    const at = (hz: number) => b.rows.find((r: Json) => r.crossoverHz === hz);
    expect(at(150).mainsLowBassDb).toBeGreaterThan(at(40).mainsLowBassDb);
  });

  it('LR4 + LR4 without roll-offs is flat at every candidate with no delay and no inversion (Linkwitz 1976; REFERENCES.md)', async () => {
    const { body: b } = await post(base({ candidatesHz: [50, 80, 120] }));
    for (const r of b.rows) {
      expect(r.flatnessDb).toBeLessThan(0.01);
      expect(r.invertSub).toBe(false);
      assertInDelta(r.relativeDelayMs, 0, 0.01, `delay at ${r.crossoverHz} Hz`);
    }
    // How much low bass the mains still carry: the LR4 high-pass one octave below its corner, against two
    // octaves above it: |H|² = x⁸/(1+x⁴)² (Butterworth 1930, squared; Linkwitz 1976).
    const lr4Db = (x: number) => 10 * Math.log10(x ** 8 / (1 + x ** 4) ** 2);
    for (const r of b.rows) assertInDelta(r.mainsLowBassDb, lr4Db(0.5) - lr4Db(4), 0.01, 'mainsLowBassDb');
  });

  it('turns the best relative delay into processor settings for the distances: 1 m farther sub → 2.914 ms on the mains at 20 °C (REFERENCES.md)', async () => {
    const { body: b } = await post(base({ candidatesHz: [80], mainsDistanceM: 3, subDistanceM: 4 }));
    assertInDelta(b.arrivalDifferenceMs, 2.914, 0.001, 'arrival difference');
    assertInDelta(b.speedOfSoundMps, 343.21, 0.01, 'speed of sound');
    const row = b.rows[0];
    assertInDelta(row.mainsDelayMs, 2.914, 0.02, 'mains delay');
    expect(row.subDelayMs).toBe(0);
  });

  it('ranks several slope pairings together', async () => {
    const { status, body: b } = await post(base({ candidatesHz: [60, 80, 100], pairings: [{ mainsFilter: LR4, subFilter: LR4 }, { mainsFilter: BW2, subFilter: BW2 }] }));
    expect(status).toBe(200);
    expect(b.rows).toHaveLength(6);
    const families = new Set(b.rows.map((r: Json) => `${r.mainsFilter.family}${r.mainsFilter.order}`));
    expect(families).toEqual(new Set(['linkwitz-riley4', 'butterworth2']));
    // LR4 is an all-pass: it beats BW2 (+3 dB bump when inverted) at every point.
    expect(b.rows.slice(0, 3).every((r: Json) => r.mainsFilter.family === 'linkwitz-riley')).toBe(true);
    // BW2 needs one side inverted (REFERENCES.md: same polarity → null at the corner).
    expect(b.rows.filter((r: Json) => r.mainsFilter.family === 'butterworth').every((r: Json) => r.invertSub || Math.abs(r.relativeDelayMs) > 0.5)).toBe(true);
  });

  describe('bad fields are answered 400 with their path', () => {
    const cases: [string, string, Json][] = [
      ['no pairing', 'pairings', base({ pairings: [] })],
      ['seven pairings', 'pairings', base({ pairings: Array.from({ length: 7 }, () => ({ mainsFilter: LR4, subFilter: LR4 })) })],
      ['Linkwitz–Riley order 6', 'pairings.0.subFilter.order', base({ pairings: [{ mainsFilter: LR4, subFilter: { family: 'linkwitz-riley', order: 6 } }] })],
      ['Butterworth order 9', 'pairings.0.mainsFilter.order', base({ pairings: [{ mainsFilter: { family: 'butterworth', order: 9 }, subFilter: LR4 }] })],
      ['unknown family', 'pairings.0.mainsFilter.family', base({ pairings: [{ mainsFilter: { family: 'bessel', order: 2 }, subFilter: LR4 }] })],
      ['candidate below 20 Hz', 'candidatesHz.2', base({ candidatesHz: [40, 60, 10] })],
      ['candidate as text', 'candidatesHz.0', base({ candidatesHz: ['80'] })],
      ['no candidates', 'candidatesHz', base({ candidatesHz: [] })],
      ['61 candidates', 'candidatesHz', base({ candidatesHz: Array.from({ length: 61 }, (_, i) => 40 + i) })],
      ['too many rows', 'candidatesHz', base({ candidatesHz: Array.from({ length: 30 }, (_, i) => 40 + i), pairings: Array.from({ length: 5 }, () => ({ mainsFilter: LR4, subFilter: LR4 })) })],
      ['mains roll-off of a sub kind', 'mainsRolloff.kind', base({ mainsRolloff: { kind: 'lowpass', cornerHz: 200, q: 0.7 } })],
      ['sub roll-off Q out of range', 'subRolloff.q', base({ subRolloff: { kind: 'lowpass', cornerHz: 200, q: 0 } })],
      ['negative distance', 'subDistanceM', base({ subDistanceM: -1 })],
      ['temperature out of range', 'temperatureC', base({ temperatureC: -40 })],
      ['delay search too long', 'maxDelayMs', base({ maxDelayMs: 500 })],
      ['misspelt field', '(body)', base({ candidates: [80] })],
    ];
    it.each(cases)('%s → %s', async (_, where, request) => {
      const { status, body: b } = await post(request);
      expect(status).toBe(400);
      expect(b.error.issues.map((i: { path: string }) => i.path)).toContain(where);
    });
  });

  it('refuses bodies over 256 kB with 413 and non-JSON with 415', async () => {
    expect((await post(JSON.stringify({ ...base(), padding: 'x'.repeat(300 * 1024) }))).status).toBe(413);
    expect((await post('a=1', { 'content-type': 'text/plain' })).status).toBe(415);
  });
});
