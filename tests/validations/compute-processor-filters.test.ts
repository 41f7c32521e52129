import { describe, expect, it } from 'vitest';
import { processorFiltersRequestSchema } from '@/lib/validations/compute-processor-filters';

// The request body of POST /api/v1/processor-filters: what passes, and every refusal naming its field path.
const LR4 = { kind: 'crossover', family: 'linkwitz-riley', order: 4, response: 'highpass', cornerHz: 80 };
const paths = (body: unknown): string[] => {
  const r = processorFiltersRequestSchema.safeParse(body);
  return r.success ? [] : r.error.issues.map((i) => i.path.join('.'));
};
const body = (filters: unknown[], extra: Record<string, unknown> = {}) => ({ sampleRateHz: 48000, filters, ...extra });

describe('processorFiltersRequestSchema', () => {
  it('takes every kind: crossover, peaking, shelves by q or slope (or neither), all-passes; the grid is optional', () => {
    const ok = body([
      LR4,
      { kind: 'peaking', centerHz: 45, gainDb: -4, q: 5 },
      { kind: 'low-shelf', cornerHz: 150, gainDb: -3 },
      { kind: 'high-shelf', cornerHz: 3000, gainDb: 2, slope: 0.8 },
      { kind: 'high-shelf', cornerHz: 3000, gainDb: 2, q: 0.7 },
      { kind: 'allpass', order: 1, cornerHz: 100 },
      { kind: 'allpass', order: 2, cornerHz: 100, q: 1.2 },
    ]);
    expect(paths(ok)).toEqual([]);
    expect(processorFiltersRequestSchema.parse(ok).grid).toBeUndefined();
    expect(paths(body([LR4], { grid: { startHz: 20, stopHz: 20000, pointsPerOctave: 24 } }))).toEqual([]);
  });

  it.each([
    ['a rate below 8 kHz', body([LR4], { sampleRateHz: 4000 }), 'sampleRateHz'],
    ['a rate above 384 kHz', body([LR4], { sampleRateHz: 768000 }), 'sampleRateHz'],
    ['a crossover corner at the Nyquist frequency', body([{ ...LR4, cornerHz: 24000 }]), 'filters.0.cornerHz'],
    ['a peaking centre above the Nyquist frequency', body([LR4, { kind: 'peaking', centerHz: 30000, gainDb: -3, q: 1 }]), 'filters.1.centerHz'],
    ['a grid reaching the Nyquist frequency', body([LR4], { sampleRateHz: 44100, grid: { startHz: 10, stopHz: 22050, pointsPerOctave: 48 } }), 'grid.stopHz'],
    ['an unknown family', body([{ ...LR4, family: 'bessel' }]), 'filters.0.family'],
    ['a Linkwitz–Riley order 3', body([{ ...LR4, order: 3 }]), 'filters.0.order'],
    ['a Butterworth order 9', body([{ ...LR4, family: 'butterworth', order: 9 }]), 'filters.0.order'],
    ['a crossover response of none', body([{ ...LR4, response: 'none' }]), 'filters.0.response'],
    ['an unknown kind', body([{ kind: 'notch', cornerHz: 60 }]), 'filters.0.kind'],
    ['a gain beyond 24 dB', body([{ kind: 'peaking', centerHz: 45, gainDb: 30, q: 5 }]), 'filters.0.gainDb'],
    ['a q below 0.1', body([{ kind: 'peaking', centerHz: 45, gainDb: -3, q: 0.05 }]), 'filters.0.q'],
    ['a shelf with both q and slope', body([{ kind: 'low-shelf', cornerHz: 150, gainDb: -3, q: 0.7, slope: 1 }]), 'filters.0.slope'],
    ['a first-order all-pass with a q', body([{ kind: 'allpass', order: 1, cornerHz: 100, q: 1 }]), 'filters.0.q'],
    ['an all-pass of order 3', body([{ kind: 'allpass', order: 3, cornerHz: 100 }]), 'filters.0.order'],
    ['an unknown key in a filter', body([{ ...LR4, gainDb: 0 }]), 'filters.0'],
    ['no filters', body([]), 'filters'],
    ['33 filters', body(Array.from({ length: 33 }, () => LR4)), 'filters'],
    ['an unknown key', body([LR4], { fs: 48000 }), ''],
  ])('refuses %s, naming %s', (_label, request, where) => {
    expect(paths(request)).toContain(where);
  });
});
