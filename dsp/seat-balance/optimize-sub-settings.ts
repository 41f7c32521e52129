import { assertFinite, assertIntegerInRange, assertNonNegative } from '../internal/guards';
import { seededRandom } from '../internal/seeded-random';
import type { SeatBalanceEvaluator, SeatBalanceScore } from './seat-balance-evaluator';
import { SEAT_BALANCE_DEFAULT_LIMITS, SEAT_BALANCE_RESOLUTION, type SeatBalanceLimits, type SeatBalanceMeasures, type SubSetting } from './seat-balance-types';

/** Options of {@link optimizeSubSettings}. The output floor is the evaluator's. */
export interface OptimizeSubSettingsOptions {
  readonly evaluator: SeatBalanceEvaluator;
  readonly limits?: Partial<Omit<SeatBalanceLimits, 'maxOutputLossDb'>>;
  /** Seed of the search's random draws (default 1): the same seed gives the same answer. */
  readonly seed?: number;
  /**
   * Budget in full-band evaluations (default 6000 + 6000 per sub); the global stage's coarse evaluations, on every third
   * band point, count a third each.
   */
  readonly maxEvaluations?: number;
  /** Settings the answer must be at least as good as when they keep the limits (the System's present ones). */
  readonly starts?: readonly (readonly SubSetting[])[];
  /** Called after each stage of the search with the evaluations so far and the budget. */
  readonly onProgress?: (done: number, budget: number) => void;
}

/** Result of {@link optimizeSubSettings}. */
export interface OptimizeSubSettingsResult {
  /** One setting per sub, in the evaluator's order, rounded to SEAT_BALANCE_RESOLUTION. */
  readonly settings: SubSetting[];
  /** Every sub at 0 ms, 0 dB, normal polarity. */
  readonly before: SeatBalanceMeasures;
  /** The answer's settings, measured after rounding. */
  readonly after: SeatBalanceMeasures;
  /** Candidate settings evaluated (the global stage's coarse ones included). */
  readonly evaluated: number;
  /** Where the answer came from: the search, the neutral settings (nothing better found) or one of `starts`. */
  readonly source: 'search' | 'neutral' | 'start';
}

const NEUTRAL = { delayMs: 0, gainDb: 0, invert: false } as const;
const INFEASIBLE = 1e3;

/** Normalised limits, checked. */
function checkedLimits(limits: OptimizeSubSettingsOptions['limits']): Omit<SeatBalanceLimits, 'maxOutputLossDb'> {
  const l = { ...SEAT_BALANCE_DEFAULT_LIMITS, ...limits };
  assertNonNegative('limits.maxDelayMs', l.maxDelayMs);
  assertFinite('limits.minGainDb', l.minGainDb);
  assertFinite('limits.maxGainDb', l.maxGainDb);
  if (l.minGainDb > 0 || l.maxGainDb < 0) throw new RangeError('limits.minGainDb…maxGainDb must include 0 dB');
  return l;
}

/**
 * The subs in a canonical order (by their power at each seat over the band, seat by seat), so the answer does not
 * depend on the order the subs were listed in: swapping two subs swaps their settings.
 */
function canonicalOrder(evaluator: SeatBalanceEvaluator): number[] {
  const n = evaluator.subCount;
  const keys = Array.from({ length: n }, (_, s) =>
    evaluator.measure(Array.from({ length: n }, (__, t) => (t === s ? NEUTRAL : { delayMs: 0, gainDb: -300, invert: false }))).meanLevelDb,
  );
  return keys.map((_, i) => i).sort((a, b) => (keys[a] as number) - (keys[b] as number) || a - b);
}

/**
 * Per-sub delay, gain and polarity that make the seats most alike: minimises the mean seat-to-seat spread over the
 * band (the evaluator's objective; room-response's meanSpreadDb) while the seats' mean level stays within the output
 * floor of every sub in phase at 0 ms / 0 dB (Welti & Devantier, JAES 54(5), 2006: several subs with individual
 * delay, gain and polarity reduce seat-to-seat variation). A seeded differential-evolution stage over the whole box
 * (Storn & Price 1997, DE/rand/1/bin with dither), measured on every third band point so it can look three times as
 * far for the same work, finds the valleys; its final population is re-measured on the full band and a pattern search
 * (Hooke & Jeeves 1961) with polarity flips refines the best three. Three such restarts with fresh draws; the best wins
 * (over five fixture rooms and eight seeds it lands within 0.05 dB of scipy's far longer search). The answer is rounded to a processor's steps, its common delay removed, its gains moved
 * down together where the floor allows, and then measured; it is never worse than the neutral settings or any of
 * `starts` that keep the limits.
 * @example optimizeSubSettings({ evaluator: seatBalanceEvaluator({ frequencyHz, transfers, startHz: 20, stopHz: 120 }) }).after.meanSpreadDb
 */
