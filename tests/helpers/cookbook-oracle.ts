import Complex from 'complex.js';
import type { EqFilter } from '@/dsp';

/**
 * The Audio EQ Cookbook's analog prototypes evaluated with complex.js (reference library) at s = j·f/f0, with
 * A = 10^(gainDb/40) (R. Bristow-Johnson, "Cookbook formulae for audio EQ biquad filter coefficients"; W3C Audio EQ
 * Cookbook note, 2021):
 *   peaking     H(s) = (s² + s·A/Q + 1) / (s² + s/(A·Q) + 1)
 *   low shelf   H(s) = A·(s² + s·√A/Q + A) / (A·s² + s·√A/Q + 1)
 *   high shelf  H(s) = A·(A·s² + s·√A/Q + 1) / (s² + s·√A/Q + A)
 * and a shelf's Q from the cookbook's slope S (default 1): 1/Q = √((A + 1/A)·(1/S − 1) + 2).
 */
function cookbookAnalog(filter: EqFilter, fHz: number): Complex {
  const a = Math.pow(10, filter.gainDb / 40);
  const s = new Complex(0, fHz / (filter.kind === 'peaking' ? filter.centerHz : filter.cornerHz));
  const s2 = s.mul(s);
  if (filter.kind === 'peaking') {
    return s2.add(s.mul(a / filter.q)).add(1).div(s2.add(s.mul(1 / (a * filter.q))).add(1));
  }
  const q = filter.q ?? 1 / Math.sqrt((a + 1 / a) * (1 / (filter.slope ?? 1) - 1) + 2);
  const k = Math.sqrt(a) / q;
  if (filter.kind === 'low-shelf') return s2.add(s.mul(k)).add(a).mul(a).div(s2.mul(a).add(s.mul(k)).add(1));
  return s2.mul(a).add(s.mul(k)).add(1).mul(a).div(s2.add(s.mul(k)).add(a));
}

/** The product of several prototypes at fHz: its level (dB) and phase (deg, (−180, 180]). */
export function cookbookCascade(filters: readonly EqFilter[], fHz: number): { levelDb: number; phaseDeg: number } {
  const h = filters.reduce((p, f) => p.mul(cookbookAnalog(f, fHz)), new Complex(1, 0));
  return { levelDb: 20 * Math.log10(h.abs()), phaseDeg: (h.arg() * 180) / Math.PI };
}
