import { assertFiniteArray, assertIntegerInRange, assertPositive, assertSameLength, curveFrequencies } from '../internal/guards';
import { DEG_TO_RAD } from '../internal/angles';
import { phaseUnwrapByDelay } from './phase-unwrap-by-delay';

/** Options of {@link uniformSpectrum}. */
export interface UniformSpectrumOptions {
  /** The curve's grid (e.g. log-spaced), ascending, Hz. At least two points. */
  readonly frequencyHz: Float64Array | readonly number[];
  readonly magnitudeDb: Float64Array | readonly number[];
  /** Phase, degrees, wrapped or not, relative to the response's own time origin. */
  readonly phaseDeg: Float64Array | readonly number[];
  readonly sampleRateHz: number;
  /** Length of the FFT the bins are for (a power of two); bins 0 … fftSize/2 are returned. */
  readonly fftSize: number;
}

/** One half of a real signal's spectrum on the FFT's uniform grid, bins k·sampleRateHz/fftSize for k = 0 … fftSize/2. */
export interface UniformSpectrum {
  readonly re: Float64Array;
  readonly im: Float64Array;
  /** The response is used as given up to here: the curve's top or sampleRateHz/4, whichever is lower, Hz. */
  readonly bandTopHz: number;
  /** The half-Hann taper reaches zero here: 2·bandTopHz (never above sampleRateHz/2), Hz. */
  readonly taperTopHz: number;
}

/**
 * Resamples a complex response given on any ascending grid onto an FFT's uniform bins, ready for an inverse real FFT:
 * - inside the curve: magnitude in dB linear in log-frequency (a stopband's slope stays a straight line), and the phase,
 *   unwrapped along its group delay ({@link phaseUnwrapByDelay}), linear in frequency — exact for a delay, which is
 *   what turns the phase most between the points of a sparse log grid (interpolating real and imaginary parts would cut
 *   the chord between points and lose level wherever the phase turns fast);
 * - above bandTopHz a half-Hann taper, 1 → 0 over one octave to taperTopHz, so the band edge does not ring; where the
 *   taper runs above the curve's top the last magnitude is held and the phase continues with the top's group delay;
 *   zero above taperTopHz;
 * - below the curve's bottom the lowest point's magnitude is held (not zeroed, so a step settles at the response's DC
 *   level rather than falling back to 0 as if high-passed at the grid's bottom) and the phase runs linearly from the
 *   DC phase to the lowest point's; the DC phase is the multiple of 180° nearest the lowest point's phase extrapolated
 *   to 0 Hz along its group delay (a real signal's spectrum is real at 0 Hz: the DC bin keeps the lowest point's level
 *   with the sign that extrapolation gives).
 * Our own choices, stated here; the half-Hann (raised-cosine) taper is common practice.
 * @example uniformSpectrum({ frequencyHz: [10, 1000], magnitudeDb: [0, 0], phaseDeg: [0, 0], sampleRateHz: 8000, fftSize: 16 }).re[0] // 1
 */
export function uniformSpectrum({ frequencyHz, magnitudeDb, phaseDeg, sampleRateHz, fftSize }: UniformSpectrumOptions): UniformSpectrum {
  const f = curveFrequencies(frequencyHz, magnitudeDb);
  if (f.length < 2) throw new RangeError(`frequencyHz must contain at least two frequencies (got ${f.length})`);
  assertSameLength('phaseDeg', phaseDeg, f.length);
  assertFiniteArray('phaseDeg', phaseDeg);
  assertPositive('sampleRateHz', sampleRateHz);
  assertIntegerInRange('fftSize', fftSize, 4, 2 ** 24);
  if ((fftSize & (fftSize - 1)) !== 0) throw new RangeError(`fftSize must be a power of two (got ${fftSize})`);

  const { unwrappedDeg, bottomGroupDelayS, topGroupDelayS } = phaseUnwrapByDelay(f, phaseDeg);
  const last = f.length - 1;
  const bottomHz = f[0] as number;
  const topHz = f[last] as number;
  const bandTopHz = Math.min(topHz, sampleRateHz / 4);
  const taperTopHz = 2 * bandTopHz;
  const bottomPhaseDeg = unwrappedDeg[0] as number;
  const dcPhaseDeg = 180 * Math.round((bottomPhaseDeg + 360 * bottomHz * bottomGroupDelayS) / 180);

  const half = fftSize / 2;
  const re = new Float64Array(half + 1);
  const im = new Float64Array(half + 1);
  let j = 0; // f[j] ≤ bin frequency < f[j + 1] inside the curve
  for (let k = 0; k <= half; k++) {
    const hz = (k * sampleRateHz) / fftSize;
    if (hz >= taperTopHz) break;
    const taper = hz <= bandTopHz ? 1 : 0.5 * (1 + Math.cos((Math.PI * (hz - bandTopHz)) / (taperTopHz - bandTopHz)));
    let levelDb: number;
    let angleDeg: number;
    if (hz < bottomHz) {
      levelDb = magnitudeDb[0] as number;
      angleDeg = dcPhaseDeg + ((bottomPhaseDeg - dcPhaseDeg) * hz) / bottomHz;
    } else if (hz >= topHz) {
      levelDb = magnitudeDb[last] as number;
      angleDeg = (unwrappedDeg[last] as number) - 360 * (hz - topHz) * topGroupDelayS;
    } else {
      while ((f[j + 1] as number) <= hz) j++;
      const f0 = f[j] as number;
      const f1 = f[j + 1] as number;
      const tLog = Math.log(hz / f0) / Math.log(f1 / f0);
      const tLin = (hz - f0) / (f1 - f0);
      levelDb = (magnitudeDb[j] as number) + tLog * ((magnitudeDb[j + 1] as number) - (magnitudeDb[j] as number));
      angleDeg = (unwrappedDeg[j] as number) + tLin * ((unwrappedDeg[j + 1] as number) - (unwrappedDeg[j] as number));
    }
    const amplitude = taper * Math.pow(10, levelDb / 20);
    re[k] = amplitude * Math.cos(angleDeg * DEG_TO_RAD);
    im[k] = amplitude * Math.sin(angleDeg * DEG_TO_RAD);
  }
  im[0] = 0; // real at 0 Hz (the DC phase is a multiple of 180°; this removes the rounding of sin)
  im[half] = 0; // and at the Nyquist frequency (zero anyway: taperTopHz ≤ sampleRateHz/2)
  return { re, im, bandTopHz, taperTopHz };
}
