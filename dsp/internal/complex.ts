// Point-by-point arithmetic on complex values held as separate real and imaginary parts.
import { LN_POWER_TO_DB } from './angles';

/**
 * Level of re + j·im in dB, 10·log10(re² + im²) (definition); an exact zero reads −3000 dB (a floor of 1e-300 on
 * the power) instead of −∞.
 */
export function complexLevelDb(re: number, im: number): number {
  return LN_POWER_TO_DB * Math.log(re * re + im * im + 1e-300);
}

/** Curves of complex values point by point, with their levels. */
export interface ComplexCurves {
  readonly re: Float64Array;
  readonly im: Float64Array;
  readonly magnitudeDb: Float64Array;
}

/**
 * Writes (xRe + j·xIm)·A·e^(jφ) and its level into point i of `out`: a gain (amplitude A) and a phase shift φ, rad,
 * applied to a complex value (definition of the complex product).
 */
export function writeTimesPolar(out: ComplexCurves, i: number, xRe: number, xIm: number, amplitude: number, phaseRad: number): void {
  const cr = amplitude * Math.cos(phaseRad);
  const ci = amplitude * Math.sin(phaseRad);
  const r = xRe * cr - xIm * ci;
  const m = xRe * ci + xIm * cr;
  out.re[i] = r;
  out.im[i] = m;
  out.magnitudeDb[i] = complexLevelDb(r, m);
}
