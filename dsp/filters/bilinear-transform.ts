import { filterSections } from './analog-sections';
import type { AnalogSection, Biquad, CrossoverFilter } from './filter-types';
import { assertBelowNyquist, assertSampleRate } from './sample-rate';

// The bilinear transform with frequency pre-warping (A. V. Oppenheim and R. W. Schafer, "Discrete-Time Signal
// Processing", the bilinear transformation): x = s/ω0 → (1/t)·(1 − z⁻¹)/(1 + z⁻¹) with t = tan(π·f0/fs), so the analog
// response at f0 lands exactly at f0 in the digital filter. Multiplying numerator and denominator by t²·(1 + z⁻¹)²
// (by hand): n0 + n1·x + n2·x² → (n0t² + n1t + n2) + (2n0t² − 2n2)·z⁻¹ + (n0t² − n1t + n2)·z⁻², and a first-order
// n0 + n1·x by t·(1 + z⁻¹): (n0t + n1) + (n0t − n1)·z⁻¹. Every coefficient is then divided by a0.

function numeratorOf(section: AnalogSection): readonly [number, number, number] {
  switch (section.kind) {
    case 'lowpass1':
    case 'lowpass2':
      return [1, 0, 0];
    case 'highpass1':
      return [0, 1, 0];
    case 'highpass2':
      return [0, 0, 1];
    default:
      return section.numerator ?? [1, 0, 0];
  }
}

/**
 * One analog section as a digital biquad at `sampleRateHz`, pre-warped at the section's own corner.
 * @example analogSectionToBiquad({ kind: 'lowpass2', cornerHz: 12000, q: Math.SQRT1_2 }, 48000) // b0 = 0.2929, a1 = 0, a2 = 0.1716
 */
export function analogSectionToBiquad(section: AnalogSection, sampleRateHz: number, name = 'cornerHz'): Biquad {
  assertSampleRate(sampleRateHz);
  assertBelowNyquist(name, section.cornerHz, sampleRateHz);
  const t = Math.tan((Math.PI * section.cornerHz) / sampleRateHz);
  const [n0, n1, n2] = numeratorOf(section);
  if (section.kind === 'lowpass1' || section.kind === 'highpass1' || section.kind === 'general1') {
    const a0 = t + 1;
    return { b0: (n0 * t + n1) / a0, b1: (n0 * t - n1) / a0, b2: 0, a1: (t - 1) / a0, a2: 0 };
  }
  const t2 = t * t;
  const invQ = 1 / section.q;
  const a0 = t2 + t * invQ + 1;
  return {
    b0: (n0 * t2 + n1 * t + n2) / a0,
    b1: (2 * n0 * t2 - 2 * n2) / a0,
    b2: (n0 * t2 - n1 * t + n2) / a0,
    a1: (2 * t2 - 2) / a0,
    a2: (t2 - t * invQ + 1) / a0,
  };
}

/**
 * A Butterworth (1–8) or Linkwitz–Riley (2, 4, 8) high- or low-pass as biquads at `sampleRateHz`: its analog sections
 * (Butterworth 1930; Linkwitz 1976), each through the bilinear transform pre-warped at the corner — the digital corner
 * lands exactly on the analog one, as scipy.signal's butter(…, fs=…) does. An odd Butterworth's first-order section is
 * last, with b2 = a2 = 0.
 * @example crossoverBiquads({ kind: 'crossover', family: 'linkwitz-riley', order: 4, response: 'lowpass', cornerHz: 80 }, 48000).length // 2
 */
export function crossoverBiquads(filter: CrossoverFilter, sampleRateHz: number, name = 'filter'): Biquad[] {
  assertSampleRate(sampleRateHz);
  assertBelowNyquist(`${name}.cornerHz`, filter.cornerHz, sampleRateHz);
  let sections: AnalogSection[];
  try {
    sections = filterSections({ family: filter.family, order: filter.order, response: filter.response, cornerHz: filter.cornerHz });
  } catch (error) {
    if (error instanceof RangeError) throw new RangeError(error.message.replace(/^filter\./, `${name}.`));
    throw error;
  }
  return sections.map((s) => analogSectionToBiquad(s, sampleRateHz, `${name}.cornerHz`));
}
