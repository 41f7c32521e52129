/**
 * Seat balance: the compute behind POST /api/v1/seat-balance (`computeSeatBalance` on the modal model,
 * `computeMeasuredSeatBalance` on stored measurements). The transfers come from dsp (modalTransfers, the same modal sum
 * and grid as room-response; or measuredSeatTransfer), the search is dsp's optimizeSubSettings / subPlacementSearch;
 * here only the grid, names, the seats' curves for the plots and rounding.
 */
import {
  combinationCount,
  defaultSubCandidates,
  logFrequencyGridHz,
  measuredSeatTransfer,
  modalTransfers,
  optimizeSubSettings,
  seatBalanceEvaluator,
  subPlacementSearch,
  type SeatBalanceEvaluator,
  type SeatBalanceLimits,
  type SeatBalanceMeasures,
  type SeatTransfer,
  type SubSetting,
} from '@/dsp';
import { invalid } from '@/lib/errors';
import type { SeatBalanceMeasuredRequest, SeatBalanceModelRequest } from '@/lib/validations/compute-seat-balance';
import { toPointM } from './geometry';
import { roundAllTo, roundTo, roundToSignificant } from './rounding';
import { placementEvaluations, searchEvaluations, SEAT_BALANCE_WORK } from './seat-balance-work';

/** The measures of one set of settings as the answer gives them. */
export interface SeatBalanceSummary {
  meanSpreadDb: number;
  maxSpreadDb: number;
  maxSpreadHz: number;
  /** The seats' mean level over the band, dB relative to every sub at 0 ms / 0 dB / normal polarity. */
  meanLevelDb: number;
}

interface PlacedSub {
  name: string;
  xM?: number;
  yM?: number;
  zM?: number;
}

export interface SeatBalanceSubAnswer extends SubSetting {
  name: string;
  /** In a ranked placement: the candidate position the sub stands at. */
  candidate?: string;
  xM?: number;
  yM?: number;
  zM?: number;
}

export interface SeatBalanceAnswer {
  source: 'model' | 'measured';
  objective: string;
  band: { startHz: number; stopHz: number };
  grid: { startHz: number; stopHz: number; pointsPerOctave: number };
  limits: SeatBalanceLimits;
  subs: SeatBalanceSubAnswer[];
  before: SeatBalanceSummary;
  after: SeatBalanceSummary;
  /** The present settings (the System's, or the measured request's `present`), measured the same way; absent otherwise. */
  present?: SeatBalanceSummary;
  evaluated: number;
  /** The band's grid points and each seat's level there, before and after (dB, 0 = before's mean level). */
  frequencyHz: number[];
  seats: { name: string; weight: number; beforeDb: number[]; afterDb: number[]; presentDb?: number[] }[];
  spread: { beforeDb: number[]; afterDb: number[]; presentDb?: number[] };
  placements?: {
    candidates: { name: string; xM: number; yM: number; zM: number }[];
    totalCombinations: number;
    rankedCombinations: number;
    capped: boolean;
    ranked: { subs: SeatBalanceSubAnswer[]; before: SeatBalanceSummary; after: SeatBalanceSummary }[];
  };
}

/** What the caller can add beyond the request: the System's present settings, a count per sub, progress. */
export interface SeatBalanceExtras {
  /** The System's present settings, one per sub: the answer is never worse than these when they keep the limits. */
  present?: readonly SubSetting[];
  /** A fixed level per sub, dB (20·log10 of a System sub's count of boxes). */
  fixedGainDb?: readonly number[];
  /**
   * A fixed delay per sub that the processor applies anyway, ms (a System sub's distance alignment): part of each sub's
   * path, so the answer's delays are the sub's own delays on top of it.
   */
  fixedDelayMs?: readonly number[];
  onProgress?: (fraction: number) => void;
}

export const SEAT_BALANCE_OBJECTIVE =
  'mean seat-to-seat spread over the band (loudest minus quietest seat at each frequency, averaged), with the seats’ mean level at most maxOutputLossDb below every sub in phase at 0 ms / 0 dB';

const summary = (m: SeatBalanceMeasures): SeatBalanceSummary => ({
  meanSpreadDb: roundTo(m.meanSpreadDb, 2),
  maxSpreadDb: roundTo(m.maxSpreadDb, 2),
  maxSpreadHz: roundToSignificant(m.maxSpreadHz, 4),
  meanLevelDb: roundTo(m.meanLevelDb, 2),
});

