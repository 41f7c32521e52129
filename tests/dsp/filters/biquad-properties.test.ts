import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { allpassBiquad, biquadsResponse, crossoverBiquads, eqBiquad, isStableBiquad, processorFilterBiquads, processorFilters, type ProcessorFilter } from '@/dsp';
import { analogSectionToBiquad } from '@/dsp/filters/bilinear-transform';
import { arbFilterAtRate, arbLogHz, arbProcessorFilter, arbSampleRateHz, largestPoleModulus } from './filter-arbitraries';

// Properties of every digital filter Seamline designs, for any valid input.

/** The filter's corner or centre, Hz. */
const frequencyOf = (f: ProcessorFilter) => (f.kind === 'peaking' ? f.centerHz : f.cornerHz);

/** The same filter with its corner or centre moved to `hz`. */
const withFrequency = (f: ProcessorFilter, hz: number): ProcessorFilter => (f.kind === 'peaking' ? { ...f, centerHz: hz } : { ...f, cornerHz: hz });

describe('stability: every section has both poles inside the unit circle', () => {
  it('crossoverBiquads, eqBiquad and allpassBiquad, any family/order/kind, corner 5 Hz – 0.49·fs, rate 8–384 kHz, EQ within EQ_LIMITS', () => {
    const arb = arbSampleRateHz.chain((fs) => fc.record({ fs: fc.constant(fs), filter: arbProcessorFilter(5, 0.49 * fs) }));
    fc.assert(
      fc.property(arb, ({ fs, filter }) => {
        const sections = filter.kind === 'crossover' ? crossoverBiquads(filter, fs) : filter.kind === 'allpass' ? [allpassBiquad(filter, fs)] : [eqBiquad(filter, fs)];
        expect(sections.length).toBeGreaterThan(0);
        for (const s of sections) {
          // The stability triangle (Oppenheim & Schafer) and, independently, the roots of z² + a1·z + a2.
          expect(isStableBiquad(s), JSON.stringify(s)).toBe(true);
          expect(largestPoleModulus(s.a1, s.a2), JSON.stringify(s)).toBeLessThan(1);
        }
      }),
      { numRuns: 1000 },
    );
  });
});

describe('the digital response approaches the analog prototype as the sample rate grows', () => {
  // The bilinear transform maps analog f′ = f0·tan(πf/fs)/tan(πf0/fs) to digital f (Oppenheim & Schafer): the
  // frequency error, and with it |ln(H_digital/H_analog)|, shrinks about as 1/fs², a quarter at each doubling.
  const deviationAt = (filter: ProcessorFilter, fs: number, fHz: number): number => {
    const r = processorFilters({ sampleRateHz: fs, filters: [filter], frequencyHz: [fHz] });
    const nepers = (r.difference.magnitudeDb[0] as number) * (Math.LN10 / 20);
    const radians = ((r.difference.phaseDeg[0] as number) * Math.PI) / 180;
    return Math.hypot(nepers, radians);
  };
  it('at a fixed audio frequency, 48 k → 96 k → 192 k: at least halved at each step (any filter with a corner 50 Hz – 5 kHz)', () => {
    const arb = fc.record({ filter: arbProcessorFilter(50, 5000), fHz: arbLogHz(50, 5000) });
    fc.assert(
      fc.property(arb, ({ filter, fHz }) => {
        fc.pre(Math.abs(Math.log(fHz / frequencyOf(filter))) > 0.1); // at the corner itself the two agree exactly
        fc.pre(filter.kind === 'crossover' || filter.kind === 'allpass' || Math.abs(filter.gainDb) >= 0.5); // 0 dB EQ is a wire
        const [d48, d96, d192] = [48000, 96000, 192000].map((fs) => deviationAt(filter, fs, fHz)) as [number, number, number];
        expect(d96, `${JSON.stringify(filter)} at ${fHz} Hz: ${d48} → ${d96}`).toBeLessThan(d48 / 2);
        expect(d192, `${JSON.stringify(filter)} at ${fHz} Hz: ${d96} → ${d192}`).toBeLessThan(d96 / 2);
      }),
      { numRuns: 500 },
    );
  });
});

describe('refusals', () => {
  const arbAtOrAboveNyquist = arbFilterAtRate.chain(({ sampleRateHz, filter }) =>
    fc.record({
      sampleRateHz: fc.constant(sampleRateHz),
      filter: fc.oneof(fc.constant(sampleRateHz / 2), arbLogHz(sampleRateHz / 2, 4 * sampleRateHz)).map((hz) => withFrequency(filter, hz)),
    }),
  );
  const field = (f: ProcessorFilter) => (f.kind === 'peaking' ? 'centerHz' : 'cornerHz');

  it('a corner at or above Nyquist is a RangeError naming the field and "Nyquist", from every designer', () => {
    fc.assert(
      fc.property(arbAtOrAboveNyquist, ({ sampleRateHz, filter }) => {
        const design = () => (filter.kind === 'crossover' ? crossoverBiquads(filter, sampleRateHz) : filter.kind === 'allpass' ? allpassBiquad(filter, sampleRateHz) : eqBiquad(filter, sampleRateHz));
        expect(design).toThrow(RangeError);
        expect(design).toThrow(new RegExp(`^filter\\.${field(filter)} must be below the Nyquist`));
        const all = () => processorFilters({ sampleRateHz, filters: [{ kind: 'allpass', order: 1, cornerHz: 100 }, filter], frequencyHz: [100] });
        expect(all).toThrow(RangeError);
        expect(all).toThrow(new RegExp(`^filters\\[1\\]\\.${field(filter)} must be below the Nyquist`));
      }),
      { numRuns: 300 },
    );
    expect(() => analogSectionToBiquad({ kind: 'lowpass2', cornerHz: 24000, q: 0.7 }, 48000)).toThrow(/^cornerHz must be below the Nyquist/);
  });

  it('processorFilters refuses a grid point at or above Nyquist, naming it', () => {
    expect(() => processorFilters({ sampleRateHz: 48000, filters: [], frequencyHz: [100, 24000] })).toThrow(/^frequencyHz\[1\] must be below the Nyquist/);
  });

  it('a sample rate outside 8000–384000 Hz (or not a number) is a RangeError naming sampleRateHz, from every function', () => {
    const arbBadRate = fc.oneof(
      fc.double({ min: -1e6, max: 7999.999, noNaN: true }),
      fc.double({ min: 384000.001, max: 1e9, noNaN: true }),
      fc.constantFrom(Number.NaN, Number.POSITIVE_INFINITY, 7999, 384001),
    );
    const filters: ProcessorFilter[] = [
      { kind: 'crossover', family: 'linkwitz-riley', order: 4, response: 'lowpass', cornerHz: 80 },
      { kind: 'peaking', centerHz: 60, gainDb: -3, q: 2 },
      { kind: 'low-shelf', cornerHz: 100, gainDb: 3 },
      { kind: 'allpass', order: 2, cornerHz: 80 },
    ];
    fc.assert(
      fc.property(arbBadRate, (fs) => {
        for (const filter of filters) expect(() => processorFilterBiquads(filter, fs)).toThrow(/^sampleRateHz must be/);
        expect(() => biquadsResponse([], fs, [100])).toThrow(/^sampleRateHz must be/);
        expect(() => processorFilters({ sampleRateHz: fs, filters, frequencyHz: [100] })).toThrow(/^sampleRateHz must be/);
      }),
      { numRuns: 200 },
    );
    for (const fs of [8000, 384000]) expect(processorFilters({ sampleRateHz: fs, filters, frequencyHz: [100] }).sections.length).toBe(5);
  });
});
