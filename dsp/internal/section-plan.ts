import type { AnalogSection } from '../filters/filter-types';

// A product of analog sections packed for fast evaluation: stride 3 = [kindCode, ω0 (rad/s), 1/Q].
// kindCode: 0 low-pass 1st order, 1 high-pass 1st, 2 low-pass 2nd, 3 high-pass 2nd.
export interface SectionPlan {
  readonly packed: Float64Array;
  /** The same sections for the blend kernel, stride 3 = [kindCode, 1/ω0 (s/rad), 1/Q]. */
  readonly kernel: Float64Array;
  readonly count: number;
  /** Linear gain including polarity sign. */
  readonly gain: number;
  /** Total power of s in the numerator (sum of high-pass orders). */
  readonly numeratorPower: number;
}

const CODES: Record<AnalogSection['kind'], number> = { lowpass1: 0, highpass1: 1, lowpass2: 2, highpass2: 3 };

export function compileSections(sections: readonly AnalogSection[], gain: number): SectionPlan {
  const packed = new Float64Array(sections.length * 3);
  const kernel = new Float64Array(sections.length * 3);
  let numeratorPower = 0;
  sections.forEach((s, i) => {
    const code = CODES[s.kind];
    packed[3 * i] = code;
    packed[3 * i + 1] = 2 * Math.PI * s.cornerHz;
    packed[3 * i + 2] = 1 / s.q;
    kernel[3 * i] = code;
    kernel[3 * i + 1] = 1 / (2 * Math.PI * s.cornerHz);
    kernel[3 * i + 2] = 1 / s.q;
    if (code === 1) numeratorPower += 1;
    else if (code === 3) numeratorPower += 2;
  });
  return { packed, kernel, count: sections.length, gain, numeratorPower };
}

/**
 * Evaluates a plan at ω (rad/s) and writes [Re H, Im H, Re H'/H, Im H'/H] into out (H' = dH/dω).
 * Group delay of the plan = −Im(H'/H) seconds. Allocates nothing.
 */
export function evaluatePlan(plan: SectionPlan, omega: number, out: Float64Array): void {
  const packed = plan.packed;
  let pr = 1;
  let pi = 0;
  let dpr = 0;
  let dpi = 0;
  let numMag = plan.gain;
  for (let j = 0, n = plan.count * 3; j < n; j += 3) {
    const code = packed[j] as number;
    const w0 = packed[j + 1] as number;
    const u = omega / w0;
    let dr: number;
    let di: number;
    let ddr: number;
    let ddi: number;
    if (code < 2) {
      dr = 1;
      di = u;
      ddr = 0;
      ddi = 1 / w0;
      if (code === 1) numMag *= u;
    } else {
      const invQ = packed[j + 2] as number;
      dr = 1 - u * u;
      di = u * invQ;
      ddr = (-2 * u) / w0;
      ddi = invQ / w0;
      if (code === 3) numMag *= u * u;
    }
    // (P·d)' = P'·d + P·d'
    const npr = dpr * dr - dpi * di + pr * ddr - pi * ddi;
    const npi = dpr * di + dpi * dr + pr * ddi + pi * ddr;
    const qr = pr * dr - pi * di;
    pi = pr * di + pi * dr;
    pr = qr;
    dpr = npr;
    dpi = npi;
  }
  const inv = 1 / (pr * pr + pi * pi);
  // H = numMag · j^m / P
  let hr = pr * inv * numMag;
  let hi = -pi * inv * numMag;
  const m = plan.numeratorPower & 3;
  if (m === 1) {
    const t = hr;
    hr = -hi;
    hi = t;
  } else if (m === 2) {
    hr = -hr;
    hi = -hi;
  } else if (m === 3) {
    const t = hr;
    hr = hi;
    hi = -t;
  }
  // H'/H = m/ω − P'/P
  out[0] = hr;
  out[1] = hi;
  out[2] = plan.numeratorPower / omega - (dpr * pr + dpi * pi) * inv;
  out[3] = -(dpi * pr - dpr * pi) * inv;
}
