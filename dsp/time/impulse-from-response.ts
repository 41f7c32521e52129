import { impulseFromBins, type TimeSignal } from './impulse-from-bins';
import { timeWindow, type TimeWindowOptions } from './time-window';
import { uniformSpectrum } from './uniform-spectrum';

export { TIME_VIEW_DEFAULTS } from './time-window';

/** Options of {@link impulseFromResponse}: the curve and the window ({@link timeWindow}: 8 kHz, −20 … 300 ms by default). */
export interface ImpulseFromResponseOptions extends TimeWindowOptions {
  /** The response's grid (e.g. a blend's or a measurement's log grid), ascending, Hz. */
  readonly frequencyHz: Float64Array | readonly number[];
  readonly magnitudeDb: Float64Array | readonly number[];
  /** True phase relative to the response's own time origin (so a delayed path shows its delay), degrees. */
  readonly phaseDeg: Float64Array | readonly number[];
}

/** Impulse and step response over a window of time, and the band the response was used over. */
export interface TimeResponse extends TimeSignal {
  readonly sampleRateHz: number;
  readonly fftSize: number;
  /** The response is used as given up to here and tapered to zero over the octave above, Hz. */
  readonly bandTopHz: number;
}

/**
 * Impulse and step response of a complex response given on a grid (a blend's paths or sum, or a measured curve with
 * phase): the response is put on a uniform FFT grid ({@link uniformSpectrum}: band-limited to the curve's top or fs/4
 * with a one-octave half-Hann taper above, the lowest point's level held down to 0 Hz) and inverted by
 * {@link impulseFromBins} (fft.js; A. V. Oppenheim and R. W. Schafer, "Discrete-Time Signal Processing", published) over
 * the window; the FFT spans at least 4 s (0.25 Hz bins at most).
 * @example impulseFromResponse({ frequencyHz: gridHz, magnitudeDb: gridHz.map(() => 0), phaseDeg: gridHz.map((f) => -360 * f * 0.005) }) // a 5 ms delay: the impulse peaks at timeMs 5, the step ends at 1
 */
export function impulseFromResponse(options: ImpulseFromResponseOptions): TimeResponse {
  const window = timeWindow(options);
  const { re, im, bandTopHz } = uniformSpectrum({ ...options, sampleRateHz: window.sampleRateHz, fftSize: window.fftSize });
  return { ...impulseFromBins({ re, im, window }), sampleRateHz: window.sampleRateHz, fftSize: window.fftSize, bandTopHz };
}
