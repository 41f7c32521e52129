import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { crossoverBiquads, eqBiquad, type Biquad } from '@/dsp';
import { deviationWords, groupOutputs, groupVoicing, processorFiltersFromDocument, processorGridHz } from '@/lib/system-model/processor-filters';
import type { SpeakerProfile, SystemDocument } from '@/lib/validations/system';
import { TEST_MAIN, TEST_SUB, testSystem, withSub } from './test-system';

// The System's processor outputs as digital biquads. The invented test System: L, C, R high-passed (Butterworth 2nd
// order at 80 Hz), Sub A and Sub B low-passed (Linkwitz–Riley 4th order at 80 Hz), LFE low-pass at 120 Hz, 48 kHz.

/** |H(e^jω)| in dB of a cascade of biquads, evaluated here from the convention's formula (the oracle, not dsp/). */
function cascadeLevelDb(sections: readonly Biquad[], fHz: number, fsHz: number): number {
  const w = (2 * Math.PI * fHz) / fsHz;
  let re = 1;
  let im = 0;
  for (const s of sections) {
    // z⁻¹ = e^(−jω): numerator and denominator as complex numbers.
    const nr = s.b0 + s.b1 * Math.cos(w) + s.b2 * Math.cos(2 * w);
    const ni = -s.b1 * Math.sin(w) - s.b2 * Math.sin(2 * w);
    const dr = 1 + s.a1 * Math.cos(w) + s.a2 * Math.cos(2 * w);
    const di = -s.a1 * Math.sin(w) - s.a2 * Math.sin(2 * w);
    const d2 = dr * dr + di * di;
    const hr = (nr * dr + ni * di) / d2;
    const hi = (ni * dr - nr * di) / d2;
    [re, im] = [re * hr - im * hi, re * hi + im * hr];
  }
  return 10 * Math.log10(re * re + im * im);
}

const PEAK = { kind: 'peaking' as const, centerHz: 45, gainDb: -4, q: 5 };
const DIP_FILL = { kind: 'peaking' as const, centerHz: 31.5, gainDb: 2.5, q: 2 };

