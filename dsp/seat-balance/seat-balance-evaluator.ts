import { LN_POWER_TO_DB } from '../internal/angles';
import { sinCos } from '../internal/fast-math';
import { assertFinite, assertIntegerInRange, assertNonNegative, assertPositive, positiveFrequencies } from '../internal/guards';
import type { SeatBalanceMeasures, SubSetting } from './seat-balance-types';

const TABLE_SIZE = 4096;
const QUARTER = TABLE_SIZE / 4;
/** sin(2π·k/TABLE_SIZE) for k = 0 … 1.25·TABLE_SIZE + 1 (the last quarter and one more serve the cosine). */
const SINE = Float64Array.from({ length: TABLE_SIZE + QUARTER + 2 }, (_, k) => Math.sin((2 * Math.PI * k) / TABLE_SIZE));

/** One sub → seat transfer function on the evaluator's grid (complex pressure, any consistent unit). */
export interface SeatTransfer {
  readonly re: ArrayLike<number>;
  readonly im: ArrayLike<number>;
}

/** Options of {@link seatBalanceEvaluator}. */
export interface SeatBalanceEvaluatorOptions {
  readonly frequencyHz: ArrayLike<number>;
  /** transfers[sub][seat], each on frequencyHz: the modal model's or a measurement's complex response. */
  readonly transfers: readonly (readonly SeatTransfer[])[];
  /** The band the spread and the level are taken over, Hz (inclusive, as room-response's spread band). */
  readonly startHz: number;
  readonly stopHz: number;
  /** One weight ≥ 0 per seat (default all 1); a seat of weight 0 does not count. */
  readonly seatWeights?: readonly number[];
  /** Output floor, dB below every sub in phase at 0 ms / 0 dB (default 3). */
  readonly maxOutputLossDb?: number;
}

/** What {@link SeatBalanceEvaluator.score} writes: the objective and the level, without allocating. */
export interface SeatBalanceScore {
  objectiveDb: number;
  meanLevelDb: number;
}

/** The measures of any sub settings for one set of transfers; built once, then called for every candidate. */
export interface SeatBalanceEvaluator {
  readonly subCount: number;
  readonly seatCount: number;
  /** The grid points inside the band. */
  readonly bandHz: Float64Array;
  readonly maxOutputLossDb: number;
  /** Every measure of `settings` (one per sub). */
  measure(settings: readonly SubSetting[]): SeatBalanceMeasures;
  /**
   * The same problem on every `stride`-th point of the band (a coarser, cheaper measure for a global search to find
   * the right valley in; the answer is always measured on the full band).
   */
  coarse(stride: number): SeatBalanceEvaluator;
  /** The objective and level only, from packed settings (delays ms, gains dB, inverted 0/1), into `out`. */
  score(delaysMs: Float64Array, gainsDb: Float64Array, inverts: Uint8Array, out: SeatBalanceScore): void;
}

/**
 * Evaluates sub settings (delay, gain, polarity per sub) at several seats from complex transfer functions, so no
 * candidate re-evaluates the room. At each band frequency the seats' pressures are p_k = Σ_s H_sk·g_s·(±1)·e^(−jωτ_s)
 * (superposition; definition of a delay), the spread is 10·log10(max|p_k|²/min|p_k|²) — the loudest seat minus the
 * quietest in dB, averaged over the band: exactly room-response's meanSpreadDb — and the level is the weighted power
 * mean of |p_k|² over seats and band, in dB relative to every sub at 0 ms / 0 dB / normal polarity.
 * With unequal seat weights (normalised so the largest is 1) the objective at each frequency is the largest
 * min(w_a, w_b)·|L_a − L_b| over pairs of seats: max − min when the weights are equal, and a seat of weight 0 drops out.
 * @example seatBalanceEvaluator({ frequencyHz, transfers, startHz: 20, stopHz: 120 }).measure([{ delayMs: 0, gainDb: 0, invert: false }]).meanSpreadDb
 */