const gridOf = (r: { band: { startHz: number; stopHz: number }; grid?: { startHz: number; stopHz: number; pointsPerOctave: number } | undefined }) =>
  r.grid ?? { startHz: r.band.startHz, stopHz: r.band.stopHz, pointsPerOctave: 48 };

/**
 * transfers[sub][seat] with each sub's fixed level (dB; a System sub's 20·log10(count)) and fixed delay (ms; its
 * distance alignment) applied: H·10^(g/20)·e^(−jωτ).
 */
export function withFixedPath(frequencyHz: ArrayLike<number>, transfers: readonly (readonly SeatTransfer[])[], fixedGainDb?: readonly number[], fixedDelayMs?: readonly number[]): SeatTransfer[][] {
  return transfers.map((row, s) => {
    const gainDb = fixedGainDb?.[s] ?? 0;
    const delayMs = fixedDelayMs?.[s] ?? 0;
    if (gainDb === 0 && delayMs === 0) return [...row];
    const a = Math.pow(10, gainDb / 20);
    const rot = Array.from(frequencyHz, (f) => (-2 * Math.PI * f * delayMs) / 1000);
    return row.map((t) => {
      const re = new Float64Array(t.re.length);
      const im = new Float64Array(t.re.length);
      for (let i = 0; i < re.length; i++) {
        const c = a * Math.cos(rot[i] as number);
        const d = a * Math.sin(rot[i] as number);
        re[i] = (t.re[i] as number) * c - (t.im[i] as number) * d;
        im[i] = (t.re[i] as number) * d + (t.im[i] as number) * c;
      }
      return { re, im };
    });
  });
}

/** Each seat's level (dB) at the band points for `settings`, relative to `referenceDb`. */
function seatCurvesDb(frequencyHz: Float64Array, bandHz: Float64Array, transfers: readonly (readonly SeatTransfer[])[], settings: readonly SubSetting[]): number[][] {
  const index = new Map<number, number>();
  frequencyHz.forEach((f, i) => index.set(f, i));
  const seats = transfers[0]?.length ?? 0;
  return Array.from({ length: seats }, (_, k) =>
    Array.from(bandHz, (f) => {
      const i = index.get(f) as number;
      const w = 2 * Math.PI * f;
      let re = 0;
      let im = 0;
      transfers.forEach((row, s) => {
        const st = settings[s] as SubSetting;
        const a = Math.pow(10, st.gainDb / 20) * (st.invert ? -1 : 1);
        const ph = (-w * st.delayMs) / 1000;
        const cr = a * Math.cos(ph);
        const ci = a * Math.sin(ph);
        const hr = (row[k] as SeatTransfer).re[i] as number;
        const hi = (row[k] as SeatTransfer).im[i] as number;
        re += hr * cr - hi * ci;
        im += hr * ci + hi * cr;
      });
      return 10 * Math.log10(re * re + im * im + 1e-300);
    }),
  );
}

interface Problem {
  frequencyHz: Float64Array;
  transfers: SeatTransfer[][];
  seats: { name: string; weight: number }[];
  subs: PlacedSub[];
  band: { startHz: number; stopHz: number };
  grid: { startHz: number; stopHz: number; pointsPerOctave: number };
  limits: SeatBalanceLimits;
  seed: number;
}