describe('processorFiltersFromDocument: every output of the finished System', () => {
  it('one high-pass per main channel, each sub its low-pass then its EQ, and the LFE low-pass (LR4 at lfeLowpassHz)', () => {
    const pf = processorFiltersFromDocument(withSub(testSystem(), 0, { eq: [PEAK, DIP_FILL] }));
    expect(pf.sampleRateHz).toBe(48000);
    expect(pf.convention).toBe('H(z) = (b0 + b1·z⁻¹ + b2·z⁻²) / (1 + a1·z⁻¹ + a2·z⁻²)');
    expect(pf.outputs.map((o) => [o.id, o.kind, o.label])).toEqual([
      ['main-l', 'main', 'L'],
      ['main-c', 'main', 'C'],
      ['main-r', 'main', 'R'],
      ['sub-sub-a', 'sub', 'Sub A'],
      ['sub-sub-b', 'sub', 'Sub B'],
      ['lfe', 'lfe', 'LFE'],
    ]);
    const highpass = { kind: 'crossover', family: 'butterworth', order: 2, response: 'highpass', cornerHz: 80 };
    for (const o of pf.outputs.slice(0, 3)) expect(o.filters).toEqual([{ role: 'crossover', filter: highpass, words: 'High-pass, Butterworth 2nd order (12 dB/oct), 80 Hz' }]);
    const subA = pf.outputs[3]!;
    expect(subA.filters.map((f) => [f.role, f.words])).toEqual([
      ['crossover', 'Low-pass, Linkwitz–Riley 4th order (24 dB/oct), 80 Hz'],
      ['eq', 'Peaking −4 dB at 45 Hz, Q 5'],
      ['eq', 'Peaking +2.5 dB at 31.5 Hz, Q 2'],
    ]);
    // LR4 = two sections, each EQ filter one: the filter index says which filter a section belongs to.
    expect(subA.result!.sections.map((s) => s.filter)).toEqual([0, 0, 1, 2]);
    expect(pf.outputs[4]!.result!.sections).toHaveLength(2);
    expect(pf.outputs[5]!.filters[0]!.filter).toEqual({ kind: 'crossover', family: 'linkwitz-riley', order: 4, response: 'lowpass', cornerHz: 120 });
    expect(pf.outputs.every((o) => o.problem === null)).toBe(true);
  });

  it('the sections are crossoverBiquads / eqBiquad of the document’s own settings, bit for bit', () => {
    const doc = withSub(testSystem(), 0, { eq: [PEAK, DIP_FILL] });
    const pf = processorFiltersFromDocument(doc);
    const coefficients = (list: readonly Biquad[]) => list.map(({ b0, b1, b2, a1, a2 }) => ({ b0, b1, b2, a1, a2 }));
    const hp = crossoverBiquads({ kind: 'crossover', family: 'butterworth', order: 2, response: 'highpass', cornerHz: 80 }, 48000);
    const lp = crossoverBiquads({ kind: 'crossover', family: 'linkwitz-riley', order: 4, response: 'lowpass', cornerHz: 80 }, 48000);
    const lfe = crossoverBiquads({ kind: 'crossover', family: 'linkwitz-riley', order: 4, response: 'lowpass', cornerHz: 120 }, 48000);
    expect(coefficients(pf.outputs[0]!.result!.sections)).toEqual(coefficients(hp));
    expect(coefficients(pf.outputs[3]!.result!.sections)).toEqual(coefficients([...lp, eqBiquad(PEAK, 48000), eqBiquad(DIP_FILL, 48000)]));
    expect(coefficients(pf.outputs[4]!.result!.sections)).toEqual(coefficients(lp));
    expect(coefficients(pf.outputs[5]!.result!.sections)).toEqual(coefficients(lfe));
  });

  it('the mains high-pass against the bilinear transform of s²/(s² + √2·s + 1), pre-warped, worked by hand (Oppenheim and Schafer)', () => {
    for (const fs of [44100, 48000, 96000, 192000]) {
      const s = processorFiltersFromDocument(testSystem(), { sampleRateHz: fs }).outputs[0]!.result!.sections[0]!;
      const k = Math.tan((Math.PI * 80) / fs);
      const a0 = 1 + Math.SQRT2 * k + k * k;
      const hand = { b0: 1 / a0, b1: -2 / a0, b2: 1 / a0, a1: (2 * (k * k - 1)) / a0, a2: (1 - Math.SQRT2 * k + k * k) / a0 };
      for (const c of ['b0', 'b1', 'b2', 'a1', 'a2'] as const) expect(Math.abs(s[c] - hand[c]), `${c} at ${fs} Hz`).toBeLessThan(1e-14);
    }
  });

  it('the corners land exactly: BW2 −3.0103 dB, LR4 −6.0206 dB at 80 Hz, a peaking filter its gain at its centre (Butterworth 1930; Linkwitz 1976; the Audio EQ Cookbook)', () => {
    for (const fs of [44100, 48000, 96000, 192000]) {
      const pf = processorFiltersFromDocument(withSub(testSystem(), 0, { eq: [PEAK] }), { sampleRateHz: fs });
      expect(cascadeLevelDb(pf.outputs[0]!.result!.sections, 80, fs)).toBeCloseTo(-10 * Math.log10(2), 9);
      expect(cascadeLevelDb(pf.outputs[4]!.result!.sections, 80, fs)).toBeCloseTo(-20 * Math.log10(2), 9);
      const peak = pf.outputs[3]!.result!.sections.slice(2);
      expect(cascadeLevelDb(peak, 45, fs)).toBeCloseTo(-4, 9);
    }
  });

  it('the responses are on the processor grid, 10 Hz to min(20 kHz, 0.45·fs) at 48 points per octave, and follow the sample rate given', () => {
    const at44 = processorFiltersFromDocument(testSystem(), { sampleRateHz: 44100 });
    expect(at44.sampleRateHz).toBe(44100);
    expect(at44.frequencyHz[0]).toBe(10);
    expect(at44.frequencyHz[at44.frequencyHz.length - 1]).toBeLessThanOrEqual(0.45 * 44100);
    expect(at44.frequencyHz.length).toBe(Math.floor(Math.log2((0.45 * 44100) / 10) * 48 + 1e-9) + 1);
    expect(processorGridHz(96000).length).toBe(Math.floor(Math.log2(20000 / 10) * 48 + 1e-9) + 1);
    expect(at44.outputs[0]!.result!.response.magnitudeDb).toHaveLength(at44.frequencyHz.length);
    const doc = testSystem();
    doc.bassManagement.sampleRateHz = 96000;
    expect(processorFiltersFromDocument(doc).sampleRateHz).toBe(96000);
    expect(processorFiltersFromDocument(doc).outputs[0]!.result!.sections[0]).not.toEqual(processorFiltersFromDocument(testSystem()).outputs[0]!.result!.sections[0]);
  });

  it('an EQ filter at or above the Nyquist frequency: that output says why and has no sections; every other output is computed', () => {
    const pf = processorFiltersFromDocument(withSub(testSystem(), 1, { eq: [{ kind: 'peaking', centerHz: 5000, gainDb: -3, q: 1 }] }), { sampleRateHz: 8000 });
    const subB = pf.outputs[4]!;
    expect(subB.result).toBeNull();
    expect(subB.problem).toMatch(/Peaking −3 dB at 5 kHz.*Nyquist frequency \(4 kHz at 8 kHz\)/);
    expect(pf.outputs.filter((o) => o.result !== null)).toHaveLength(5);
  });

  it('without subs there is no LFE output (the LFE then goes to the mains); without speakers no main output', () => {
    const noSubs = processorFiltersFromDocument({ ...testSystem(), subs: [] });
    expect(noSubs.outputs.map((o) => o.kind)).toEqual(['main', 'main', 'main']);
    expect(processorFiltersFromDocument({ ...testSystem(), speakers: [] }).outputs.map((o) => o.kind)).toEqual(['sub', 'sub', 'lfe']);
  });
});

