import type { AnalogSection } from '../filters/filter-types';

// A product of analog sections packed for fast evaluation: stride 3 = [kindCode, 1/ω0 (s/rad), 1/Q].
// kindCode: 0 low-pass 1st order, 1 high-pass 1st, 2 low-pass 2nd, 3 high-pass 2nd, 4 general 1st (own numerator),
// 5 general 2nd (own numerator); a general section's numerator [n0, n1, n2] sits at the same index in `numerators`.
export interface SectionPlan {
  /** Stride 3 = [kindCode, 1/ω0 (s/rad), 1/Q]. */
  readonly kernel: Float64Array;
  /** Stride 3, the general sections' numerators [n0, n1, n2] (powers of s/ω0); zeros for the other kinds. */
  readonly numerators: Float64Array;
  /** True when any section is general (the evaluation then keeps a numerator product). */
  readonly hasGeneral: boolean;
  readonly count: number;
  /** Linear gain including polarity sign. */
  readonly gain: number;
  /** Total power of s in the numerator (sum of high-pass orders). */
  readonly numeratorPower: number;
  /** A measured response multiplied in (a path run on a measurement instead of the speaker's model); null: none. */
  readonly tabulated: TabulatedFactor | null;
}

/**
 * A response known only at points (a measurement), read between them by straight lines: the natural-log amplitude in
 * ln f, the continuous phase in f (so the group delay is constant between two points and a pure delay is read exactly).
 * Below the first point the first amplitude and phase are held; above the last the amplitude is held and the phase
 * goes on turning at the top group delay (so a delayed curve stays delayed).
 */
export interface TabulatedFactor {
  /** Frequencies, Hz, strictly ascending, at least two points. */
  readonly hz: Float64Array;
  /** ln(frequency / Hz). */
  readonly lnHz: Float64Array;
  /** ln |M| (natural log of the amplitude). */
  readonly lnAmplitude: Float64Array;
  /** Continuous phase, rad. */
  readonly phaseRad: Float64Array;
  /** Group delay above the last point, s. */
  readonly topGroupDelayS: number;
}

const CODES: Record<AnalogSection['kind'], number> = { lowpass1: 0, highpass1: 1, lowpass2: 2, highpass2: 3, general1: 4, general2: 5 };

export function compileSections(sections: readonly AnalogSection[], gain: number, tabulated: TabulatedFactor | null = null): SectionPlan {
  const kernel = new Float64Array(sections.length * 3);
  const numerators = new Float64Array(sections.length * 3);
  let numeratorPower = 0;
  let hasGeneral = false;
  sections.forEach((s, i) => {
    const code = CODES[s.kind];
    kernel[3 * i] = code;
    kernel[3 * i + 1] = 1 / (2 * Math.PI * s.cornerHz);
    kernel[3 * i + 2] = 1 / s.q;
    if (code === 1) numeratorPower += 1;
    else if (code === 3) numeratorPower += 2;
    else if (code >= 4) {
      hasGeneral = true;
      const [n0, n1, n2] = s.numerator ?? [1, 0, 0];
      numerators[3 * i] = n0;
      numerators[3 * i + 1] = n1;
      numerators[3 * i + 2] = code === 4 ? 0 : n2;
    }
  });
  return { kernel, numerators, hasGeneral, count: sections.length, gain, numeratorPower, tabulated };
}

/** Where {@link evaluatePlanOnGrid} writes: H and H′/H at each grid point (each array at least as long as the grid). */
export interface PlanValues {
  readonly re: Float64Array;
  readonly im: Float64Array;
  /** Re H′/H, 1/(rad/s). */
  readonly dRe: Float64Array;
  /** Im H′/H: the plan's group delay is −Im(H′/H) seconds. */
  readonly dIm: Float64Array;
}

/**
 * Evaluates a plan at every ω of a grid (rad/s): H = gain · j^m · ω^m/… · Π N(ω) / Π d(ω) and H′/H by the product
 * rule (H′ = dH/dω). The one evaluation of a product of analog sections in dsp/; allocates nothing.
 */
export function evaluatePlanOnGrid(plan: SectionPlan, omega: ArrayLike<number>, out: PlanValues): void {
  evaluateDenominators(plan, omega, out);
  if (plan.hasGeneral) applyNumerators(plan, omega, out);
  if (plan.tabulated) applyTabulated(plan.tabulated, omega, out);
}

const INV_TWO_PI = 1 / (2 * Math.PI);

/**
 * Multiplies a tabulated response M into H and adds M′/M to H′/H. Between points ln|M| is a straight line in ln f
 * (d/dω = (1/ω)·d/d(ln f)) and the phase a straight line in f (dφ/dω its slope over 2π): M′/M = a′/ω + j·φ′.
 */
