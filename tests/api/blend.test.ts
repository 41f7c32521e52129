import { describe, expect, it } from 'vitest';
import { POST } from '@/app/api/v1/blend/route';
import { assertInDelta } from '../helpers/assert-in-delta';

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- answers are read loosely; the assertions check the shapes
type Json = Record<string, any>;

async function post(body: unknown, headers: Record<string, string> = { 'content-type': 'application/json' }): Promise<{ status: number; body: Json }> {
  const res = await POST(new Request('http://x/api/v1/blend', { method: 'POST', headers, body: typeof body === 'string' ? body : JSON.stringify(body) }), undefined as never);
  return { status: res.status, body: (await res.json()) as Json };
}

const path = (response: 'highpass' | 'lowpass' | 'none', family: 'butterworth' | 'linkwitz-riley', order: number, extra: Json = {}) => ({
  name: response === 'highpass' ? 'mains' : 'sub',
  filter: { family, order, response, cornerHz: 80 },
  gainDb: 0,
  delayMs: 0,
  invert: false,
  ...extra,
});

const body = (paths: Json[], extra: Json = {}) => ({ temperatureC: 20, grid: { startHz: 10, stopHz: 1000, pointsPerOctave: 48 }, paths, ...extra });

/** SPEC §6's own example request. */
const specExample = body([
  path('highpass', 'linkwitz-riley', 4),
  { name: 'sub', filter: { family: 'butterworth', order: 2, response: 'lowpass', cornerHz: 80 }, gainDb: 0, delayMs: 2.5, invert: true, distanceM: 3.4 },
]);

function issuePaths(b: Json): string[] {
  return (b.error?.issues ?? []).map((i: { path: string }) => i.path);
}

describe('POST /api/v1/blend', () => {
  it('answers SPEC §6 example with the contract fields', async () => {
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
    for (const key of ['pathLevelsDb', 'sumLevelDb', 'phaseDifferenceDeg', 'maxDeviationDb', 'maxDeviationHz', 'deepestDipDb', 'deepestDipHz', 'minus3DbHz', 'referenceLevelDb', 'peakToPeakDb']) {
      expect(b.metrics).toHaveProperty(key);
    }
    // Butterworth −3.01 dB, Linkwitz–Riley −6.02 dB at the corner (Butterworth 1930; Linkwitz 1976).
    assertInDelta(b.metrics.pathLevelsDb, [-6.021, -3.01], 0.002, 'pathLevelsDb');
  });

  it('LR4 high-pass + low-pass, same polarity, sums flat (an all-pass) at every frequency (Linkwitz 1976; REFERENCES.md)', async () => {
    const { status, body: b } = await post(body([path('highpass', 'linkwitz-riley', 4), path('lowpass', 'linkwitz-riley', 4)], { grid: { startHz: 10, stopHz: 20000, pointsPerOctave: 48 } }));
    expect(status).toBe(200);
    // The answer is rounded to 0.001 dB (so this reads exactly 0); the dsp's own tests hold it to 1e-9 dB.
    for (const v of b.sum.magnitudeDb) expect(Math.abs(v)).toBe(0);
    expect(Math.abs(b.metrics.maxDeviationDb)).toBeLessThanOrEqual(1e-3);
    expect(b.metrics.phaseDifferenceDeg).toBeCloseTo(0, 1);
  });

  it('LR4 sum group delay follows the all-pass 2√2/(2π·fc)·(1+x²)/(1+x⁴): 5.627 ms limit at fc = 80 Hz (Linkwitz 1976; REFERENCES.md)', async () => {
    const { body: b } = await post(body([path('highpass', 'linkwitz-riley', 4), path('lowpass', 'linkwitz-riley', 4)]));
    const f0 = b.frequencyHz[0] as number;
    const x = f0 / 80;
    const limitMs = (1000 * 2 * Math.SQRT2) / (2 * Math.PI * 80);
    assertInDelta(limitMs, 5.627, 0.001, 'low-frequency limit');
    assertInDelta(b.sum.groupDelayMs[0], (limitMs * (1 + x * x)) / (1 + x ** 4), 0.0015, 'group delay at 10 Hz (answer rounded to 1 µs)');
  });

  it('BW2 with one path inverted reads +3.01 dB at the corner; same polarity a deep null (REFERENCES.md, Linkwitz 1976)', async () => {
    const inverted = await post(body([path('highpass', 'butterworth', 2), path('lowpass', 'butterworth', 2, { invert: true })], { crossoverHz: 80 }));
    expect(inverted.status).toBe(200);
    assertInDelta(inverted.body.metrics.sumLevelDb, 3.01, 0.005, 'BW2 inverted at fc');
    expect(inverted.body.metrics.crossoverSource).toBe('request');
    const same = await post(body([path('highpass', 'butterworth', 2), path('lowpass', 'butterworth', 2)], { grid: { startHz: 20, stopHz: 320, pointsPerOctave: 48 } }));
    expect(same.body.metrics.sumLevelDb).toBeLessThan(-60);
    assertInDelta(same.body.metrics.deepestDipHz, 80, 0.01, 'null at the corner');
  });

  it('BW3 sums flat with either polarity; LR2 flat only inverted (REFERENCES.md)', async () => {
    for (const invert of [false, true]) {
      const { body: b } = await post(body([path('highpass', 'butterworth', 3), path('lowpass', 'butterworth', 3, { invert })]));
      for (const v of b.sum.magnitudeDb) expect(Math.abs(v)).toBeLessThanOrEqual(1e-3);
    }
    const lr2 = await post(body([path('highpass', 'linkwitz-riley', 2), path('lowpass', 'linkwitz-riley', 2, { invert: true })]));
    for (const v of lr2.body.sum.magnitudeDb) expect(Math.abs(v)).toBeLessThanOrEqual(1e-3);
    const lr2Same = await post(body([path('highpass', 'linkwitz-riley', 2), path('lowpass', 'linkwitz-riley', 2)], { crossoverHz: 80 }));
    expect(lr2Same.body.metrics.sumLevelDb).toBeLessThan(-60);
  });

  it('distanceM adds the air path: 1 m at 20 °C is 2.914 ms, 83.9° at 80 Hz, with no change of level (Kinsler et al. 2000; REFERENCES.md)', async () => {
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
    // Unfiltered subs carry the bottom: the sum is still up at 10 Hz, so there is no −3 dB point on the grid.
    expect(b.metrics.minus3DbHz).toBeNull();
    // Mains alone (sealed box at 62 Hz under a BW2 high-pass at 80 Hz): the −3 dB point lies above 80 Hz.
    const mainsOnly = await post(body([path('highpass', 'butterworth', 2, { rolloff: { kind: 'sealed', cornerHz: 62, q: 0.71 } })], { crossoverHz: 80 }));
    expect(mainsOnly.body.metrics.minus3DbHz).toBeGreaterThan(80);
    expect(mainsOnly.body.metrics.phaseDifferenceDeg).toBeNull();
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
