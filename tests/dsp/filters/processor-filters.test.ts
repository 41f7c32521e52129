import { describe, expect, it } from 'vitest';
import Complex from 'complex.js';
import fc from 'fast-check';
import { DEVIATION_FLOOR_DB, MAX_PROCESSOR_FILTERS, processorFilterBiquads, processorFilters, type ProcessorFilter, type ProcessorFiltersResult } from '@/dsp';
import { deviationLimitHz } from '@/dsp/filters/processor-filters';
import { angleDiffDeg, assertInDelta } from '../../helpers/assert-in-delta';
import { arbProcessorFilter, arbSampleRateHz, cascadeAt } from './filter-arbitraries';

const logGrid = (loHz: number, hiHz: number, n: number) => Array.from({ length: n }, (_, i) => loHz * Math.pow(hiHz / loHz, i / (n - 1)));

/** Largest |x| over the points `keep` accepts (0 when none). */
const maxAbs = (xs: Float64Array, keep: (i: number) => boolean) => xs.reduce((m, x, i) => (keep(i) ? Math.max(m, Math.abs(x)) : m), 0);

describe('processorFilters: sections', () => {
  const filters: ProcessorFilter[] = [
    { kind: 'crossover', family: 'linkwitz-riley', order: 4, response: 'highpass', cornerHz: 80 },
    { kind: 'peaking', centerHz: 45, gainDb: -6, q: 4 },
    { kind: 'crossover', family: 'butterworth', order: 3, response: 'lowpass', cornerHz: 2000 },
    { kind: 'allpass', order: 1, cornerHz: 300 },
    { kind: 'high-shelf', cornerHz: 6000, gainDb: -2, slope: 0.7 },
  ];
  const grid = logGrid(10, 20000, 60);
  const r = processorFilters({ sampleRateHz: 48000, filters, frequencyHz: grid });

  it('each section carries the index of its filter, in the order of the filters, with that filter’s own biquads', () => {
    expect(r.sections.map((s) => s.filter)).toEqual([0, 0, 1, 2, 2, 3, 4]);
    filters.forEach((f, i) => {
      const own = r.sections.filter((s) => s.filter === i).map(({ b0, b1, b2, a1, a2 }) => ({ b0, b1, b2, a1, a2 }));
      expect(own).toEqual(processorFilterBiquads(f, 48000));
    });
  });

  it('the response is the cascade’s H(z) (complex.js), the analog one the prototypes’ H(s) from their definitions (complex.js)', () => {
    // LR4 = (Butterworth 2)² (Linkwitz 1976); peaking and all-pass from the Audio EQ Cookbook / definition; BW3 by its
    // poles; the high shelf's prototype is checked on its own in eq-sections.test.ts, so it is divided out here.
    const shelfAlone = processorFilters({ sampleRateHz: 48000, filters: [filters[4] as ProcessorFilter], frequencyHz: grid }).analog;
    grid.forEach((fHz, i) => {
      const d = cascadeAt(r.sections, fHz, 48000);
      assertInDelta([r.response.re[i] as number, r.response.im[i] as number], [d.re, d.im], 1e-9 * d.abs(), `digital at ${fHz}`);
      const s = (hz: number) => new Complex(0, fHz / hz);
      const one = new Complex(1, 0);
      const bw2High = s(80).mul(s(80)).div(s(80).mul(s(80)).add(s(80).mul(Math.SQRT2)).add(1));
      const a = Math.pow(10, -6 / 40);
      const peak = s(45).mul(s(45)).add(s(45).mul(a / 4)).add(1).div(s(45).mul(s(45)).add(s(45).div(a * 4)).add(1));
      const x = s(2000);
      const bw3Low = one.div(x.add(1).mul(x.mul(x).add(x).add(1)));
      const allpass = one.sub(s(300)).div(one.add(s(300)));
      const shelf = new Complex(shelfAlone.re[i] as number, shelfAlone.im[i] as number);
      const h = bw2High.mul(bw2High).mul(peak).mul(bw3Low).mul(allpass).mul(shelf);
      assertInDelta([r.analog.re[i] as number, r.analog.im[i] as number], [h.re, h.im], 1e-11 * h.abs(), `analog at ${fHz}`);
    });
  });
});