describe('groupOutputs: outputs that run the same filters are shown once', () => {
  it('L, C and R share a card; subs with the same filters share one, a sub with its own EQ stands apart; the LFE alone', () => {
    const same = groupOutputs(processorFiltersFromDocument(testSystem()).outputs);
    expect(same.map((g) => g.labels)).toEqual([['L', 'C', 'R'], ['Sub A', 'Sub B'], ['LFE']]);
    const apart = groupOutputs(processorFiltersFromDocument(withSub(testSystem(), 1, { eq: [PEAK] })).outputs);
    expect(apart.map((g) => g.labels)).toEqual([['L', 'C', 'R'], ['Sub A'], ['Sub B'], ['LFE']]);
    expect(apart[2]!.first.id).toBe('sub-sub-b');
  });
});

// Invented back-panel switches for the voicing checks: a treble shelf on the mains, a boundary shelf on the subs.
const TREBLE: SpeakerProfile['voicingOptions'][number] = {
  id: 'treble',
  name: 'Treble',
  positions: [
    { id: 'flat', name: '0 dB', filters: [] },
    { id: 'up2', name: '+2 dB', filters: [{ kind: 'high-shelf', cornerHz: 3000, gainDb: 2, slope: 1 }] },
  ],
};
const BOUNDARY: SpeakerProfile['voicingOptions'][number] = {
  id: 'boundary',
  name: 'Boundary',
  positions: [
    { id: 'open', name: 'Open', filters: [] },
    { id: 'wall', name: 'Near a wall', filters: [{ kind: 'low-shelf', cornerHz: 60, gainDb: -2, slope: 1 }] },
  ],
};

