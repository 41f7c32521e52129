import { describe, expect, it } from 'vitest';
import { POST } from '@/app/api/v1/crossover-sweep/route';
import { assertInDelta } from '../helpers/assert-in-delta';
import { BW2, LR4, postTo, refusedNaming, wholeSystem, type Json } from '../helpers/compute-route';

const post = postTo(POST, '/api/v1/crossover-sweep');

/** The whole system as it is (the present row: LR4 / LR4 at 80 Hz, both 3 m away, no delays) and what to try. */
const base = (extra: Json = {}) => wholeSystem(3, { pairings: [{ mainsFilter: LR4, subFilter: LR4 }], ...extra });

/** An invented sealed bookshelf (62 Hz, Q 0.71) crossed low, at 60 Hz BW2 / LR4, to an invented sealed sub 0.31 m farther. */
const SEALED_MAINS = { kind: 'sealed', cornerHz: 62, q: 0.71 };
const bookshelf = (extra: Json = {}) =>
  base({
    crossoverHz: 60,
    mainsHighpass: BW2,
    subLowpass: LR4,
    mains: { name: 'L', distanceM: 3.79, rolloff: SEALED_MAINS },
    subs: [{ name: 'Sub', distanceM: 4.1, rolloff: [{ kind: 'sealed', cornerHz: 24, q: 0.7 }, { kind: 'lowpass', cornerHz: 200, q: 0.7 }] }],
    pairings: [{ mainsFilter: BW2, subFilter: LR4 }],
    ...extra,
  });

// ---------------------------------------------------------------- independent figures, from the formulas

/** |H|² of a second-order high-pass at f/f0 = x with quality q: x⁴ / ((1 − x²)² + x²/q²) (published: Small 1972 sealed box; Butterworth 1930 for q = 1/√2). */
const hp2Power = (x: number, q: number) => x ** 4 / ((1 - x * x) ** 2 + (x * x) / (q * q));

/**
 * Where the sealed 62 Hz, Q 0.71 roll-off is exactly 3 dB down: with u = x², p = 10^(−0.3), u² = p·((1 − u)² + u/q²)
 * → (1 − p)·u² + p·(2 − 1/q²)·u − p = 0 (hand algebra on the formula above): 61.82 Hz.
 */
function sealedMinus3Hz(cornerHz: number, q: number): number {
  const p = 10 ** -0.3;
  const a = 1 - p;
  const b = p * (2 - 1 / (q * q));
  const u = (-b + Math.sqrt(b * b + 4 * a * p)) / (2 * a);
  return cornerHz * Math.sqrt(u);
}

/** Speed of sound in dry air, m/s (published: Kinsler et al. 2000). */
const speedMps = (temperatureC: number) => 331.3 * Math.sqrt(1 + temperatureC / 273.15);

/** LR4 pair at 80 Hz with the sub `lateMs` later: the flatness measure from its definition (Linkwitz 1976; computed here, not by dsp). */
function lr4PairFlatnessDb(lateMs: number): number {
  const sum = (fHz: number) => {
    const x = fHz / 80;
    // BW2 denominator d = 1 − x² + j√2·x; LR4 = BW2²: high-pass x⁴/d², low-pass 1/d².
    const d2re = (1 - x * x) ** 2 - 2 * x * x;
    const d2im = 2 * (1 - x * x) * Math.SQRT2 * x;
    const phi = (-2 * Math.PI * fHz * lateMs) / 1000;
    const nre = x ** 4 + Math.cos(phi);
    const nim = Math.sin(phi);
    return 10 * Math.log10((nre * nre + nim * nim) / (d2re * d2re + d2im * d2im));
  };
  const ref = sum(320);
  let worst = 0;
  for (let k = -48; k <= 48; k++) worst = Math.max(worst, Math.abs(sum(80 * 2 ** (k / 48)) - ref));
  return worst;
}