describe('processorFilters: the difference and the deviation', () => {
  it('the difference is digital minus analog: level dB, and the phase of H_digital/H_analog (complex.js) wrapped to (−180, 180]', () => {
    const arb = arbSampleRateHz.chain((fs) =>
      fc.record({ fs: fc.constant(fs), filters: fc.array(arbProcessorFilter(10, 0.49 * fs), { minLength: 1, maxLength: 4 }) }),
    );
    fc.assert(
      fc.property(arb, ({ fs, filters }) => {
        const grid = logGrid(10, 0.49 * fs, 24);
        const r = processorFilters({ sampleRateHz: fs, filters, frequencyHz: grid });
        grid.forEach((fHz, i) => {
          const ratio = new Complex(r.response.re[i] as number, r.response.im[i] as number).div(new Complex(r.analog.re[i] as number, r.analog.im[i] as number));
          assertInDelta(r.difference.magnitudeDb[i] as number, (r.response.magnitudeDb[i] as number) - (r.analog.magnitudeDb[i] as number), 1e-9, `dB at ${fHz}`);
          assertInDelta(r.difference.magnitudeDb[i] as number, 20 * Math.log10(ratio.abs()), 1e-8, `dB (ratio) at ${fHz}`);
          const p = r.difference.phaseDeg[i] as number;
          expect(p > -180 && p <= 180, `wrapped ${p}`).toBe(true);
          assertInDelta(angleDiffDeg(p, (ratio.arg() * 180) / Math.PI), 0, 1e-7, `deg at ${fHz}`);
          assertInDelta(angleDiffDeg(p, (r.response.phaseDeg[i] as number) - (r.analog.phaseDeg[i] as number)), 0, 1e-7, `deg (difference) at ${fHz}`);
        });
      }),
      { numRuns: 100 },
    );
  });

  /** maxDb and maxDeg as the contract says: over points up to upToHz where the analog level is at least floorDb. */
  const expectedDeviation = (r: ProcessorFiltersResult, grid: readonly number[]) => {
    const keep = (i: number) => (grid[i] as number) <= r.deviation.upToHz && (r.analog.magnitudeDb[i] as number) >= r.deviation.floorDb;
    return { maxDb: maxAbs(r.difference.magnitudeDb, keep), maxDeg: maxAbs(r.difference.phaseDeg, keep) };
  };

  it('upToHz = min(20 kHz, 0.45·fs) and the floor is −40 dB', () => {
    expect(deviationLimitHz(44100)).toBeCloseTo(19845, 9);
    expect(deviationLimitHz(48000)).toBe(20000);
    expect(deviationLimitHz(8000)).toBe(3600);
    const r = processorFilters({ sampleRateHz: 32000, filters: [], frequencyHz: [100] });
    expect(r.deviation).toEqual({ maxDb: 0, maxDeg: 0, upToHz: 14400, floorDb: -40 });
    expect(DEVIATION_FLOOR_DB).toBe(-40);
  });

  it('points above upToHz are left out: a broad +12 dB peak at 10 kHz at 44.1 kHz differs most just below Nyquist, and that is not counted', () => {
    // The digital peak falls to 0 dB at Nyquist (cookbook) while the analog one is still ~9 dB up at 22 kHz.
    const grid = [...logGrid(1000, 19800, 40), 20500, 21500, 22000, 22040];
    const r = processorFilters({ sampleRateHz: 44100, filters: [{ kind: 'peaking', centerHz: 10000, gainDb: 12, q: 0.3 }], frequencyHz: grid });
    const expected = expectedDeviation(r, grid);
    expect(r.deviation.maxDb).toBe(expected.maxDb);
    expect(r.deviation.maxDeg).toBe(expected.maxDeg);
    const beyondDb = maxAbs(r.difference.magnitudeDb, (i) => (grid[i] as number) > r.deviation.upToHz);
    const beyondDeg = maxAbs(r.difference.phaseDeg, (i) => (grid[i] as number) > r.deviation.upToHz);
    // Here 7.2 dB / 12° up to upToHz against 9.1 dB / 31° beyond: counting those points would change the answer.
    expect(beyondDb).toBeGreaterThan(r.deviation.maxDb + 1);
    expect(beyondDeg).toBeGreaterThan(r.deviation.maxDeg + 10);
  });

  it('points where the analog level is below floorDb are left out: an LR8 low-pass at 2 kHz (48 kHz) differs by ~70 dB in its stop band', () => {
    const grid = logGrid(20, 20000, 120);
    const r = processorFilters({
      sampleRateHz: 48000,
      filters: [{ kind: 'crossover', family: 'linkwitz-riley', order: 8, response: 'lowpass', cornerHz: 2000 }],
      frequencyHz: grid,
    });
    const expected = expectedDeviation(r, grid);
    expect(r.deviation.maxDb).toBe(expected.maxDb);
    expect(r.deviation.maxDeg).toBe(expected.maxDeg);
    expect(r.deviation.maxDb).toBeGreaterThan(0.1); // the pass band and the first 40 dB of the slope do differ a little …
    expect(r.deviation.maxDb).toBeLessThan(2);
    const stopBandDb = maxAbs(r.difference.magnitudeDb, (i) => (r.analog.magnitudeDb[i] as number) < DEVIATION_FLOOR_DB);
    expect(stopBandDb).toBeGreaterThan(50); // … the deep stop band (digital zeros at Nyquist) greatly, and is ignored
  });
});

describe('processorFilters: refusals', () => {
  it(`refuses more than ${MAX_PROCESSOR_FILTERS} filters, a filters value that is not a list, and an unknown kind (naming filters[i].kind)`, () => {
    const peak: ProcessorFilter = { kind: 'peaking', centerHz: 100, gainDb: 1, q: 1 };
    expect(processorFilters({ sampleRateHz: 48000, filters: new Array<ProcessorFilter>(MAX_PROCESSOR_FILTERS).fill(peak), frequencyHz: [100] }).sections).toHaveLength(MAX_PROCESSOR_FILTERS);
    expect(() => processorFilters({ sampleRateHz: 48000, filters: new Array<ProcessorFilter>(MAX_PROCESSOR_FILTERS + 1).fill(peak), frequencyHz: [100] })).toThrow(/at most/);
    expect(() => processorFilters({ sampleRateHz: 48000, filters: 'x' as never, frequencyHz: [100] })).toThrow(/^filters must be a list/);
    expect(() => processorFilters({ sampleRateHz: 48000, filters: [peak, { kind: 'notch' } as never], frequencyHz: [100] })).toThrow(/^filters\[1\]\.kind/);
    expect(() => processorFilters({ sampleRateHz: 48000, filters: [peak, null as never], frequencyHz: [100] })).toThrow(/^filters\[1\] must be an object/);
  });
});
