import { assertFinite, assertPositive } from '../internal/guards';

/** Sample rates a processor may run: 8 kHz to 384 kHz. */
export const SAMPLE_RATE_LIMITS_HZ = { min: 8000, max: 384000 } as const;

/** The usual processor rates, offered first. */
export const COMMON_SAMPLE_RATES_HZ: readonly number[] = [44100, 48000, 96000, 192000];

/** Throws unless the sample rate is within {@link SAMPLE_RATE_LIMITS_HZ}. */
export function assertSampleRate(sampleRateHz: number, name = 'sampleRateHz'): void {
  assertFinite(name, sampleRateHz);
  if (sampleRateHz < SAMPLE_RATE_LIMITS_HZ.min || sampleRateHz > SAMPLE_RATE_LIMITS_HZ.max) {
    throw new RangeError(`${name} must be from ${SAMPLE_RATE_LIMITS_HZ.min} to ${SAMPLE_RATE_LIMITS_HZ.max} Hz (got ${sampleRateHz})`);
  }
}

/** Throws unless 0 < frequency < Nyquist (sampleRateHz / 2): a digital filter cannot have its corner at or above it. */
export function assertBelowNyquist(name: string, frequencyHz: number, sampleRateHz: number): void {
  assertPositive(name, frequencyHz);
  const nyquistHz = sampleRateHz / 2;
  if (frequencyHz >= nyquistHz) {
    throw new RangeError(`${name} must be below the Nyquist frequency, ${nyquistHz} Hz at a sample rate of ${sampleRateHz} Hz (got ${frequencyHz})`);
  }
}
