import { compilePath } from '../blend/path-plan';
import { speedOfSoundMps } from '../air/speed-of-sound';
import { alignmentGrid, pathComplex } from '../timing/alignment-grid';
import { bestOfScan, scanRelativeDelay, searchRelativeDelay, type DelayScanInput } from '../timing/delay-scan';
import { ADVICE_RULES, compareAssessments, type AdviceComparison } from './advice-rules';
import { assessBlend, type BlendAssessment } from './blend-assessment';
import { retimeSources, systemPaths, type SystemModel } from './system-model';

/** A change of timing: the moved subs' delay shift (negative: the rest get the delay instead) and polarity flip. */
export interface TimingMove {
  readonly shiftMs: number;
  readonly flip: boolean;
}

/** A move, the system it makes, its assessment and how it compares with the present. */
export interface AssessedMove extends TimingMove {
  readonly model: SystemModel;
  readonly assessment: BlendAssessment;
  readonly comparison: AdviceComparison;
}

/** Flatness against the moved subs' shift, both polarities (what Timing plots). */
export interface FlatnessVersusShift {
  readonly shiftMs: Float64Array;
  readonly normalDb: Float64Array;
  readonly flippedDb: Float64Array;
}

/** Options of {@link searchTiming}. */
export interface TimingSearchOptions {
  /** Largest shift tried either way, ms (default 20). */
  readonly maxShiftMs?: number;
  /** Coarse step, ms (default 0.05; refined around each candidate, then rounded to 0.01 ms). */
  readonly stepMs?: number;
  /** The setting the bass rules compare with (default: the model as it is). */
  readonly baseline?: BlendAssessment;
  /** Scan the whole curve of flatness against shift (default true; false scans only when the flattest gives up bass). */
  readonly withCurve?: boolean;
}

/** Result of {@link searchTiming}. */
export interface TimingSearchResult {
  readonly present: BlendAssessment;
  /** The flattest move that keeps the bass by the baseline, near-equal ones (ADVICE_RULES.nearEqualDb) going to the smallest change. */
  readonly best: AssessedMove;
  /** Every move assessed that keeps the bass, flattest first (always holds the unchanged model unless it breaks the baseline's rules). */
  readonly candidates: readonly AssessedMove[];
  /** The flattest move of all, even when it gives up bass (reported, never recommended). */
  readonly flattest: { readonly shiftMs: number; readonly flip: boolean; readonly flatnessDb: number };
  /** Flatness against shift; null when the search did not need the whole curve (withCurve false). */
  readonly curve: FlatnessVersusShift | null;
}

const round2 = (v: number): number => {
  const r = Math.round(v * 100) / 100;
  return r === 0 ? 0 : r;
};

/** The complex sum of some of a model's paths on the alignment grid. */
function groupComplex(model: SystemModel, members: readonly number[], omega: Float64Array): { re: Float64Array; im: Float64Array } {
  const speed = speedOfSoundMps(model.temperatureC);
  const paths = systemPaths(model);
  const re = new Float64Array(omega.length);
  const im = new Float64Array(omega.length);
  for (const m of members) {
    const c = pathComplex(compilePath(paths[m]!, speed, `paths[${m}]`), omega);
    for (let i = 0; i < omega.length; i++) {
      re[i] = (re[i] as number) + (c.re[i] as number);
      im[i] = (im[i] as number) + (c.im[i] as number);
    }
  }
  return { re, im };
}

/**
 * Searches the delay and polarity of some subs (`moved`, indices into model.subs) against the rest of the system
 * (the main channel and the other subs), judged by the one flatness measure of the whole system. The scan over
 * shifts is the fast search (|A ± B·e^(−jωd)|² on the flatness band); every candidate it proposes — the flattest
 * shift and the best local minimum of each polarity — is then applied to the model, rounded to 0.01 ms as a
 * processor takes it, and assessed with assessBlend; the flattest one that keeps the bass (ADVICE_RULES) wins,
 * near-equal ones going to the smallest shift, then to no flip. The present setting is always a candidate.
 * @example searchTiming(model, [0]).best.shiftMs
 */
