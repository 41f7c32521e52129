import { describe, expect, it } from 'vitest';
import { POST } from '@/app/api/v1/processor-filters/route';
import { crossoverBiquads, eqBiquad } from '@/dsp';
import { issuePaths, postTo, refusedNaming, type Json } from '../helpers/compute-route';

const post = postTo(POST, '/api/v1/processor-filters');
const LR4_LP = { kind: 'crossover', family: 'linkwitz-riley', order: 4, response: 'lowpass', cornerHz: 80 } as const;
const PEAK = { kind: 'peaking', centerHz: 80, gainDb: -4, q: 5 } as const;
const COEFFICIENTS = ['b0', 'b1', 'b2', 'a1', 'a2'] as const;

describe('POST /api/v1/processor-filters', () => {
  it('answers the contract: sections with their filter index at full double precision, the curves, the difference and the deviation', async () => {
    const { status, body } = await post({ sampleRateHz: 48000, filters: [LR4_LP, PEAK] });
    expect(status).toBe(200);
    expect(Object.keys(body).sort()).toEqual(['analog', 'convention', 'deviation', 'difference', 'response', 'sampleRateHz', 'sections']);
    expect(body.convention).toBe('H(z) = (b0 + b1·z⁻¹ + b2·z⁻²) / (1 + a1·z⁻¹ + a2·z⁻²)');
    expect(body.sections.map((s: Json) => s.filter)).toEqual([0, 0, 1]);
    // Full precision: the very doubles dsp computes, through JSON and back (never rounded).
    const expected = [...crossoverBiquads(LR4_LP, 48000), eqBiquad(PEAK, 48000)];
    body.sections.forEach((s: Json, i: number) => {
      for (const c of COEFFICIENTS) expect(Object.is(s[c], expected[i]![c]), `${c} of section ${i}`).toBe(true);
    });
    expect(body.sections.some((s: Json) => COEFFICIENTS.some((c) => String(s[c]).replace(/^-?0\.0*/, '').length >= 15))).toBe(true);
    // Default grid: 10 Hz to 20 kHz at 48 points per octave (527 points); 80 Hz is point 144 (10·2³).
    const n = Math.floor(Math.log2(20000 / 10) * 48 + 1e-9) + 1;
    for (const a of [body.response.frequencyHz, body.response.magnitudeDb, body.response.phaseDeg, body.analog.magnitudeDb, body.analog.phaseDeg, body.difference.magnitudeDb, body.difference.phaseDeg]) expect(a).toHaveLength(n);
    expect(body.response.frequencyHz[144]).toBe(80);
    // At 80 Hz: LR4 −6.0206 dB (Linkwitz 1976) plus the peaking filter's −4 dB at its centre (the Audio EQ Cookbook).
    expect(body.response.magnitudeDb[144]).toBeCloseTo(-20 * Math.log10(2) - 4, 2);
    expect(body.deviation).toMatchObject({ upToHz: 20000, floorDb: -40 });
    expect(body.deviation.maxDb).toBeGreaterThan(0);
    expect(body.deviation.maxDb).toBeLessThan(0.01);
  });

  it('the default grid stops at 0.45·fs below 44.4 kHz; a grid sent is used as it is', async () => {
    const low = await post({ sampleRateHz: 8000, filters: [LR4_LP] });
    expect(low.status).toBe(200);
    expect(low.body.response.frequencyHz).toHaveLength(Math.floor(Math.log2(3600 / 10) * 48 + 1e-9) + 1);
    expect(low.body.deviation.upToHz).toBe(3600);
    const grid = await post({ sampleRateHz: 96000, filters: [LR4_LP], grid: { startHz: 20, stopHz: 320, pointsPerOctave: 1 } });
    expect(grid.body.response.frequencyHz).toEqual([20, 40, 80, 160, 320]);
  });

  it('the digital filter approaches the analog one as the rate grows (bilinear transform, Oppenheim and Schafer)', async () => {
    const hp = { ...LR4_LP, response: 'highpass', cornerHz: 2000 };
    const at = async (fs: number) => (await post({ sampleRateHz: fs, filters: [hp], grid: { startHz: 10, stopHz: 18000, pointsPerOctave: 12 } })).body.deviation.maxDeg as number;
    const [d44, d96, d192] = [await at(44100), await at(96000), await at(192000)];
    expect(d96).toBeLessThan(d44);
    expect(d192).toBeLessThan(d96);
  });

  it.each([
    ['a corner at the Nyquist frequency', 'filters.0.cornerHz', { sampleRateHz: 48000, filters: [{ ...LR4_LP, cornerHz: 24000 }] }],
    ['a peaking centre above it', 'filters.1.centerHz', { sampleRateHz: 44100, filters: [LR4_LP, { ...PEAK, centerHz: 23000 }] }],
    ['a grid reaching it', 'grid.stopHz', { sampleRateHz: 8000, filters: [LR4_LP], grid: { startHz: 10, stopHz: 4000, pointsPerOctave: 12 } }],
    ['a rate of 1 kHz', 'sampleRateHz', { sampleRateHz: 1000, filters: [LR4_LP] }],
    ['a rate as text', 'sampleRateHz', { sampleRateHz: '48000', filters: [LR4_LP] }],
    ['a family of its own', 'filters.0.family', { sampleRateHz: 48000, filters: [{ ...LR4_LP, family: 'chebyshev' }] }],
    ['Linkwitz–Riley order 6', 'filters.0.order', { sampleRateHz: 48000, filters: [{ ...LR4_LP, order: 6 }] }],
    ['Butterworth order 2.5', 'filters.0.order', { sampleRateHz: 48000, filters: [{ ...LR4_LP, family: 'butterworth', order: 2.5 }] }],
    ['33 filters', 'filters', { sampleRateHz: 48000, filters: Array.from({ length: 33 }, () => PEAK) }],
    ['a missing list', 'filters', { sampleRateHz: 48000 }],
  ])('refuses %s with 400 naming %s', async (label, where, request) => {
    await refusedNaming(post)(label, where, request);
  });

  it('the Nyquist refusal says why in words, in the API’s one error shape', async () => {
    const { status, body } = await post({ sampleRateHz: 48000, filters: [{ ...LR4_LP, cornerHz: 30000 }] });
    expect(status).toBe(400);
    expect(body.error.code).toBe('invalid');
    expect(issuePaths(body)).toEqual(['filters.0.cornerHz']);
    expect(body.error.issues[0].message).toBe('must be below the Nyquist frequency, 24000 Hz at a sample rate of 48000 Hz');
  });
});