/** Optimises one problem and shapes the answer (curves relative to the neutral settings' mean level). */
function solve(p: Problem, source: SeatBalanceAnswer['source'], extras: SeatBalanceExtras, progressShare = 1): SeatBalanceAnswer {
  const transfers = withFixedPath(p.frequencyHz, p.transfers, extras.fixedGainDb, extras.fixedDelayMs);
  const evaluator: SeatBalanceEvaluator = seatBalanceEvaluator({ frequencyHz: p.frequencyHz, transfers, startHz: p.band.startHz, stopHz: p.band.stopHz, seatWeights: p.seats.map((s) => s.weight), maxOutputLossDb: p.limits.maxOutputLossDb });
  const searchLimits = { maxDelayMs: p.limits.maxDelayMs, minGainDb: p.limits.minGainDb, maxGainDb: p.limits.maxGainDb, allowInvert: p.limits.allowInvert };
  const r = optimizeSubSettings({
    evaluator,
    limits: searchLimits,
    seed: p.seed,
    maxEvaluations: searchEvaluations(p.subs.length, p.seats.length, evaluator.bandHz.length),
    ...(extras.present ? { starts: [extras.present] } : {}),
    ...(extras.onProgress ? { onProgress: (done: number, total: number) => extras.onProgress?.((progressShare * done) / total) } : {}),
  });
  const neutral = p.subs.map(() => ({ delayMs: 0, gainDb: 0, invert: false }));
  const beforeCurves = seatCurvesDb(p.frequencyHz, evaluator.bandHz, transfers, neutral);
  const afterCurves = seatCurvesDb(p.frequencyHz, evaluator.bandHz, transfers, r.settings);
  const presentCurves = extras.present ? seatCurvesDb(p.frequencyHz, evaluator.bandHz, transfers, extras.present) : undefined;
  // 0 dB: the neutral settings' mean level (the weighted power mean the output floor is measured from).
  const weights = p.seats.map((s) => s.weight);
  const wsum = weights.reduce((a, w) => a + w, 0);
  let power = 0;
  beforeCurves.forEach((c, k) => c.forEach((db) => (power += ((weights[k] as number) * Math.pow(10, db / 10)) / (wsum * c.length))));
  const ref = 10 * Math.log10(power);
  const rel = (c: number[]) => roundAllTo(c.map((v) => v - ref), 2);
  const spreadOf = (curves: number[][]) => roundAllTo(curves[0]!.map((_, i) => Math.max(...curves.map((c) => c[i] as number)) - Math.min(...curves.map((c) => c[i] as number))), 2);
  return {
    source,
    objective: SEAT_BALANCE_OBJECTIVE,
    band: p.band,
    grid: p.grid,
    limits: p.limits,
    subs: p.subs.map((s, i) => ({ ...s, ...(r.settings[i] as SubSetting) })),
    before: summary(r.before),
    after: summary(r.after),
    ...(extras.present ? { present: summary(evaluator.measure(extras.present)) } : {}),
    evaluated: r.evaluated,
    frequencyHz: Array.from(evaluator.bandHz, (f) => roundToSignificant(f, 6)),
    seats: p.seats.map((s, k) => ({ name: s.name, weight: s.weight, beforeDb: rel(beforeCurves[k]!), afterDb: rel(afterCurves[k]!), ...(presentCurves ? { presentDb: rel(presentCurves[k]!) } : {}) })),
    spread: { beforeDb: spreadOf(beforeCurves), afterDb: spreadOf(afterCurves), ...(presentCurves ? { presentDb: spreadOf(presentCurves) } : {}) },
  };
}