function applyTabulated(t: TabulatedFactor, omega: ArrayLike<number>, out: PlanValues): void {
  const { hz, lnHz, lnAmplitude, phaseRad } = t;
  const last = hz.length - 1;
  const { re, im, dRe, dIm } = out;
  let seg = 0;
  for (let i = 0; i < omega.length; i++) {
    const w = omega[i] as number;
    const f = w * INV_TWO_PI;
    let amp: number;
    let phase: number;
    let slopeAmp = 0; // d ln|M| / d ln f
    let phasePerOmega = 0; // dφ/dω, s
    if (f <= (hz[0] as number)) {
      amp = lnAmplitude[0] as number;
      phase = phaseRad[0] as number;
    } else if (f >= (hz[last] as number)) {
      amp = lnAmplitude[last] as number;
      phasePerOmega = -t.topGroupDelayS;
      phase = (phaseRad[last] as number) + phasePerOmega * (w - 2 * Math.PI * (hz[last] as number));
    } else {
      // The segment holding f: walk on from the last one (grids ascend), or from the start when f went back.
      if (f < (hz[seg] as number)) seg = 0;
      while ((hz[seg + 1] as number) <= f) seg++;
      const f0 = hz[seg] as number;
      const x0 = lnHz[seg] as number;
      slopeAmp = ((lnAmplitude[seg + 1] as number) - (lnAmplitude[seg] as number)) / ((lnHz[seg + 1] as number) - x0);
      amp = (lnAmplitude[seg] as number) + slopeAmp * (Math.log(f) - x0);
      const phasePerHz = ((phaseRad[seg + 1] as number) - (phaseRad[seg] as number)) / ((hz[seg + 1] as number) - f0);
      phase = (phaseRad[seg] as number) + phasePerHz * (f - f0);
      phasePerOmega = phasePerHz * INV_TWO_PI;
    }
    const a = Math.exp(amp);
    const mr = a * Math.cos(phase);
    const mi = a * Math.sin(phase);
    const hr = re[i] as number;
    const hi = im[i] as number;
    re[i] = hr * mr - hi * mi;
    im[i] = hr * mi + hi * mr;
    dRe[i] = (dRe[i] as number) + slopeAmp / w;
    dIm[i] = (dIm[i] as number) + phasePerOmega;
  }
}

/**
 * Multiplies the general sections' numerators into H (and adds N′/N to H′/H): N = (n0 − n2·u²) + j·n1·u, u = ω/ω0.
 * A numerator that vanishes (a perfect notch) leaves H′/H as the denominators gave it.
 */
function applyNumerators(plan: SectionPlan, omega: ArrayLike<number>, out: PlanValues): void {
  const k = plan.kernel;
  const nu = plan.numerators;
  const kn = plan.count * 3;
  const { re, im, dRe, dIm } = out;
  for (let i = 0; i < omega.length; i++) {
    const w = omega[i] as number;
    let qr = 1;
    let qi = 0;
    let sr = 0; // Σ N′/N
    let si = 0;
    for (let j = 0; j < kn; j += 3) {
      if ((k[j] as number) < 4) continue;
      const iw = k[j + 1] as number;
      const u = w * iw;
      const n0 = nu[j] as number;
      const n1 = nu[j + 1] as number;
      const n2 = nu[j + 2] as number;
      const nr = n0 - n2 * u * u;
      const ni = n1 * u;
      const dnr = -2 * n2 * u * iw;
      const dni = n1 * iw;
      const t = qr * nr - qi * ni;
      qi = qr * ni + qi * nr;
      qr = t;
      const p = nr * nr + ni * ni;
      if (p > 0) {
        sr += (dnr * nr + dni * ni) / p;
        si += (dni * nr - dnr * ni) / p;
      }
    }
    const hr = re[i] as number;
    const hi = im[i] as number;
    re[i] = hr * qr - hi * qi;
    im[i] = hr * qi + hi * qr;
    dRe[i] = (dRe[i] as number) + sr;
    dIm[i] = (dIm[i] as number) + si;
  }
}

/** The crossover/roll-off part of a plan (every denominator, the j^m·ω^m numerators of high-passes) into out. */
function evaluateDenominators(plan: SectionPlan, omega: ArrayLike<number>, out: PlanValues): void {
  const k = plan.kernel;
  const kn = plan.count * 3;
  const gain = plan.gain;
  const numeratorPower = plan.numeratorPower;
  const m = numeratorPower & 3;
  const { re, im, dRe, dIm } = out;
  for (let i = 0; i < omega.length; i++) {
    const w = omega[i] as number;
    let pr = 1;
    let pi = 0;
    let dpr = 0;
    let dpi = 0;
    let numMag = gain;
    for (let j = 0; j < kn; j += 3) {
      const code = k[j] as number;
      const iw = k[j + 1] as number;
      const u = w * iw;
      let dr: number;
      let di: number;
      let ddr: number;
      let ddi: number;
      if (code < 2 || code === 4) {
        dr = 1;
        di = u;
        ddr = 0;
        ddi = iw;
        if (code === 1) numMag *= u;
      } else {
        const invQ = k[j + 2] as number;
        dr = 1 - u * u;
        di = u * invQ;
        ddr = -2 * u * iw;
        ddi = invQ * iw;
        if (code === 3) numMag *= u * u;
      }
      // (P·d)′ = P′·d + P·d′
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
    // H′/H = m/ω − P′/P
    re[i] = hr;
    im[i] = hi;
    dRe[i] = numeratorPower / w - (dpr * pr + dpi * pi) * inv;
    dIm[i] = -(dpi * pr - dpr * pi) * inv;
  }
}

/** Fresh PlanValues for n points. */
export function planValues(n: number): PlanValues {
  const b = new Float64Array(4 * n);
  return { re: b.subarray(0, n), im: b.subarray(n, 2 * n), dRe: b.subarray(2 * n, 3 * n), dIm: b.subarray(3 * n, 4 * n) };
}
