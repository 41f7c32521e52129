import { RAD_TO_DEG } from '../internal/angles';
import { complexLevelDb } from '../internal/complex';
import { positiveFrequencies } from '../internal/guards';
import type { Biquad, ComplexResponse } from './filter-types';
import { assertSampleRate } from './sample-rate';

// The exact frequency response of a cascade of biquads: with z = e^(jθ), θ = 2π·f/fs, each section is
// B(θ)/A(θ) with B = b0 + b1·e^(−jθ) + b2·e^(−j2θ) and A = 1 + a1·e^(−jθ) + a2·e^(−j2θ) (definition). The group delay of
// a polynomial P(θ) = Σ c_k·e^(−jkθ) is Re(Σ k·c_k·e^(−jkθ) / P) samples (differentiating its phase, by hand); a
// section's is the numerator's minus the denominator's.

/** Group delay, in samples, of c0 + c1·e^(−jθ) + c2·e^(−j2θ), and its value (re, im) written into `out`. */
function polynomialAt(c0: number, c1: number, c2: number, cos1: number, sin1: number, cos2: number, sin2: number, out: Float64Array): number {
  const re = c0 + c1 * cos1 + c2 * cos2;
  const im = -(c1 * sin1 + c2 * sin2);
  const dr = c1 * cos1 + 2 * c2 * cos2;
  const di = -(c1 * sin1 + 2 * c2 * sin2);
  out[0] = re;
  out[1] = im;
  const p = re * re + im * im;
  return p > 0 ? (dr * re + di * im) / p : 0;
}

/**
 * The complex response of biquads in cascade at `sampleRateHz` on a grid (each frequency below the Nyquist
 * frequency): magnitude dB, phase deg (−180, 180], group delay ms. An empty cascade is a wire (0 dB, 0°).
 * @example biquadsResponse([{ b0: 1, b1: 0, b2: 0, a1: 0, a2: 0 }], 48000, [1000]).magnitudeDb[0] // 0
 */
export function biquadsResponse(sections: readonly Biquad[], sampleRateHz: number, frequencyHz: Float64Array | readonly number[]): ComplexResponse {
  assertSampleRate(sampleRateHz);
  const f = positiveFrequencies('frequencyHz', frequencyHz);
  f.forEach((x, i) => {
    if (x >= sampleRateHz / 2) throw new RangeError(`frequencyHz[${i}] must be below the Nyquist frequency, ${sampleRateHz / 2} Hz (got ${x})`);
  });
  const n = f.length;
  const re = new Float64Array(n);
  const im = new Float64Array(n);
  const magnitudeDb = new Float64Array(n);
  const phaseDeg = new Float64Array(n);
  const groupDelayMs = new Float64Array(n);
  const b = new Float64Array(2);
  const a = new Float64Array(2);
  for (let i = 0; i < n; i++) {
    const theta = (2 * Math.PI * (f[i] as number)) / sampleRateHz;
    const cos1 = Math.cos(theta);
    const sin1 = Math.sin(theta);
    const cos2 = Math.cos(2 * theta);
    const sin2 = Math.sin(2 * theta);
    let hr = 1;
    let hi = 0;
    let delaySamples = 0;
    for (const s of sections) {
      delaySamples += polynomialAt(s.b0, s.b1, s.b2, cos1, sin1, cos2, sin2, b);
      delaySamples -= polynomialAt(1, s.a1, s.a2, cos1, sin1, cos2, sin2, a);
      // H ← H · B / A
      const ar = a[0] as number;
      const ai = a[1] as number;
      const inv = 1 / (ar * ar + ai * ai);
      const qr = ((b[0] as number) * ar + (b[1] as number) * ai) * inv;
      const qi = ((b[1] as number) * ar - (b[0] as number) * ai) * inv;
      const t = hr * qr - hi * qi;
      hi = hr * qi + hi * qr;
      hr = t;
    }
    re[i] = hr;
    im[i] = hi;
    magnitudeDb[i] = complexLevelDb(hr, hi);
    const p = Math.atan2(hi, hr) * RAD_TO_DEG;
    phaseDeg[i] = p === -180 ? 180 : p;
    groupDelayMs[i] = (1000 * delaySamples) / sampleRateHz;
  }
  return { frequencyHz: Float64Array.from(f), re, im, magnitudeDb, phaseDeg, groupDelayMs };
}

/**
 * True when both poles of the section lie strictly inside the unit circle: |a2| < 1 and |a1| < 1 + a2 (the stability
 * triangle of a second-order denominator; Oppenheim and Schafer).
 */
export function isStableBiquad(section: Biquad): boolean {
  return Math.abs(section.a2) < 1 && Math.abs(section.a1) < 1 + section.a2;
}