export function seatBalanceEvaluator(options: SeatBalanceEvaluatorOptions): SeatBalanceEvaluator {
  const f = positiveFrequencies('frequencyHz', options.frequencyHz);
  const { transfers, startHz, stopHz } = options;
  assertPositive('startHz', startHz);
  assertPositive('stopHz', stopHz);
  if (stopHz < startHz) throw new RangeError('stopHz must not be below startHz');
  const maxOutputLossDb = options.maxOutputLossDb ?? 3;
  assertNonNegative('maxOutputLossDb', maxOutputLossDb);
  const subCount = transfers.length;
  if (subCount === 0) throw new RangeError('transfers must hold at least one sub');
  const seatCount = transfers[0]?.length ?? 0;
  if (seatCount === 0) throw new RangeError('transfers[0] must hold at least one seat');
  const band: number[] = [];
  for (let i = 0; i < f.length; i++) if ((f[i] as number) >= startHz && (f[i] as number) <= stopHz) band.push(i);
  if (band.length === 0) throw new RangeError('startHz..stopHz holds no frequency of frequencyHz');
  const nB = band.length;
  // Packed [band point][sub][seat], so the inner loops walk memory in order.
  const hRe = new Float64Array(nB * subCount * seatCount);
  const hIm = new Float64Array(nB * subCount * seatCount);
  transfers.forEach((row, s) => {
    if (row.length !== seatCount) throw new RangeError(`transfers[${s}] must hold ${seatCount} seats like transfers[0]`);
    row.forEach((t, k) => {
      if (t.re.length !== f.length || t.im.length !== f.length) throw new RangeError(`transfers[${s}][${k}] must have ${f.length} points like frequencyHz`);
      band.forEach((i, b) => {
        const re = t.re[i] as number;
        const im = t.im[i] as number;
        if (!Number.isFinite(re) || !Number.isFinite(im)) throw new RangeError(`transfers[${s}][${k}] must be finite (point ${i})`);
        hRe[(b * subCount + s) * seatCount + k] = re;
        hIm[(b * subCount + s) * seatCount + k] = im;
      });
    });
  });
  const weights = new Float64Array(seatCount).fill(1);
  if (options.seatWeights) {
    if (options.seatWeights.length !== seatCount) throw new RangeError(`seatWeights must hold ${seatCount} weights, one per seat`);
    options.seatWeights.forEach((w, k) => assertNonNegative(`seatWeights[${k}]`, w));
    const top = Math.max(...options.seatWeights);
    if (!(top > 0)) throw new RangeError('seatWeights must give at least one seat a weight above 0');
    options.seatWeights.forEach((w, k) => (weights[k] = w / top));
  }
  const equalWeights = weights.every((w) => w === 1);
  const weightSum = weights.reduce((a, w) => a + w, 0);
  const bandHz = Float64Array.from(band, (i) => f[i] as number);
  const omegaPerMs = Float64Array.from(bandHz, (hz) => (2 * Math.PI * hz) / 1000);
  const hzOverThousand = Float64Array.from(bandHz, (hz) => hz / 1000);
  const phRe = new Float64Array(subCount);
  const phIm = new Float64Array(subCount);
  const power = new Float64Array(seatCount);
  const sc = new Float64Array(2);
  const levels = new Float64Array(seatCount);

  // One pass over the band: the seats' powers at each point; the callback sees them and the index.
  const amplitude = new Float64Array(subCount);
  const pass = (delaysMs: Float64Array, gainsDb: Float64Array, inverts: Uint8Array, atPoint: (b: number, p: Float64Array) => void): number => {
    for (let s = 0; s < subCount; s++) amplitude[s] = Math.pow(10, (gainsDb[s] as number) / 20) * (inverts[s] ? -1 : 1);
    let sumPower = 0;
    for (let b = 0; b < nB; b++) {
      const w = omegaPerMs[b] as number;
      for (let s = 0; s < subCount; s++) {
        sinCos(-w * (delaysMs[s] as number), sc, 0);
        const a = amplitude[s] as number;
        phRe[s] = a * (sc[1] as number);
        phIm[s] = a * (sc[0] as number);
      }
      const base = b * subCount * seatCount;
      for (let k = 0; k < seatCount; k++) {
        let re = 0;
        let im = 0;
        for (let s = 0; s < subCount; s++) {
          const idx = base + s * seatCount + k;
          const hr = hRe[idx] as number;
          const hi = hIm[idx] as number;
          const pr = phRe[s] as number;
          const pi = phIm[s] as number;
          re += hr * pr - hi * pi;
          im += hr * pi + hi * pr;
        }
        const p = re * re + im * im + 1e-300;
        power[k] = p;
        sumPower += (weights[k] as number) * p;
      }
      atPoint(b, power);
    }
    return sumPower / (weightSum * nB);
  };

  // Spread at one point: max − min over the seats (weight > 0), or the weighted pair form.
  const spreadAt = (p: Float64Array): number => {
    if (seatCount < 2) return 0;
    if (equalWeights) {
      let max = 0;
      let min = Infinity;
      for (let k = 0; k < seatCount; k++) {
        const v = p[k] as number;
        if (v > max) max = v;
        if (v < min) min = v;
      }
      return LN_POWER_TO_DB * Math.log(max / min);
    }
    for (let k = 0; k < seatCount; k++) levels[k] = LN_POWER_TO_DB * Math.log(p[k] as number);
    let worst = 0;
    for (let a = 0; a < seatCount; a++) {
      const wa = weights[a] as number;
      if (wa === 0) continue;
      for (let c = a + 1; c < seatCount; c++) {
        const wc = weights[c] as number;
        if (wc === 0) continue;
        const d = Math.min(wa, wc) * Math.abs((levels[a] as number) - (levels[c] as number));
        if (d > worst) worst = d;
      }
    }
    return worst;
  };
  const rawSpread = (p: Float64Array): number => {
    if (seatCount < 2) return 0;
    let max = 0;
    let min = Infinity;
    for (let k = 0; k < seatCount; k++) {
      const v = p[k] as number;
      if (v > max) max = v;
      if (v < min) min = v;
    }
    return LN_POWER_TO_DB * Math.log(max / min);
  };

  const zeros = new Float64Array(subCount);
  const referencePower = pass(zeros, zeros, new Uint8Array(subCount), () => {});

  // The search's inner loop: the same sums as `pass`, written out for equal weights (the common case), where the spread
  // needs only the largest and smallest power; the product of max/min ratios is summed as logs once per point.
  const score = (delaysMs: Float64Array, gainsDb: Float64Array, inverts: Uint8Array, out: SeatBalanceScore): void => {
    if (!equalWeights || seatCount < 2) {
      let total = 0;
      const meanPower = pass(delaysMs, gainsDb, inverts, (_, p) => {
        total += spreadAt(p);
      });
      out.objectiveDb = total / nB;
      out.meanLevelDb = LN_POWER_TO_DB * Math.log(meanPower / referencePower);
      return;
    }
    for (let s = 0; s < subCount; s++) amplitude[s] = Math.pow(10, (gainsDb[s] as number) / 20) * (inverts[s] ? -1 : 1);
    let sumPower = 0;
    let logSum = 0;
    for (let b = 0; b < nB; b++) {
      const cyclesPerMs = hzOverThousand[b] as number;
      for (let s = 0; s < subCount; s++) {
        // e^(−jωτ) from a sine table with linear interpolation (error < 3e-7): the search's measure; answers use `pass`.
        const turns = -cyclesPerMs * (delaysMs[s] as number);
        const x = (turns - Math.floor(turns)) * TABLE_SIZE;
        const i = x | 0;
        const t = x - i;
        const sin = (SINE[i] as number) + t * ((SINE[i + 1] as number) - (SINE[i] as number));
        const j = i + QUARTER;
        const cos = (SINE[j] as number) + t * ((SINE[j + 1] as number) - (SINE[j] as number));
        const a = amplitude[s] as number;
        phRe[s] = a * cos;
        phIm[s] = a * sin;
      }
      const base = b * subCount * seatCount;
      let max = 0;
      let min = Infinity;
      for (let k = 0; k < seatCount; k++) {
        let re = 0;
        let im = 0;
        let idx = base + k;
        for (let s = 0; s < subCount; s++, idx += seatCount) {
          const hr = hRe[idx] as number;
          const hi = hIm[idx] as number;
          const pr = phRe[s] as number;
          const pi = phIm[s] as number;
          re += hr * pr - hi * pi;
          im += hr * pi + hi * pr;
        }
        const p = re * re + im * im + 1e-300;
        sumPower += p;
        if (p > max) max = p;
        if (p < min) min = p;
      }
      logSum += Math.log(max / min);
    }
    out.objectiveDb = (LN_POWER_TO_DB * logSum) / nB;
    out.meanLevelDb = LN_POWER_TO_DB * Math.log(sumPower / (weightSum * nB) / referencePower);
  };

  const measure = (settings: readonly SubSetting[]): SeatBalanceMeasures => {
    if (settings.length !== subCount) throw new RangeError(`settings must hold ${subCount} sub settings`);
    const delays = new Float64Array(subCount);
    const gains = new Float64Array(subCount);
    const inverts = new Uint8Array(subCount);
    settings.forEach((s, i) => {
      assertNonNegative(`settings[${i}].delayMs`, s.delayMs);
      assertFinite(`settings[${i}].gainDb`, s.gainDb);
      delays[i] = s.delayMs;
      gains[i] = s.gainDb;
      inverts[i] = s.invert ? 1 : 0;
    });
    let spreadTotal = 0;
    let objectiveTotal = 0;
    let maxSpreadDb = -Infinity;
    let maxSpreadHz = bandHz[0] as number;
    const meanPower = pass(delays, gains, inverts, (b, p) => {
      const spread = rawSpread(p);
      spreadTotal += spread;
      objectiveTotal += equalWeights ? spread : spreadAt(p);
      if (spread > maxSpreadDb) {
        maxSpreadDb = spread;
        maxSpreadHz = bandHz[b] as number;
      }
    });
    const meanLevelDb = LN_POWER_TO_DB * Math.log(meanPower / referencePower);
    return {
      meanSpreadDb: spreadTotal / nB,
      maxSpreadDb,
      maxSpreadHz,
      meanLevelDb,
      objectiveDb: objectiveTotal / nB,
      withinFloor: meanLevelDb >= -maxOutputLossDb - 1e-9,
    };
  };

  const coarse = (stride: number): SeatBalanceEvaluator => {
    assertIntegerInRange('stride', stride, 1, Math.max(1, nB));
    const keep = band.filter((_, b) => b % stride === 0);
    const pick = (a: ArrayLike<number>) => keep.map((i) => a[i] as number);
    return seatBalanceEvaluator({
      frequencyHz: pick(f),
      transfers: transfers.map((row) => row.map((t) => ({ re: pick(t.re), im: pick(t.im) }))),
      startHz,
      stopHz,
      ...(options.seatWeights ? { seatWeights: options.seatWeights } : {}),
      maxOutputLossDb,
    });
  };

  return { subCount, seatCount, bandHz, maxOutputLossDb, measure, score, coarse };
}
