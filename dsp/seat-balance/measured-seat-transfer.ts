import { DEG_TO_RAD } from '../internal/angles';
import { resampleCurve } from '../measured/resample-curve';
import type { SeatTransfer } from './seat-balance-evaluator';

/** Options of {@link measuredSeatTransfer}. */
export interface MeasuredSeatTransferOptions {
  readonly frequencyHz: Float64Array | readonly number[];
  readonly magnitudeDb: Float64Array | readonly number[];
  /** The measured phase, degrees; required (see below). */
  readonly phaseDeg: Float64Array | readonly number[] | null | undefined;
  /** The grid the transfer is wanted on, Hz. */
  readonly targetHz: Float64Array | readonly number[];
}

/**
 * A measured sub → seat response as a complex transfer on `targetHz`: magnitude and unwrapped phase interpolated on
 * log frequency (resampleCurve), then 10^(dB/20)·e^(jφ) (definition). The phase must be measured, with one timing
 * reference for every file of the set: a minimum-phase estimate is wrong for a sum of room modes at a seat (the modal
 * response is not minimum phase), so a curve without phase is refused, as is one that does not cover the grid.
 * @example measuredSeatTransfer({ frequencyHz: [20, 200], magnitudeDb: [0, 0], phaseDeg: [0, -90], targetHz: [20] }).re[0] // 1
 */
export function measuredSeatTransfer({ frequencyHz, magnitudeDb, phaseDeg, targetHz }: MeasuredSeatTransferOptions): SeatTransfer & { re: Float64Array; im: Float64Array } {
  if (!phaseDeg || phaseDeg.length === 0) throw new RangeError('phaseDeg is required: a curve without measured phase cannot be summed with the others');
  const r = resampleCurve({ frequencyHz, magnitudeDb, phaseDeg, targetHz });
  if (r.outsideCount > 0) throw new RangeError(`the curve does not cover ${r.outsideCount} of the ${r.frequencyHz.length} frequencies asked for`);
  const phase = r.phaseDeg as Float64Array;
  const re = new Float64Array(r.frequencyHz.length);
  const im = new Float64Array(r.frequencyHz.length);
  for (let i = 0; i < re.length; i++) {
    const a = Math.pow(10, (r.magnitudeDb[i] as number) / 20);
    const p = (phase[i] as number) * DEG_TO_RAD;
    re[i] = a * Math.cos(p);
    im[i] = a * Math.sin(p);
  }
  return { re, im };
}
