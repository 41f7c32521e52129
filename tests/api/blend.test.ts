import { describe, expect, it } from 'vitest';
import { POST } from '@/app/api/v1/blend/route';
import { assertInDelta } from '../helpers/assert-in-delta';
import { issuePaths, postTo, type Json } from '../helpers/compute-route';
import { speedMps, mul, div, add, scale, bw2, lr4, late, levelDb, type C } from '../helpers/complex-oracle';

const post = postTo(POST, '/api/v1/blend');

const path = (response: 'highpass' | 'lowpass' | 'none', family: 'butterworth' | 'linkwitz-riley', order: number, extra: Json = {}) => ({
  name: response === 'highpass' ? 'mains' : 'sub',
  filter: { family, order, response, cornerHz: 80 },
  gainDb: 0,
  delayMs: 0,
  invert: false,
  ...extra,
});

const body = (paths: Json[], extra: Json = {}) => ({ temperatureC: 20, grid: { startHz: 10, stopHz: 1000, pointsPerOctave: 48 }, paths, ...extra });

/** The API page's own example request (lib/openapi/operations, shown on /docs/api). */
const specExample = body([
  path('highpass', 'linkwitz-riley', 4),
  { name: 'sub', filter: { family: 'butterworth', order: 2, response: 'lowpass', cornerHz: 80 }, gainDb: 0, delayMs: 2.5, invert: true, distanceM: 3.4 },
]);