/** POST /api/v1/seat-balance on the modal model, with the placement search when asked. */
export function computeSeatBalance(input: SeatBalanceModelRequest, extras: SeatBalanceExtras = {}): SeatBalanceAnswer {
  const grid = gridOf(input);
  const frequencyHz = logFrequencyGridHz(grid);
  const transfersAt = (points: { xM: number; yM: number; zM: number }[]) =>
    modalTransfers({ room: input.room, sourcesM: points.map(toPointM), receiversM: input.seats.map(toPointM), frequencyHz, rt60S: input.room.rt60S, temperatureC: input.room.temperatureC, maxModeHz: 1.5 * grid.stopHz });
  const seats = input.seats.map((s) => ({ name: s.name, weight: s.weight ?? 1 }));
  const placing = input.placement;
  // A placement search too big for one request is refused before any work.
  const bandPoints = Array.from(frequencyHz).filter((f) => f >= input.band.startHz && f <= input.band.stopHz).length;
  const candidates = placing
    ? [
        ...(placing.defaults ? defaultSubCandidates(input.room).map((c) => ({ name: c.name, xM: roundTo(c.positionM.x, 3), yM: roundTo(c.positionM.y, 3), zM: roundTo(c.positionM.z, 3) })) : []),
        ...placing.candidates,
      ]
    : [];
  const combinations = placing ? Math.min(combinationCount(candidates.length, placing.count), placing.maxCombinations) : 0;
  const budget = placing ? placementEvaluations(placing.count, seats.length, bandPoints, combinations) : null;
  if (placing && !budget) {
    const most = Math.max(1, Math.floor((0.7 * SEAT_BALANCE_WORK.placementUnits) / (SEAT_BALANCE_WORK.minQuickEvaluations * placing.count * seats.length * bandPoints)));
    const message = `at most ${most} combinations for ${placing.count} subs, ${seats.length} seats and ${bandPoints} points in the band`;
    throw invalid(`placement.maxCombinations: ${message} — lower maxCombinations, the seats or the grid's points per octave`, [{ path: 'placement.maxCombinations', message }]);
  }
  const t = transfersAt(input.subs);
  const problem: Problem = { frequencyHz: t.frequencyHz, transfers: t.transfers, seats, subs: input.subs.map((s) => ({ ...s })), band: input.band, grid, limits: input.limits, seed: input.seed };
  const answer = solve(problem, 'model', extras, placing ? 0.2 : 1);
  if (!placing || !budget) return answer;
  const ct = transfersAt(candidates);
  const found = subPlacementSearch({
    frequencyHz: ct.frequencyHz,
    candidateTransfers: ct.transfers,
    count: placing.count,
    startHz: input.band.startHz,
    stopHz: input.band.stopHz,
    seatWeights: seats.map((s) => s.weight),
    limits: input.limits,
    seed: input.seed,
    maxCombinations: placing.maxCombinations,
    quickEvaluations: budget.quick,
    finalEvaluations: budget.final,
    ...(extras.onProgress ? { onProgress: (done: number, total: number) => extras.onProgress?.(0.2 + (0.8 * done) / total) } : {}),
  });
  const subName = (i: number) => input.subs[i]?.name ?? `Sub ${i + 1}`;
  return {
    ...answer,
    evaluated: answer.evaluated + found.evaluated,
    placements: {
      candidates,
      totalCombinations: found.totalCombinations,
      rankedCombinations: found.rankedCombinations,
      capped: found.rankedCombinations < found.totalCombinations,
      ranked: found.ranked.map((r) => ({
        subs: r.candidates.map((c, i) => {
          const at = candidates[c]!;
          return { name: subName(i), candidate: at.name, xM: at.xM, yM: at.yM, zM: at.zM, ...r.settings[i]! };
        }),
        before: summary(r.before),
        after: summary(r.after),
      })),
    },
  };
}

/** The points of one stored measurement, as the route loads them. */
export interface MeasuredCurve {
  frequencyHz: readonly number[];
  magnitudeDb: readonly number[];
  phaseDeg: readonly number[] | null;
}

/** POST /api/v1/seat-balance on measurements: `curves[i]` is the measurement named by `input.measurements[i]`. */
export function computeMeasuredSeatBalance(input: SeatBalanceMeasuredRequest, curves: readonly MeasuredCurve[], extras: SeatBalanceExtras = {}): SeatBalanceAnswer {
  const grid = gridOf(input);
  const frequencyHz = logFrequencyGridHz(grid);
  const find = (sub: string, seat: string) => input.measurements.findIndex((m) => m.sub.toLowerCase() === sub.toLowerCase() && m.seat.toLowerCase() === seat.toLowerCase());
  const transfers = input.subs.map((sub) =>
    input.seats.map((seat) => {
      const i = find(sub.name, seat.name);
      const c = curves[i] as MeasuredCurve;
      const path = `measurements.${i}.measurementId`;
      if (!c.phaseDeg) throw invalid(`${path}: ${sub.name} at ${seat.name} has no phase. Seat balance adds the subs at each seat, which needs measured phase from one timing reference; a minimum-phase estimate is wrong for room modes.`, [{ path, message: 'has no phase' }]);
      try {
        return measuredSeatTransfer({ frequencyHz: c.frequencyHz, magnitudeDb: c.magnitudeDb, phaseDeg: c.phaseDeg, targetHz: frequencyHz });
      } catch (e) {
        const why = e instanceof Error ? e.message : 'cannot be read';
        throw invalid(`${path}: ${sub.name} at ${seat.name}: ${why} (${grid.startHz}–${grid.stopHz} Hz)`, [{ path, message: why }]);
      }
    }),
  );
  const seats = input.seats.map((s) => ({ name: s.name, weight: s.weight ?? 1 }));
  const present = input.subs.every((s) => s.present) ? input.subs.map((s) => s.present!) : undefined;
  return solve({ frequencyHz, transfers, seats, subs: input.subs.map((s) => ({ name: s.name })), band: input.band, grid, limits: input.limits, seed: input.seed }, 'measured', { ...(present ? { present } : {}), ...extras });
}