function voicedSystem(): SystemDocument {
  const doc = testSystem();
  doc.profiles = doc.profiles.map((p) => (p.id === TEST_MAIN.id ? { ...p, voicingOptions: [TREBLE] } : p.id === TEST_SUB.id ? { ...p, voicingOptions: [BOUNDARY] } : p));
  doc.speakers = doc.speakers.map((s) => (s.channel === 'R' ? { ...s, voicing: { treble: 'up2' } } : s));
  doc.subs = doc.subs.map((s) => ({ ...s, voicing: { boundary: 'wall' } }));
  return doc;
}

describe('the voicing each output’s speaker is set to: listed, never a processor section', () => {
  it('each main and sub output names its switch positions; the LFE none; the filters and sections are the processor’s alone', () => {
    const plain = processorFiltersFromDocument(testSystem());
    expect(plain.outputs.map((o) => o.voicing)).toEqual([null, null, null, null, null, null]);
    const pf = processorFiltersFromDocument(voicedSystem());
    expect(pf.outputs.map((o) => [o.label, o.voicing])).toEqual([
      ['L', 'Treble: 0 dB'],
      ['C', 'Treble: 0 dB'],
      ['R', 'Treble: +2 dB'],
      ['Sub A', 'Boundary: Near a wall'],
      ['Sub B', 'Boundary: Near a wall'],
      ['LFE', null],
    ]);
    // The voicing shelves are the speaker's: not among the output's filters, not a section.
    pf.outputs.forEach((o, i) => {
      expect(o.filters).toEqual(plain.outputs[i]!.filters);
      expect(o.result!.sections).toEqual(plain.outputs[i]!.result!.sections);
    });
  });

  it('groupVoicing: one line for a group set alike, a line per setting (with its labels) when they differ, none without switches', () => {
    const groups = groupOutputs(processorFiltersFromDocument(voicedSystem()).outputs);
    expect(groups.map((g) => g.labels)).toEqual([['L', 'C', 'R'], ['Sub A', 'Sub B'], ['LFE']]);
    expect(groups.map((g) => groupVoicing(g))).toEqual([
      [
        { labels: ['L', 'C'], text: 'Treble: 0 dB' },
        { labels: ['R'], text: 'Treble: +2 dB' },
      ],
      [{ labels: null, text: 'Boundary: Near a wall' }],
      [],
    ]);
    expect(groupOutputs(processorFiltersFromDocument(testSystem()).outputs).map((g) => groupVoicing(g))).toEqual([[], [], []]);
  });
});

describe('deviationWords', () => {
  it('states a bound never below the deviation (two significant digits, rounded up) and where it holds', () => {
    expect(deviationWords({ maxDb: 0.00276, maxDeg: 0.2090, upToHz: 20000, floorDb: -40 })).toBe('within 0.0028 dB and 0.21° of the analog filter up to 20 kHz (where it is above −40 dB)');
    expect(deviationWords({ maxDb: 0, maxDeg: 0, upToHz: 19845, floorDb: -40 })).toBe('within 0.001 dB and 0.01° of the analog filter up to 19.845 kHz (where it is above −40 dB)');
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 50, noNaN: true }), fc.double({ min: 1e-6, max: 180, noNaN: true }), (maxDb, maxDeg) => {
        const m = /within ([\d.e-]+) dB and ([\d.e-]+)°/.exec(deviationWords({ maxDb, maxDeg, upToHz: 20000, floorDb: -40 }));
        expect(m).not.toBeNull();
        expect(Number(m![1])).toBeGreaterThanOrEqual(maxDb);
        expect(Number(m![2])).toBeGreaterThanOrEqual(maxDeg);
        // …and not loose: within one step of the second significant digit (or the floor).
        expect(Number(m![1])).toBeLessThanOrEqual(Math.max(0.001, maxDb * 1.11));
      }),
    );
  });
});
