/**
 * The band a peaking filter acts on, as the Audio EQ Cookbook defines its Q (R. Bristow-Johnson, "Cookbook formulae for
 * audio EQ biquad filter coefficients"): with 1/Q = 2·sinh(ln 2 / 2 · BW), BW octaves between the frequencies where the
 * filter gives half its dB gain (for a band-pass of the same Q, its −3 dB points), centred on centerHz in log frequency.
 * @example peakingBandHz(100, Math.SQRT2) // { lowHz: 70.7, highHz: 141.4 } (one octave)
 */
export function peakingBandHz(centerHz: number, q: number): { lowHz: number; highHz: number } {
  const octaves = (2 / Math.LN2) * Math.asinh(1 / (2 * q));
  const half = Math.pow(2, octaves / 2);
  return { lowHz: centerHz / half, highHz: centerHz * half };
}

/** The Q whose cookbook bandwidth is `octaves` wide (the inverse of {@link peakingBandHz}). */
export function qForOctaves(octaves: number): number {
  return 1 / (2 * Math.sinh((Math.LN2 / 2) * octaves));
}