describe('POST /api/v1/blend', () => {
  it('answers the API page example with the contract fields', async () => {
    const { status, body: b } = await post(specExample);
    expect(status).toBe(200);
    expect(b.frequencyHz).toHaveLength(319); // 10 Hz up to (not reaching) 1 kHz at 48 per octave, startHz included
    expect(b.frequencyHz[0]).toBe(10);
    expect(b.paths.map((p: Json) => p.name)).toEqual(['mains', 'sub']);
    for (const p of b.paths) {
      expect(p.magnitudeDb).toHaveLength(319);
      expect(p.phaseDeg).toHaveLength(319);
    }
    expect(Object.keys(b.sum).sort()).toEqual(['groupDelayMs', 'magnitudeDb', 'phaseDeg']);
    for (const v of [...b.sum.phaseDeg, ...b.paths[0].phaseDeg, ...b.paths[1].phaseDeg]) {
      expect(v).toBeGreaterThan(-180);
      expect(v).toBeLessThanOrEqual(180);
    }
    expect(b.metrics).toMatchObject({ crossoverHz: 80, crossoverSource: 'filters', mainsPath: 0, subPath: 1 });
    expect(Object.keys(b.metrics).sort()).toEqual(
      ['bandHz', 'crossoverHz', 'crossoverSource', 'deepestDipDb', 'deepestDipHz', 'flatnessDb', 'mainsPath', 'maxDeviationDb', 'maxDeviationHz', 'minus3DbHz', 'pathLevelsDb', 'phaseDifferenceDeg', 'referenceHz', 'referenceLevelDb', 'subPath', 'sumLevelDb'].sort(),
    );
    // Butterworth −3.01 dB, Linkwitz–Riley −6.02 dB at the corner (Butterworth 1930; Linkwitz 1976).
    assertInDelta(b.metrics.pathLevelsDb, [-6.021, -3.01], 0.002, 'pathLevelsDb');
  });

  it('metrics carry the one flatness measure (largest deviation from the sum at 4·fc over fc/2 … 2·fc), checked from the formulas on the API page', async () => {
    const { body: b } = await post(specExample);
    const m = b.metrics;
    expect(m.referenceHz).toBe(320);
    expect(m.bandHz).toEqual([40, 160]);
    // LR4 high-pass + BW2 low-pass inverted, the sub 2.5 ms + 3.4 m / c late (Butterworth 1930; Linkwitz 1976;
    // Kinsler et al. 2000), evaluated here at 48 points per octave from the definition.
    const lateMs = 2.5 + (1000 * 3.4) / speedMps(20);
    const sum = (fHz: number) => add(lr4(fHz / 80, 'highpass'), scale(mul(bw2(fHz / 80, 'lowpass'), late(fHz, lateMs)), -1));
    const ref = levelDb(sum(320));
    assertInDelta(m.referenceLevelDb, ref, 0.002, 'reference level');
    let worst = 0;
    let worstHz = 0;
    for (let k = -48; k <= 48; k++) {
      const f = 80 * 2 ** (k / 48);
      const d = levelDb(sum(f)) - ref;
      if (Math.abs(d) > Math.abs(worst)) [worst, worstHz] = [d, f];
    }
    assertInDelta(m.maxDeviationDb, worst, 0.006, 'signed deviation (0.01 dB)');
    assertInDelta(m.maxDeviationHz, worstHz, 0.051, 'where');
    expect(m.flatnessDb).toBe(Math.abs(m.maxDeviationDb));
    // Rounded to 0.01 dB now (the one measure's rounding everywhere).
    expect(Math.round(m.maxDeviationDb * 100) / 100).toBe(m.maxDeviationDb);
    // A dip here, so the deepest dip is the deviation itself.
    expect(m.deepestDipDb).toBe(m.maxDeviationDb);
    // The inverted BW2 sub keeps the sum up down to DC: no −3 dB point above 5 Hz.
    expect(m.minus3DbHz).toBeNull();
  });

  it('LR4 high-pass + low-pass, same polarity, sums flat (an all-pass) at every frequency (published: Linkwitz 1976)', async () => {
    const { status, body: b } = await post(body([path('highpass', 'linkwitz-riley', 4), path('lowpass', 'linkwitz-riley', 4)], { grid: { startHz: 10, stopHz: 20000, pointsPerOctave: 48 } }));
    expect(status).toBe(200);
    // The answer is rounded to 0.001 dB (so this reads exactly 0); the dsp's own tests hold it to 1e-9 dB.
    for (const v of b.sum.magnitudeDb) expect(Math.abs(v)).toBe(0);
    expect(Math.abs(b.metrics.maxDeviationDb)).toBeLessThanOrEqual(1e-3);
    expect(b.metrics.flatnessDb).toBe(0);
    expect(b.metrics.minus3DbHz).toBeNull(); // flat down to DC
    expect(b.metrics.phaseDifferenceDeg).toBeCloseTo(0, 1);
  });

  it('LR4 sum group delay follows the all-pass 2√2/(2π·fc)·(1+x²)/(1+x⁴): 5.627 ms limit at fc = 80 Hz (published: Linkwitz 1976)', async () => {
    const { body: b } = await post(body([path('highpass', 'linkwitz-riley', 4), path('lowpass', 'linkwitz-riley', 4)]));
    const f0 = b.frequencyHz[0] as number;
    const x = f0 / 80;
    const limitMs = (1000 * 2 * Math.SQRT2) / (2 * Math.PI * 80);
    assertInDelta(limitMs, 5.627, 0.001, 'low-frequency limit');
    assertInDelta(b.sum.groupDelayMs[0], (limitMs * (1 + x * x)) / (1 + x ** 4), 0.0015, 'group delay at 10 Hz (answer rounded to 1 µs)');
  });

  it('BW2 with one path inverted reads +3.01 dB at the corner; same polarity a deep null (published: Linkwitz 1976)', async () => {
    const inverted = await post(body([path('highpass', 'butterworth', 2), path('lowpass', 'butterworth', 2, { invert: true })], { crossoverHz: 80 }));
    expect(inverted.status).toBe(200);
    assertInDelta(inverted.body.metrics.sumLevelDb, 3.01, 0.005, 'BW2 inverted at fc');
    expect(inverted.body.metrics.crossoverSource).toBe('request');
    // The flatness measure: |H|² = (1 + x²)²/(1 + x⁴) peaks at fc (2, +3.010 dB) against 289/257 at 4·fc (+0.510 dB):
    // 2.50 dB at 80 Hz (hand algebra on Butterworth 1930); its least, at fc/2 and 2·fc, (1.25)²/1.0625 → +1.165 dB.
    const m = inverted.body.metrics;
    assertInDelta(m.flatnessDb, 10 * Math.log10(2) - 10 * Math.log10(289 / 257), 0.006, 'BW2 inverted flatness');
    expect(m.maxDeviationDb).toBe(m.flatnessDb); // a bump: positive
    expect(m.maxDeviationHz).toBe(80);
    assertInDelta(m.deepestDipDb, 10 * Math.log10(1.5625 / 1.0625) - 10 * Math.log10(289 / 257), 0.006, 'least level in the band, above the reference');
    const same = await post(body([path('highpass', 'butterworth', 2), path('lowpass', 'butterworth', 2)], { grid: { startHz: 20, stopHz: 320, pointsPerOctave: 48 } }));
    expect(same.body.metrics.sumLevelDb).toBeLessThan(-60);
    assertInDelta(same.body.metrics.deepestDipHz, 80, 0.01, 'null at the corner');
  });

  it('BW3 sums flat with either polarity; LR2 flat only inverted (published: Linkwitz 1976)', async () => {
    for (const invert of [false, true]) {
      const { body: b } = await post(body([path('highpass', 'butterworth', 3), path('lowpass', 'butterworth', 3, { invert })]));
      for (const v of b.sum.magnitudeDb) expect(Math.abs(v)).toBeLessThanOrEqual(1e-3);
    }
    const lr2 = await post(body([path('highpass', 'linkwitz-riley', 2), path('lowpass', 'linkwitz-riley', 2, { invert: true })]));
    for (const v of lr2.body.sum.magnitudeDb) expect(Math.abs(v)).toBeLessThanOrEqual(1e-3);
    const lr2Same = await post(body([path('highpass', 'linkwitz-riley', 2), path('lowpass', 'linkwitz-riley', 2)], { crossoverHz: 80 }));
    expect(lr2Same.body.metrics.sumLevelDb).toBeLessThan(-60);
  });

  it('distanceM adds the air path: 1 m at 20 °C is 2.914 ms, 83.9° at 80 Hz, with no change of level (published: Kinsler et al. 2000)', async () => {
    const wire = { name: 'wire', filter: { family: 'butterworth', order: 2, response: 'none', cornerHz: 80 }, gainDb: 0, delayMs: 0, invert: false, distanceM: 1 };
    const { body: b } = await post({ temperatureC: 20, grid: { startHz: 80, stopHz: 160, pointsPerOctave: 12 }, paths: [wire] });
    assertInDelta(b.paths[0].phaseDeg[0], -83.9, 0.05, 'phase at 80 Hz');
    assertInDelta(b.sum.groupDelayMs[0], 2.914, 0.0015, 'group delay');
    expect(b.paths[0].magnitudeDb[0]).toBe(0);
    expect(b.metrics).toBeNull(); // no filter, no crossoverHz: nothing to read the metrics at
  });

  it('takes the crossover from the filter corners (geometric mean) when crossoverHz is absent', async () => {
    const paths = [{ ...path('highpass', 'linkwitz-riley', 4), filter: { family: 'linkwitz-riley', order: 4, response: 'highpass', cornerHz: 90 } }, { ...path('lowpass', 'linkwitz-riley', 4), filter: { family: 'linkwitz-riley', order: 4, response: 'lowpass', cornerHz: 40 } }];
    const { body: b } = await post(body(paths));
    assertInDelta(b.metrics.crossoverHz, 60, 1e-3, 'sqrt(90·40)');
  });

  it('accepts natural roll-offs and several subs, and reports the system −3 dB point', async () => {
    const subRolloff = { kind: 'lowpass', cornerHz: 200, q: 0.7 };
    const { status, body: b } = await post(
      body(
        [
          path('highpass', 'butterworth', 2, { rolloff: { kind: 'sealed', cornerHz: 62, q: 0.71 }, distanceM: 3.5 }),
          path('lowpass', 'linkwitz-riley', 4, { name: 'sub 1', rolloff: subRolloff, gainDb: -6, distanceM: 3.6 }),
          path('lowpass', 'linkwitz-riley', 4, { name: 'sub 2', rolloff: subRolloff, gainDb: -6, distanceM: 4.9 }),
        ],
        { crossoverHz: 80 },
      ),
    );
    expect(status).toBe(200);
    expect(b.paths.map((p: Json) => p.name)).toEqual(['mains', 'sub 1', 'sub 2']);
    expect(b.metrics.pathLevelsDb).toHaveLength(3);
    // Unfiltered subs carry the bottom: the sum is still up at 5 Hz (the assessment's floor), so there is no −3 dB point.
    expect(b.metrics.minus3DbHz).toBeNull();
    // Mains alone (sealed box at 62 Hz, Q 0.71, under a BW2 high-pass at 80 Hz): the −3 dB point lies above 80 Hz,
    // where x⁴/((1−x²)² + x²/q²) of the two (Small 1972; Butterworth 1930) is 3 dB under the level at 4·fc; solved here
    // by bisection.
    const mainsOnly = await post(body([path('highpass', 'butterworth', 2, { rolloff: { kind: 'sealed', cornerHz: 62, q: 0.71 } })], { crossoverHz: 80 }));
    const hp2 = (x: number, q: number) => x ** 4 / ((1 - x * x) ** 2 + (x * x) / (q * q));
    const relDb = (f: number) => 10 * Math.log10((hp2(f / 80, Math.SQRT1_2) * hp2(f / 62, 0.71)) / (hp2(4, Math.SQRT1_2) * hp2(320 / 62, 0.71)));
    let [lo, hi] = [40, 320];
    for (let i = 0; i < 60; i++) [lo, hi] = relDb((lo + hi) / 2) < -3 ? [(lo + hi) / 2, hi] : [lo, (lo + hi) / 2];
    expect(lo).toBeGreaterThan(80);
    assertInDelta(mainsOnly.body.metrics.minus3DbHz, lo, 0.1, 'mains-only −3 dB point');
    // And its flatness: the deepest point of the band is fc/2, where both high-passes have fallen furthest.
    assertInDelta(mainsOnly.body.metrics.flatnessDb, -relDb(40), 0.006, 'mains-only flatness');
    expect(mainsOnly.body.metrics.deepestDipHz).toBe(40);
    expect(mainsOnly.body.metrics.phaseDifferenceDeg).toBeNull();
  });

  it('the system −3 dB point is read down to 5 Hz: a sealed sub at 20 Hz sets it; one at 4 Hz is below the floor → null', async () => {
    const pair = (cornerHz: number) => body([path('highpass', 'linkwitz-riley', 4), path('lowpass', 'linkwitz-riley', 4, { rolloff: { kind: 'sealed', cornerHz, q: Math.SQRT1_2 } })], { crossoverHz: 80 });
    // The sum from the formulas: LR4 pair (Linkwitz 1976) with the sub's sealed box s²/(s² + s/q + 1) (Small 1972),
    // relative to 4·fc; where it crosses −3 dB, by bisection.
    const sealed = (fHz: number, cornerHz: number): C => {
      const y = fHz / cornerHz;
      return div([-y * y, 0], [1 - y * y, y / Math.SQRT1_2]);
    };
    const rel = (fHz: number, cornerHz: number) => {
      const sum = (f: number) => add(lr4(f / 80, 'highpass'), mul(lr4(f / 80, 'lowpass'), sealed(f, cornerHz)));
      return levelDb(sum(fHz)) - levelDb(sum(320));
    };
    let [lo, hi] = [5, 80];
    for (let i = 0; i < 60; i++) [lo, hi] = rel((lo + hi) / 2, 20) < -3 ? [(lo + hi) / 2, hi] : [lo, (lo + hi) / 2];
    assertInDelta(lo, 20, 0.2, 'oracle: a Butterworth (q = 1/√2) box is −3 dB near its corner (the mains path moves it 0.1 Hz)');
    const at20 = await post(pair(20));
    assertInDelta(at20.body.metrics.minus3DbHz, lo, 0.1, '−3 dB point with a 20 Hz sub');
    // At 4 Hz the sub's box is still above −3 dB at 5 Hz (|S|² = y⁴/(1 + y⁴) at y = 1.25: −1.6 dB): no point to report.
    expect(rel(5, 4)).toBeGreaterThan(-3);
    const at4 = await post(pair(4));
    expect(at4.body.metrics.minus3DbHz).toBeNull();
  });

  describe('bad fields are answered 400 with their path', () => {
    const cases: [string, string, Json][] = [
      ['Butterworth order 9', 'paths.1.filter.order', body([path('highpass', 'linkwitz-riley', 4), path('lowpass', 'butterworth', 9)])],
      ['Butterworth order 0', 'paths.0.filter.order', body([path('highpass', 'butterworth', 0)])],
      ['fractional order', 'paths.1.filter.order', body([path('highpass', 'linkwitz-riley', 4), path('lowpass', 'butterworth', 2.5)])],
      ['Linkwitz–Riley order 3', 'paths.1.filter.order', body([path('highpass', 'linkwitz-riley', 4), path('lowpass', 'linkwitz-riley', 3)])],
      ['unknown family', 'paths.0.filter.family', body([{ ...path('highpass', 'butterworth', 2), filter: { family: 'chebyshev', order: 2, response: 'highpass', cornerHz: 80 } }])],
      ['unknown response', 'paths.0.filter.response', body([{ ...path('highpass', 'butterworth', 2), filter: { family: 'butterworth', order: 2, response: 'bandpass', cornerHz: 80 } }])],
      ['corner below 10 Hz', 'paths.0.filter.cornerHz', body([{ ...path('highpass', 'butterworth', 2), filter: { family: 'butterworth', order: 2, response: 'highpass', cornerHz: 5 } }])],
      ['corner above 24 kHz', 'paths.0.filter.cornerHz', body([{ ...path('highpass', 'butterworth', 2), filter: { family: 'butterworth', order: 2, response: 'highpass', cornerHz: 30000 } }])],
      ['gain as text', 'paths.0.gainDb', body([path('highpass', 'butterworth', 2, { gainDb: '3' })])],
      ['gain missing', 'paths.0.gainDb', body([{ name: 'm', filter: { family: 'butterworth', order: 2, response: 'highpass', cornerHz: 80 }, delayMs: 0, invert: false }])],
      ['negative delay', 'paths.1.delayMs', body([path('highpass', 'butterworth', 2), path('lowpass', 'butterworth', 2, { delayMs: -1 })])],
      ['negative distance', 'paths.0.distanceM', body([path('highpass', 'butterworth', 2, { distanceM: -0.5 })])],
      ['invert not boolean', 'paths.0.invert', body([path('highpass', 'butterworth', 2, { invert: 'yes' })])],
      ['unknown roll-off kind', 'paths.0.rolloff.kind', body([path('highpass', 'butterworth', 2, { rolloff: { kind: 'horn', cornerHz: 50 } })])],
      ['roll-off Q out of range', 'paths.0.rolloff.q', body([path('highpass', 'butterworth', 2, { rolloff: { kind: 'sealed', cornerHz: 50, q: 40 } })])],
      ['empty name', 'paths.0.name', body([path('highpass', 'butterworth', 2, { name: '' })])],
      ['misspelt field', 'paths.0', body([path('highpass', 'butterworth', 2, { delay: 3 })])],
      ['temperature out of range', 'temperatureC', { ...body([path('highpass', 'butterworth', 2)]), temperatureC: 80 }],
      ['grid below 10 Hz', 'grid.startHz', { ...body([path('highpass', 'butterworth', 2)]), grid: { startHz: 5, stopHz: 1000, pointsPerOctave: 48 } }],
      ['grid above 24 kHz', 'grid.stopHz', { ...body([path('highpass', 'butterworth', 2)]), grid: { startHz: 10, stopHz: 30000, pointsPerOctave: 48 } }],
      ['grid upside down', 'grid.stopHz', { ...body([path('highpass', 'butterworth', 2)]), grid: { startHz: 500, stopHz: 100, pointsPerOctave: 48 } }],
      ['more than 4000 grid points', 'grid.pointsPerOctave', { ...body([path('highpass', 'butterworth', 2)]), grid: { startHz: 10, stopHz: 20000, pointsPerOctave: 384 } }],
      ['no paths', 'paths', body([])],
      ['17 paths', 'paths', body(Array.from({ length: 17 }, () => path('lowpass', 'butterworth', 2)))],
      ['crossover outside the grid', 'crossoverHz', { ...body([path('highpass', 'butterworth', 2)]), crossoverHz: 2000 }],
      ['body is an array', '(body)', [] as unknown as Json],
    ];
    it.each(cases)('%s → %s', async (_, where, request) => {
      const { status, body: b } = await post(request);
      expect(status).toBe(400);
      expect(b.error.code).toBe('invalid');
      expect(issuePaths(b)).toContain(where);
      expect(b.error.message).toContain(where);
    });

    it('a number too large for a double (JSON 1e400 → Infinity) is refused as not finite', async () => {
      const text = JSON.stringify(specExample).replace('"gainDb":0', '"gainDb":1e400');
      const { status, body: b } = await post(text);
      expect(status).toBe(400);
      expect(issuePaths(b)).toContain('paths.0.gainDb');
    });

    it('broken JSON is 400 naming the body', async () => {
      const { status, body: b } = await post('{"temperatureC": 20,');
      expect(status).toBe(400);
      expect(issuePaths(b)).toEqual(['(body)']);
    });
  });

  it('refuses bodies over 256 kB with 413', async () => {
    const big = JSON.stringify({ ...specExample, padding: 'x'.repeat(300 * 1024) });
    const { status, body: b } = await post(big);
    expect(status).toBe(413);
    expect(b.error.code).toBe('too_large');
  });

  it('refuses non-JSON bodies with 415', async () => {
    const { status, body: b } = await post('temperatureC=20', { 'content-type': 'application/x-www-form-urlencoded' });
    expect(status).toBe(415);
    expect(b.error.code).toBe('unsupported_media_type');
  });
});