export function optimizeSubSettings(options: OptimizeSubSettingsOptions): OptimizeSubSettingsResult {
  const { evaluator, onProgress } = options;
  const limits = checkedLimits(options.limits);
  const n = evaluator.subCount;
  const budget = options.maxEvaluations ?? 6000 + 6000 * n;
  assertIntegerInRange('maxEvaluations', budget, 1, 10_000_000);
  const random = seededRandom(options.seed ?? 1);
  const order = canonicalOrder(evaluator);
  const floor = evaluator.maxOutputLossDb;
  const neutral = Array.from({ length: n }, () => NEUTRAL);
  const before = evaluator.measure(neutral);

  // Packed candidate in canonical order: [delays…, gains…, polarity…] (polarity ≥ 0.5 = inverted).
  const dims = 3 * n;
  const lower = new Float64Array(dims);
  const upper = new Float64Array(dims);
  for (let c = 0; c < n; c++) {
    upper[c] = limits.maxDelayMs;
    lower[n + c] = limits.minGainDb;
    upper[n + c] = limits.maxGainDb;
    // The first sub keeps normal polarity: inverting every sub changes no level.
    upper[2 * n + c] = limits.allowInvert && c > 0 ? 1 : 0;
  }
  const delays = new Float64Array(n);
  const gains = new Float64Array(n);
  const inverts = new Uint8Array(n);
  const out: SeatBalanceScore = { objectiveDb: 0, meanLevelDb: 0 };
  let evaluated = 0;
  // Budget in full-band evaluations: a coarse one (every third band point) costs a third.
  let work = 0;
  // Two subs search fast on the full band; from three subs on, the coarse stage earns its keep.
  const stride = n >= 3 && evaluator.bandHz.length >= 36 ? 3 : 1;
  const coarseEvaluator = stride > 1 ? evaluator.coarse(stride) : evaluator;
  const scoreWith = (ev: SeatBalanceEvaluator, x: Float64Array): number => {
    for (let c = 0; c < n; c++) {
      const s = order[c] as number;
      delays[s] = x[c] as number;
      gains[s] = x[n + c] as number;
      inverts[s] = (x[2 * n + c] as number) >= 0.5 ? 1 : 0;
    }
    ev.score(delays, gains, inverts, out);
    evaluated++;
    const loss = -out.meanLevelDb - floor;
    return loss > 1e-9 ? INFEASIBLE + loss : out.objectiveDb;
  };
  const coarseFitness = (x: Float64Array): number => {
    work += 1 / stride;
    return scoreWith(coarseEvaluator, x);
  };
  const fitness = (x: Float64Array): number => {
    work++;
    return scoreWith(evaluator, x);
  };
  const toSettings = (x: Float64Array): SubSetting[] => {
    const settings: SubSetting[] = new Array(n);
    for (let c = 0; c < n; c++) settings[order[c] as number] = { delayMs: x[c] as number, gainDb: x[n + c] as number, invert: (x[2 * n + c] as number) >= 0.5 };
    return settings;
  };
  const fromSettings = (settings: readonly SubSetting[]): Float64Array => {
    const x = new Float64Array(dims);
    for (let c = 0; c < n; c++) {
      const s = settings[order[c] as number] as SubSetting;
      x[c] = s.delayMs;
      x[n + c] = s.gainDb;
      x[2 * n + c] = s.invert ? 1 : 0;
    }
    return x;
  };
  const inBox = (x: Float64Array): boolean => x.every((v, j) => v >= (lower[j] as number) - 1e-9 && v <= (upper[j] as number) + 1e-9);

  // Starts that keep the limits, moved to canonical form (common delay out; inverting all subs changes nothing).
  const starts = (options.starts ?? [])
    .filter((s) => s.length === n)
    .map((s) => canonicalSettings(s, order))
    .map(fromSettings)
    .filter(inBox);

  let best = fromSettings(neutral);
  let bestFit = fitness(best);
  if (n > 1 && budget > 1) {
    // Independent restarts, each a global stage and a local one: the landscape has many valleys of similar depth.
    // With the coarse stage three restarts reach far enough; on the full band (two subs) four shorter ones do.
    const restarts = Math.max(1, Math.min(stride > 1 ? 3 : 4, Math.floor(budget / 2000)));
    const per = Math.floor(budget / restarts);
    for (let r = 0; r < restarts; r++) {
      const found = search(work + per);
      if (found.fit < bestFit) {
        best = found.x;
        bestFit = found.fit;
      }
    }
  }
  onProgress?.(budget, budget);

  // Round, take out the common delay, lower the gains together where the limits and floor allow; then measure.
  const candidates: { settings: SubSetting[]; source: OptimizeSubSettingsResult['source'] }[] = [
    { settings: finish(toSettings(best)), source: 'search' },
    // A start is compared as it is (already canonical): the answer may keep the present settings unrounded.
    ...starts.map((x) => ({ settings: toSettings(x), source: 'start' as const })),
    { settings: neutral.map((s) => ({ ...s })), source: 'neutral' },
  ];
  let chosen = candidates[candidates.length - 1] as (typeof candidates)[number];
  let chosenMeasures = before;
  for (const c of candidates) {
    const m = evaluator.measure(c.settings);
    if (m.withinFloor && m.objectiveDb < chosenMeasures.objectiveDb - 1e-12) {
      chosen = c;
      chosenMeasures = m;
    }
  }
  return { settings: chosen.settings, before, after: chosenMeasures, evaluated, source: chosen.source };

  function finish(settings: SubSetting[]): SubSetting[] {
    const rounded = settings.map((s) => ({
      delayMs: roundWithin(s.delayMs, 0, limits.maxDelayMs, SEAT_BALANCE_RESOLUTION.delayMs),
      gainDb: roundWithin(s.gainDb, limits.minGainDb, limits.maxGainDb, SEAT_BALANCE_RESOLUTION.gainDb),
      invert: s.invert,
    }));
    const canonical = keepFloor(canonicalSettings(rounded, order).map((s) => ({ ...s, delayMs: roundStep(s.delayMs, SEAT_BALANCE_RESOLUTION.delayMs) })));
    const top = Math.max(...canonical.map((s) => s.gainDb));
    if (top <= 0) return canonical;
    // Cut rather than boost: the same spread with less amplifier and driver effort, if the floor and limits allow.
    const lowered = canonical.map((s) => ({ ...s, gainDb: roundStep(s.gainDb - top, SEAT_BALANCE_RESOLUTION.gainDb) }));
    if (lowered.some((s) => s.gainDb < limits.minGainDb)) return canonical;
    return evaluator.measure(lowered).withinFloor ? lowered : canonical;
  }

  /**
   * Rounding can take an answer that sits on the output floor to just below it (and the answer would fall back to
   * neutral): raise gains a step at a time until the floor holds — all together while the loudest has room (the spread
   * stays as it is), else the one sub whose step costs the least spread.
   */
  function keepFloor(settings: SubSetting[]): SubSetting[] {
    const step = SEAT_BALANCE_RESOLUTION.gainDb;
    const raise = (x: SubSetting) => ({ ...x, gainDb: roundStep(x.gainDb + step, step) });
    let current = { s: settings, m: evaluator.measure(settings) };
    for (let i = 0; i < 60 && !current.m.withinFloor; i++) {
      const options = [current.s.map(raise), ...current.s.map((_, k) => current.s.map((x, j) => (j === k ? raise(x) : x)))].filter((c) => c.every((x) => x.gainDb <= limits.maxGainDb));
      let next: typeof current | null = null;
      for (const c of options) {
        const m = evaluator.measure(c);
        if (m.meanLevelDb > current.m.meanLevelDb && (!next || m.objectiveDb < next.m.objectiveDb)) next = { s: c, m };
      }
      if (!next) break;
      current = next;
    }
    return current.s;
  }

  function search(stopAt: number): { x: Float64Array; fit: number } {
    const startAt = work;
    // Global stage: differential evolution over the box, seeded with the neutral settings and the starts.
    const population = Math.min(64, Math.max(16, 8 * dims));
    const globalBudget = startAt + Math.floor((stopAt - startAt) * (stride > 1 ? 0.7 : 0.6));
    const xs: Float64Array[] = [];
    const fits: number[] = [];
    const seeds = [fromSettings(neutral), ...starts];
    for (let i = 0; i < population; i++) {
      const x = i < seeds.length ? Float64Array.from(seeds[i] as Float64Array) : new Float64Array(dims);
      if (i >= seeds.length) for (let j = 0; j < dims; j++) x[j] = (lower[j] as number) + random() * ((upper[j] as number) - (lower[j] as number));
      xs.push(x);
      fits.push(coarseFitness(x));
    }
    let bestIndex = fits.indexOf(Math.min(...fits));
    const trial = new Float64Array(dims);
    while (work + population / stride <= globalBudget) {
      const scale = 0.5 + 0.5 * random();
      for (let i = 0; i < population; i++) {
        let r1 = i;
        let r2 = i;
        while (r1 === i) r1 = Math.floor(random() * population);
        while (r2 === i || r2 === r1) r2 = Math.floor(random() * population);
        let r0 = i;
        while (r0 === i || r0 === r1 || r0 === r2) r0 = Math.floor(random() * population);
        const b = xs[r0] as Float64Array;
        const a1 = xs[r1] as Float64Array;
        const a2 = xs[r2] as Float64Array;
        const xi = xs[i] as Float64Array;
        const forced = Math.floor(random() * dims);
        for (let j = 0; j < dims; j++) {
          let v = random() < 0.9 || j === forced ? (b[j] as number) + scale * ((a1[j] as number) - (a2[j] as number)) : (xi[j] as number);
          const lo = lower[j] as number;
          const hi = upper[j] as number;
          if (v < lo || v > hi) v = lo + random() * (hi - lo);
          trial[j] = v;
        }
        const f = coarseFitness(trial);
        if (f <= (fits[i] as number)) {
          xi.set(trial);
          fits[i] = f;
          if (f < (fits[bestIndex] as number)) bestIndex = i;
        }
      }
      onProgress?.(Math.min(work, budget), budget);
      const spreadOfFits = Math.max(...fits) - Math.min(...fits);
      if (spreadOfFits < 1e-6) break;
    }
    // Local stage: pattern search with polarity flips from the best few distinct members.
    // The coarse measure found the valleys; the full band decides which are deepest.
    if (stride > 1) for (let i = 0; i < population; i++) fits[i] = fitness(xs[i] as Float64Array);
    bestIndex = fits.indexOf(Math.min(...fits));
    const ranked = fits.map((f, i) => [f, i] as const).sort((p, q) => p[0] - q[0]);
    let best: { x: Float64Array; fit: number } = { x: Float64Array.from(xs[bestIndex] as Float64Array), fit: fits[bestIndex] as number };
    const startsLocal = ranked.slice(0, 3).map(([, i]) => xs[i] as Float64Array);
    const share = Math.floor((stopAt - work) / startsLocal.length);
    for (const start of startsLocal) {
      const refined = patternSearch(Float64Array.from(start), work + share);
      if (refined.fit < best.fit) best = refined;
      onProgress?.(Math.min(work, budget), budget);
    }
    return best;
  }

  function patternSearch(x: Float64Array, stopAt: number): { x: Float64Array; fit: number } {
    let fit = fitness(x);
    let delayStep = Math.max(limits.maxDelayMs / 20, SEAT_BALANCE_RESOLUTION.delayMs);
    let gainStep = Math.max((limits.maxGainDb - limits.minGainDb) / 18, SEAT_BALANCE_RESOLUTION.gainDb);
    const probe = new Float64Array(dims);
    while (work < stopAt) {
      let improved = false;
      for (let j = 0; j < dims && work < stopAt; j++) {
        const lo = lower[j] as number;
        const hi = upper[j] as number;
        if (hi === lo) continue;
        const moves = j >= 2 * n ? [(x[j] as number) >= 0.5 ? 0 : 1] : [(j < n ? delayStep : gainStep), -(j < n ? delayStep : gainStep)].map((d) => (x[j] as number) + d);
        for (const v of moves) {
          if (v < lo || v > hi) continue;
          probe.set(x);
          probe[j] = v;
          const f = fitness(probe);
          if (f < fit - 1e-12) {
            x.set(probe);
            fit = f;
            improved = true;
            break;
          }
        }
      }
      if (!improved) {
        if (delayStep <= SEAT_BALANCE_RESOLUTION.delayMs / 2 && gainStep <= SEAT_BALANCE_RESOLUTION.gainDb / 2) break;
        delayStep /= 2;
        gainStep /= 2;
      }
    }
    return { x, fit };
  }
}

function clamp(v: number, lo: number, hi: number): number {
  return Math.min(hi, Math.max(lo, v));
}

/** The nearest step to `value` inside lo…hi (a limit off the steps, e.g. 2.97 dB, rounds inward: 2.9, not 3.0). */
function roundWithin(value: number, lo: number, hi: number, step: number): number {
  let r = roundStep(clamp(value, lo, hi), step);
  while (r > hi) r = roundStep(r - step, step);
  while (r < lo) r = roundStep(r + step, step);
  return r;
}

function roundStep(value: number, step: number): number {
  const decimals = Math.max(0, -Math.floor(Math.log10(step) + 1e-9));
  const r = Number((Math.round(value / step) * step).toFixed(decimals));
  return r === 0 ? 0 : r;
}

/** The same levels with the common delay taken out and the first sub (in canonical order) at normal polarity. */
function canonicalSettings(settings: readonly SubSetting[], order: readonly number[]): SubSetting[] {
  const common = Math.min(...settings.map((s) => s.delayMs));
  const flip = (settings[order[0] as number] as SubSetting).invert;
  return settings.map((s) => ({ delayMs: s.delayMs - common, gainDb: s.gainDb, invert: s.invert !== flip }));
}