/** Invariants every sweep answer keeps (the ranking rule of the API page). */
function expectRanked(b: Json) {
  expect(b.rows.map((r: Json) => r.rank)).toEqual(b.rows.map((_: Json, i: number) => i + 1));
  const presentRows = b.rows.filter((r: Json) => r.present);
  expect(presentRows).toHaveLength(1);
  const present = presentRows[0];
  const at = b.rows.indexOf(present);
  for (const r of b.rows.slice(0, at)) {
    // Never above the present unless worth it: keeps the bass, no less flat, ≥ 0.5 dB flatter or clearing the roll-off.
    expect(r.worthIt, `row ${r.rank}`).toBe(true);
    expect(r.keepsBass, `row ${r.rank}`).toBe(true);
    expect(r.flatnessDb, `row ${r.rank}`).toBeLessThanOrEqual(present.flatnessDb);
    expect(r.extensionLossOctaves).toBeLessThanOrEqual(1 / 3 + 1e-9);
    expect(r.bassCutDb).toBeLessThanOrEqual(1);
    expect(r.gainDb >= 0.5 - 1e-9 || (present.nearMainsRolloff && !r.nearMainsRolloff), `row ${r.rank}`).toBe(true);
  }
  for (const r of b.rows.slice(at + 1)) expect(r.worthIt, `row ${r.rank}`).toBe(false);
  for (const r of b.rows) {
    expect(r.flatnessDb).toBe(r.assessment.flatnessDb);
    assertInDelta(r.gainDb, present.flatnessDb - r.flatnessDb, 0.011, `gain of row ${r.rank}`);
    expect(r.keepsBass).toBe(r.extensionLossOctaves <= 1 / 3 + 1e-9 && r.bassCutDb <= 1 + 1e-9);
    expect([r.set.mainsDelayMs, ...r.set.subs.map((s: Json) => s.delayMs)].every((d: number) => d >= 0)).toBe(true);
    expect(r.assessment.bandHz).toEqual([r.crossoverHz / 2, r.crossoverHz * 2]);
  }
  return present;
}

