/** A small independent oracle for the API tests: complex arithmetic and the filters from their formulas. */

/** Speed of sound in dry air, m/s (published: Kinsler et al., "Fundamentals of Acoustics", 4th ed., 2000). */
export const speedMps = (temperatureC: number) => 331.3 * Math.sqrt(1 + temperatureC / 273.15);

export type C = readonly [number, number];
export const mul = (a: C, b: C): C => [a[0] * b[0] - a[1] * b[1], a[0] * b[1] + a[1] * b[0]];
export const div = (a: C, b: C): C => {
  const d = b[0] * b[0] + b[1] * b[1];
  return [(a[0] * b[0] + a[1] * b[1]) / d, (a[1] * b[0] - a[0] * b[1]) / d];
};
export const add = (a: C, b: C): C => [a[0] + b[0], a[1] + b[1]];
export const scale = (a: C, k: number): C => [a[0] * k, a[1] * k];
/** Second-order Butterworth at s = j·f/fc: low-pass 1/(s² + √2·s + 1), high-pass s²/(s² + √2·s + 1) (published: Butterworth 1930). */
export const bw2 = (x: number, response: 'lowpass' | 'highpass'): C => div(response === 'lowpass' ? [1, 0] : [-x * x, 0], [1 - x * x, Math.SQRT2 * x]);
/** Linkwitz–Riley 4th order: a Butterworth 2nd order squared (published: Linkwitz 1976). */
export const lr4 = (x: number, response: 'lowpass' | 'highpass'): C => mul(bw2(x, response), bw2(x, response));
/** A delay of `ms` at fHz: e^(−j·2π·f·t). */
export const late = (fHz: number, ms: number): C => [Math.cos((-2 * Math.PI * fHz * ms) / 1000), Math.sin((-2 * Math.PI * fHz * ms) / 1000)];
export const levelDb = (h: C) => 10 * Math.log10(h[0] * h[0] + h[1] * h[1]);
