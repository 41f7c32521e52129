import { assertPositive, positiveFrequencies } from '../internal/guards';

/** Options of {@link seatSpreadDb}. */
export interface SeatSpreadOptions {
  readonly frequencyHz: Float64Array | readonly number[];
  /** One magnitude curve (dB) per seat, each on frequencyHz. */
  readonly seatsMagnitudeDb: readonly (Float64Array | readonly number[])[];
  readonly startHz?: number;
  readonly stopHz?: number;
}

/** Result of {@link seatSpreadDb}. */
export interface SeatSpreadResult {
  /** max − min over the seats at each frequency, dB. */
  readonly spreadDb: Float64Array;
  /** Mean and largest spread within [startHz, stopHz] (whole grid by default), dB. */
  readonly meanSpreadDb: number;
  readonly maxSpreadDb: number;
  readonly maxSpreadHz: number;
}

/**
 * Seat-to-seat spread: at each frequency the difference between the loudest and the quietest seat, dB (common practice).
 * @example seatSpreadDb({ frequencyHz: [40, 50], seatsMagnitudeDb: [[0, 1], [-3, 2]] }).spreadDb // [3, 1]
 */
export function seatSpreadDb({ frequencyHz, seatsMagnitudeDb, startHz, stopHz }: SeatSpreadOptions): SeatSpreadResult {
  const f = positiveFrequencies('frequencyHz', frequencyHz);
  if (seatsMagnitudeDb.length < 2) throw new RangeError('seatsMagnitudeDb must hold at least two seats');
  seatsMagnitudeDb.forEach((curve, s) => {
    if (curve.length !== f.length) throw new RangeError(`seatsMagnitudeDb[${s}] must have ${f.length} entries like frequencyHz`);
  });
  const lo = startHz ?? 0;
  const hi = stopHz ?? Infinity;
  if (startHz !== undefined) assertPositive('startHz', startHz);
  if (stopHz !== undefined) assertPositive('stopHz', stopHz);
  const spreadDb = new Float64Array(f.length);
  let total = 0;
  let used = 0;
  let maxSpreadDb = -Infinity;
  let maxSpreadHz = NaN;
  for (let i = 0; i < f.length; i++) {
    let min = Infinity;
    let max = -Infinity;
    for (const curve of seatsMagnitudeDb) {
      const v = curve[i] as number;
      if (!Number.isFinite(v)) throw new RangeError(`seatsMagnitudeDb values must be finite (index ${i})`);
      if (v < min) min = v;
      if (v > max) max = v;
    }
    const spread = max - min;
    spreadDb[i] = spread;
    const fi = f[i] as number;
    if (fi >= lo && fi <= hi) {
      total += spread;
      used++;
      if (spread > maxSpreadDb) {
        maxSpreadDb = spread;
        maxSpreadHz = fi;
      }
    }
  }
  if (used === 0) throw new RangeError('startHz..stopHz holds no frequency of frequencyHz');
  return { spreadDb, meanSpreadDb: total / used, maxSpreadDb, maxSpreadHz };
}