export function searchTiming(model: SystemModel, moved: readonly number[], options: TimingSearchOptions = {}): TimingSearchResult {
  const maxShiftMs = options.maxShiftMs ?? 20;
  const stepMs = options.stepMs ?? 0.05;
  if (!(maxShiftMs > 0 && maxShiftMs <= 1000)) throw new RangeError(`maxShiftMs must be above 0 and at most 1000 (got ${maxShiftMs})`);
  if (!(stepMs > 0) || maxShiftMs / stepMs > 100_000) throw new RangeError(`stepMs must be above 0 and give at most 100000 steps (got ${stepMs})`);
  if (moved.length === 0 || moved.some((k) => !Number.isInteger(k) || k < 0 || k >= model.subs.length)) throw new RangeError('moved must name subs of the model');
  const movedSet = new Set(moved);
  const present = assessBlend({ temperatureC: model.temperatureC, paths: systemPaths(model), crossoverHz: model.crossoverHz });
  const baseline = options.baseline ?? present;
  const grid = alignmentGrid(model.crossoverHz);
  const rest = [0, ...model.subs.map((_, k) => k).filter((k) => !movedSet.has(k)).map((k) => k + 1)];
  const a = groupComplex(model, rest, grid.omega);
  const b = groupComplex(model, moved.map((k) => k + 1), grid.omega);
  const input: DelayScanInput = { omega: grid.omega, aRe: a.re, aIm: a.im, bRe: b.re, bIm: b.im, bandCount: grid.bandCount, refIndex: grid.refIndex, crossoverIndex: grid.crossoverIndex };
  const stepS = stepMs / 1000;
  const maxS = maxShiftMs / 1000;
  const flattestScan = searchRelativeDelay(input, maxS, stepS, false).best;
  const half = Math.round(maxS / stepS);
  let curve: FlatnessVersusShift | null = null;
  const proposals: TimingMove[] = [{ shiftMs: 0, flip: false }, { shiftMs: round2(flattestScan.delayS * 1000), flip: flattestScan.flipped }];
  const addMinima = (): void => {
    // The curve a user sees, and its local minima: what to try when the flattest gives up bass, or a smaller change.
    const scan = scanRelativeDelay(input, -half * stepS, stepS, 2 * half + 1, false);
    curve = { shiftMs: Float64Array.from(scan.delayS, (d) => d * 1000), normalDb: scan.flatnessSameDb, flippedDb: scan.flatnessFlippedDb };
    const minima: { shiftS: number; flip: boolean; value: number }[] = [];
    for (const flip of [false, true]) {
      const v = flip ? scan.flatnessFlippedDb : scan.flatnessSameDb;
      for (let k = 0; k < v.length; k++) {
        const here = v[k] as number;
        if ((k === 0 || here <= (v[k - 1] as number)) && (k === v.length - 1 || here < (v[k + 1] as number))) minima.push({ shiftS: scan.delayS[k] as number, flip, value: here });
      }
    }
    minima.sort((p, q) => p.value - q.value);
    for (const m of minima.slice(0, 12)) {
      // Refine ±1 coarse step, then round as a processor takes it.
      const fine = bestOfScan(scanRelativeDelay(input, m.shiftS - stepS, (2 * stepS) / 40, 41, false));
      proposals.push({ shiftMs: round2((m.flip === fine.flipped ? fine.delayS : m.shiftS) * 1000), flip: m.flip });
    }
  };
  const seen = new Set<string>();
  const candidates: AssessedMove[] = [];
  const assessProposals = (): void => {
    for (const p of proposals) {
      const key = `${p.shiftMs}|${p.flip}`;
      if (seen.has(key) || Math.abs(p.shiftMs) > maxShiftMs + 1e-9) continue;
      seen.add(key);
      const changes = model.subs.map((_, k) => (movedSet.has(k) ? p : { shiftMs: 0, flip: false }));
      const next = retimeSources(model, changes);
      const assessment = assessBlend({ temperatureC: next.temperatureC, paths: systemPaths(next), crossoverHz: next.crossoverHz });
      const comparison = compareAssessments(baseline, assessment);
      if (comparison.keepsBass) candidates.push({ ...p, model: next, assessment, comparison });
    }
  };
  if (options.withCurve !== false) addMinima();
  assessProposals();
  const flattestKept = candidates.some((c) => c.shiftMs === round2(flattestScan.delayS * 1000) && c.flip === flattestScan.flipped);
  if (options.withCurve === false && !flattestKept) {
    addMinima();
    assessProposals();
  }
  candidates.sort((p, q) => p.assessment.flatnessDb - q.assessment.flatnessDb);
  const flattestDb = candidates[0]?.assessment.flatnessDb ?? present.flatnessDb;
  const best = smallestChange(candidates, flattestDb + ADVICE_RULES.nearEqualDb) ?? {
    // Only when the model itself breaks the baseline's bass rules (the sweep's other crossovers): keep it as it is.
    shiftMs: 0,
    flip: false,
    model,
    assessment: present,
    comparison: compareAssessments(baseline, present),
  };
  return { present, best, candidates, flattest: { shiftMs: round2(flattestScan.delayS * 1000), flip: flattestScan.flipped, flatnessDb: flattestScan.flatnessDb }, curve: curve as FlatnessVersusShift | null };
}

/**
 * Among assessed moves no less flat than `ceilingDb`, the smallest change: the least delay moved, then no polarity
 * flip, then the flatter; null when none is that flat.
 */
export function smallestChange<T extends AssessedMove>(candidates: readonly T[], ceilingDb: number): T | null {
  let chosen: T | null = null;
  for (const c of candidates) {
    if (c.assessment.flatnessDb > ceilingDb + 1e-9) continue;
    if (chosen === null || smaller(c, chosen)) chosen = c;
  }
  return chosen;
}

function smaller(p: TimingMove & { assessment: BlendAssessment }, q: TimingMove & { assessment: BlendAssessment }): boolean {
  if (Math.abs(p.shiftMs) !== Math.abs(q.shiftMs)) return Math.abs(p.shiftMs) < Math.abs(q.shiftMs);
  if (p.flip !== q.flip) return !p.flip;
  return p.assessment.flatnessDb < q.assessment.flatnessDb;
}
