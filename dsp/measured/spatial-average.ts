import { LN_POWER_TO_DB } from '../internal/angles';
import { assertFiniteArray } from '../internal/guards';

/** Options of {@link spatialAverageDb}. */
export interface SpatialAverageOptions {
  /** One magnitude curve per seat, all on one grid, dB. */
  readonly seatsMagnitudeDb: readonly (Float64Array | readonly number[])[];
}

/**
 * The seats' spatial average: at each grid point the power average of the seats' magnitudes,
 * 10·log10((1/K)·Σ 10^(L_k/10)), dB (common practice; REFERENCES.md "Several subs over several seats").
 * Computed relative to the loudest seat at each point, so very low levels do not underflow.
 * @example spatialAverageDb({ seatsMagnitudeDb: [[0], [-200]] })[0] // −3.0103 (10·log10(1/2))
 */
export function spatialAverageDb({ seatsMagnitudeDb }: SpatialAverageOptions): Float64Array {
  if (seatsMagnitudeDb.length === 0) throw new RangeError('seatsMagnitudeDb must hold at least one seat');
  const points = (seatsMagnitudeDb[0] as ArrayLike<number>).length;
  if (points === 0) throw new RangeError('seatsMagnitudeDb[0] must hold at least one point');
  seatsMagnitudeDb.forEach((seat, k) => {
    if (seat.length !== points) {
      throw new RangeError(`seatsMagnitudeDb[${k}] must have ${points} points like seatsMagnitudeDb[0] (got ${seat.length})`);
    }
    assertFiniteArray(`seatsMagnitudeDb[${k}]`, seat);
  });
  const out = new Float64Array(points);
  for (let i = 0; i < points; i++) {
    let peak = -Infinity;
    for (const seat of seatsMagnitudeDb) peak = Math.max(peak, seat[i] as number);
    let total = 0;
    for (const seat of seatsMagnitudeDb) total += Math.exp(((seat[i] as number) - peak) / LN_POWER_TO_DB);
    out[i] = peak + LN_POWER_TO_DB * Math.log(total / seatsMagnitudeDb.length);
  }
  return out;
}
