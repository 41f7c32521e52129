import { assertIntegerInRange, assertPositive } from '../internal/guards';

/**
 * Nominal mid-band frequencies, the labels a band carries ("25 Hz", "31.5 Hz", "125 Hz"), from the exact
 * base-ten mid-band frequency (see fractionalOctaveBands).
 *
 * Octave and one-third-octave bands use the nominal series of IEC 61260-1:2014 (Annex E, the R10 series of
 * ISO 266): 1, 1.25, 1.6, 2, 2.5, 3.15, 4, 5, 6.3, 8, repeated ×10 per decade. The exact base-ten
 * one-third-octave mid-band frequencies are 10^(k/10) Hz, so each maps to the nearest member of the series.
 * Other fractions are rounded as IEC 61260-1:2014 5.5 prescribes (from memory): to three significant digits
 * when the leading digit is 1 to 4, to two when it is 5 to 9.
 */

/** The R10 nominal series in hundredths, one decade. */
const R10_HUNDREDTHS = [100, 125, 160, 200, 250, 315, 400, 500, 630, 800] as const;

/** `value` (an integer) × 10^`exponent`, written so 315 × 10^−1 is exactly the literal 31.5. */
function scaled(value: number, exponent: number): number {
  return exponent >= 0 ? value * 10 ** exponent : value / 10 ** -exponent;
}

/**
 * The nominal mid-band frequency, Hz, of the 1/`fraction`-octave band whose exact mid-band frequency is `exactHz`.
 * @example nominalMidbandHz(25.119, 3) // 25
 * @example nominalMidbandHz(3162.3, 3) // 3150
 */
export function nominalMidbandHz(exactHz: number, fraction: number): number {
  assertPositive('exactHz', exactHz);
  assertIntegerInRange('fraction', fraction, 1, 48);
  if (fraction === 1 || fraction === 3) {
    // Tenths of a decade: 10^(k/10) is the k-th member of the series.
    const k = Math.round(10 * Math.log10(exactHz));
    const decade = Math.floor(k / 10);
    const member = R10_HUNDREDTHS[k - 10 * decade] as number;
    return scaled(member, decade - 2);
  }
  const exponent = Math.floor(Math.log10(exactHz));
  const leading = Math.floor(exactHz / 10 ** exponent);
  const digits = leading >= 5 ? 2 : 3;
  return scaled(Math.round(exactHz / 10 ** (exponent - digits + 1)), exponent - digits + 1);
}