describe('POST /api/v1/crossover-sweep', () => {
  it('tries 40–150 Hz in 5 Hz steps by default; the present setting is a row of its own and only rows worth a change rank above it', async () => {
    const { status, body: b } = await post(bookshelf());
    expect(status).toBe(200);
    expect(b.flatness.definition).toContain('4·fc');
    expect(b.candidatesHz).toEqual(Array.from({ length: 23 }, (_, i) => 40 + 5 * i));
    expect(b.rows).toHaveLength(24);
    const present = expectRanked(b);
    expect(present).toMatchObject({ crossoverHz: 60, mainsFilter: BW2, subFilter: LR4, shiftMs: 0, flip: false, gainDb: 0, worthIt: false, keepsBass: true });
    expect(present.set).toEqual({ mainsDelayMs: 0, subs: [{ name: 'Sub', delayMs: 0, invert: false }] });
    for (const r of b.rows.filter((x: Json) => !x.present)) expect(r).toMatchObject({ mainsFilter: BW2, subFilter: LR4 });
    // The present crossover (60 Hz) sits on the mains' own roll-off, and clearer, flatter points exist: it is not first.
    expect(present.nearMainsRolloff).toBe(true);
    const top = b.rows[0];
    expect(top.present).toBe(false);
    expect(top.nearMainsRolloff).toBe(false);
    // The top row is the smallest change among the clear rows within 0.5 dB of the flattest of them (ADVICE_RULES).
    const clear = b.rows.filter((r: Json) => r.worthIt && !r.nearMainsRolloff);
    const flattest = Math.min(...clear.map((r: Json) => r.flatnessDb));
    expect(top.flatnessDb).toBeLessThanOrEqual(flattest + 0.5);
    const octaves = (r: Json) => Math.abs(Math.log2(r.crossoverHz / 60));
    for (const r of clear.filter((x: Json) => x.flatnessDb <= flattest + 0.5)) expect(octaves(top)).toBeLessThanOrEqual(octaves(r));
  });

  it("reads the mains' own −3 dB point from their roll-off and keeps half an octave clear of it (Small 1972; common practice)", async () => {
    const { body: b } = await post(bookshelf());
    const m3 = sealedMinus3Hz(62, 0.71);
    assertInDelta(m3, 61.82, 0.01, 'hand value');
    assertInDelta(b.mainsMinus3DbHz, m3, 0.051, 'mainsMinus3DbHz');
    // Half an octave above: × √2 (geometry of the octave; the half-octave rule is common practice).
    assertInDelta(b.lowestClearHz, m3 * Math.SQRT2, 0.051, 'lowestClearHz');
    for (const r of b.rows) expect(r.nearMainsRolloff, `${r.crossoverHz} Hz`).toBe(r.crossoverHz < b.lowestClearHz);
    expect(b.rows.filter((r: Json) => r.nearMainsRolloff).map((r: Json) => r.crossoverHz).sort((p: number, q: number) => p - q)).toEqual([40, 45, 50, 55, 60, 60, 65, 70, 75, 80, 85]);
  });

  it('mainsLowBassDb: the mains path one octave below each crossover against two above, from the formulas (Butterworth 1930; Small 1972)', async () => {
    const { body: b } = await post(bookshelf({ candidatesHz: [40, 80, 150] }));
    // BW2 high-pass (q = 1/√2) at fc × the sealed box at 62 Hz, q 0.71; at fc/2 against 4·fc.
    const mainsDb = (fHz: number, fcHz: number) => 10 * Math.log10(hp2Power(fHz / fcHz, Math.SQRT1_2) * hp2Power(fHz / 62, 0.71));
    for (const r of b.rows) assertInDelta(r.mainsLowBassDb, mainsDb(r.crossoverHz / 2, r.crossoverHz) - mainsDb(4 * r.crossoverHz, r.crossoverHz), 0.011, `${r.crossoverHz} Hz`);
    const at = (hz: number) => b.rows.find((r: Json) => r.crossoverHz === hz && !r.present);
    expect(at(150).mainsLowBassDb).toBeGreaterThan(at(40).mainsLowBassDb);
  });

  it('LR4 + LR4 without roll-offs at equal distances is flat at every candidate: nothing is worth a change, the present row is first (published: Linkwitz 1976)', async () => {
    const { body: b } = await post(base({ candidatesHz: [50, 80, 120] }));
    expect(b.rows).toHaveLength(4);
    expectRanked(b);
    expect(b.rows[0].present).toBe(true);
    expect(b.mainsMinus3DbHz).toBeNull();
    expect(b.lowestClearHz).toBeNull();
    for (const r of b.rows) {
      expect(r.flatnessDb).toBeLessThan(0.01);
      expect(r.flip).toBe(false);
      assertInDelta(r.shiftMs, 0, 0.01, `shift at ${r.crossoverHz} Hz`);
      expect(r.nearMainsRolloff).toBe(false);
      expect(r.assessment.minus3DbHz).toBeNull();
    }
    // How much low bass the mains still carry: the LR4 high-pass one octave below its corner, against two
    // octaves above it: |H|² = x⁸/(1+x⁴)² (Butterworth 1930, squared; Linkwitz 1976).
    const lr4Db = (x: number) => 10 * Math.log10(x ** 8 / (1 + x ** 4) ** 2);
    for (const r of b.rows) assertInDelta(r.mainsLowBassDb, lr4Db(0.5) - lr4Db(4), 0.01, 'mainsLowBassDb');
  });

  it('a sub 1 m farther with no compensation: the 80 Hz row moves the delay to the mains (2.914 ms at 20 °C) and ranks above the present (Kinsler et al.; Linkwitz 1976)', async () => {
    const { body: b } = await post(base({ candidatesHz: [80], subs: [{ name: 'Sub', distanceM: 4 }] }));
    assertInDelta(b.speedOfSoundMps, 343.21, 0.01, 'speed of sound');
    const oneMetreMs = 1000 / speedMps(20);
    assertInDelta(oneMetreMs, 2.914, 0.001, '1 m at 20 °C');
    const present = expectRanked(b);
    assertInDelta(present.flatnessDb, lr4PairFlatnessDb(oneMetreMs), 0.01, 'present flatness (oracle)');
    const row = b.rows[0];
    expect(row.present).toBe(false);
    expect(row).toMatchObject({ crossoverHz: 80, flip: false, worthIt: true, keepsBass: true });
    assertInDelta(row.shiftMs, -oneMetreMs, 0.01, 'shift');
    assertInDelta(row.set.mainsDelayMs, oneMetreMs, 0.01, 'mains delay');
    expect(row.set.subs).toEqual([{ name: 'Sub', delayMs: 0, invert: false }]);
    assertInDelta(row.flatnessDb, lr4PairFlatnessDb(oneMetreMs - row.set.mainsDelayMs), 0.01, 'row flatness (oracle)');
    expect(row.gainDb).toBeGreaterThanOrEqual(0.5);
  });

  it('the delay shift stays within maxDelayMs', async () => {
    const { body: b } = await post(base({ candidatesHz: [80], subs: [{ name: 'Sub', distanceM: 4 }], maxDelayMs: 1 }));
    for (const r of b.rows) expect(Math.abs(r.shiftMs)).toBeLessThanOrEqual(1);
  });

  it('ranks several slope pairings together', async () => {
    const { status, body: b } = await post(base({ candidatesHz: [60, 80, 100], pairings: [{ mainsFilter: LR4, subFilter: LR4 }, { mainsFilter: BW2, subFilter: BW2 }] }));
    expect(status).toBe(200);
    expect(b.rows).toHaveLength(7);
    expectRanked(b);
    const families = new Set(b.rows.map((r: Json) => `${r.mainsFilter.family}${r.mainsFilter.order}`));
    expect(families).toEqual(new Set(['linkwitz-riley4', 'butterworth2']));
    // The present LR4 pair is flat (an all-pass), so nothing beats it: it is first, the other LR4 rows next,
    // BW2 (no better than ±1.84 dB here) last.
    expect(b.rows[0].present).toBe(true);
    expect(b.rows.slice(0, 4).every((r: Json) => r.mainsFilter.family === 'linkwitz-riley')).toBe(true);
    const bw2Rows = b.rows.filter((r: Json) => r.mainsFilter.family === 'butterworth');
    // BW2 needs one side inverted or a delay (published: Linkwitz 1976: same polarity → null at the corner); the flip alone gives
    // (1 + x²)²/(1 + x⁴) → 3.01 dB at fc against 10·log10(289/257) at 4·fc: 2.50 dB, so no row is worse than that.
    const flipOnlyDb = 10 * Math.log10(2) - 10 * Math.log10(289 / 257);
    for (const r of bw2Rows) {
      expect(r.flip || Math.abs(r.shiftMs) > 0.5).toBe(true);
      expect(r.flatnessDb).toBeLessThanOrEqual(flipOnlyDb + 0.01);
      expect(r.worthIt).toBe(false);
    }
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
      ['too many rows with the default candidates', 'candidatesHz', base({ pairings: Array.from({ length: 6 }, () => ({ mainsFilter: LR4, subFilter: LR4 })) })],
      ['present crossover missing', 'crossoverHz', { ...base(), crossoverHz: undefined }],
      ['present crossover above 300 Hz', 'crossoverHz', base({ crossoverHz: 400 })],
      ['present slope Linkwitz–Riley order 3', 'mainsHighpass.order', base({ mainsHighpass: { family: 'linkwitz-riley', order: 3 } })],
      ['mains roll-off of a sub kind', 'mains.rolloff.kind', base({ mains: { name: 'L', distanceM: 3, rolloff: { kind: 'lowpass', cornerHz: 200, q: 0.7 } } })],
      ['sub roll-off Q out of range', 'subs.0.rolloff.q', base({ subs: [{ name: 'Sub', distanceM: 3, rolloff: { kind: 'lowpass', cornerHz: 200, q: 0 } }] })],
      ['negative sub distance', 'subs.0.distanceM', base({ subs: [{ name: 'Sub', distanceM: -1 }] })],
      ['no subs', 'subs', base({ subs: [] })],
      ['temperature out of range', 'temperatureC', base({ temperatureC: -40 })],
      ['delay search too long', 'maxDelayMs', base({ maxDelayMs: 500 })],
      ['misspelt field', '(body)', base({ candidates: [80] })],
      // The shape before the whole-system request: refused, not silently ignored.
      ['an old per-pairing field', '(body)', base({ mainsRolloff: { kind: 'none' } })],
    ];
    it.each(cases)('%s → %s', refusedNaming(post));
  });

  it('refuses bodies over 2 MB (room for inline measured curves) with 413 and non-JSON with 415', async () => {
    expect((await post(JSON.stringify({ ...base(), padding: 'x'.repeat(2 * 1024 * 1024 + 1024) }))).status).toBe(413);
    expect((await post('a=1', { 'content-type': 'text/plain' })).status).toBe(415);
  });
});
