/** σ of the band limit as a share of the Nyquist frequency: the weight there is e^(−4.3²/2) ≈ 1e-4. */
const SIGMA_PER_NYQUIST = 1 / 4.3;

/**
 * The weight of a spectrum's bin at `hz` under a Gaussian band limit, w(f) = e^(−f²/(2σ²)) with σ = (sampleRateHz/2)/4.3
 * (930 Hz at 8 kHz: −0.05 dB at 100 Hz, −0.45 dB at 300 Hz, −3 dB at 775 Hz, 1e-4 at the Nyquist frequency). A
 * Gaussian's inverse transform is a Gaussian, positive everywhere: an impulse seen through it is smeared over a fraction
 * of a millisecond (σt = 1/(2π·σ) = 0.17 ms) but never rings, so nothing shows before a path's sound arrives but that
 * smear (a flat band cut off sharply would ring for milliseconds either side; common practice).
 * @example gaussianBandLimit(930, 8000) // e^(−½) ≈ 0.607
 */
export function gaussianBandLimit(hz: number, sampleRateHz: number): number {
  const sigmaHz = (SIGMA_PER_NYQUIST * sampleRateHz) / 2;
  return Math.exp(-0.5 * (hz / sigmaHz) ** 2);
}

/** The frequency where {@link gaussianBandLimit} is −3 dB (w = 1/√2): σ·√(ln 2), Hz. */
export function gaussianBandLimitMinus3DbHz(sampleRateHz: number): number {
  return ((SIGMA_PER_NYQUIST * sampleRateHz) / 2) * Math.sqrt(Math.LN2);
}
