/**
 * The compute behind POST /api/v1/blend and /api/v1/crossover-sweep: validated request → dsp →
 * JSON-ready answer (plain arrays, rounded). No mathematics of its own beyond choosing which
 * paths are "mains" and "sub" for the read-outs and turning a relative delay into processor
 * settings (positive delays only).
 */
import { assessBlend, blendMetrics, blendResponse, crossoverSweep, FLATNESS_DEFINITION, rankSweepRows, logFrequencyGridHz, speedOfSoundMps, type FilterShape, type PathSpec } from '@/dsp';
import { DEFAULT_SWEEP_CANDIDATES_HZ, type BlendRequest, type CrossoverSweepRequest } from '@/lib/validations/compute-blend';
import { assessmentAnswer, settingsAnswer, type AssessmentAnswer, type SettingsAnswer } from './advice-answer';
import { roundTo } from './rounding';
import { modelFromRequest } from './timing';


function rounded(values: ArrayLike<number>, decimals: number): number[] {
  const k = 10 ** decimals;
  const out = new Array<number>(values.length);
  for (let i = 0; i < values.length; i++) out[i] = Math.round((values[i] as number) * k) / k;
  return out;
}

const maybe = (v: number | null, decimals: number): number | null => (v === null || !Number.isFinite(v) ? null : roundTo(v, decimals));

export interface BlendMetricsAnswer {
  crossoverHz: number;
  /** 'request' when crossoverHz was sent; 'filters' when taken from the paths' corners. */
  crossoverSource: 'request' | 'filters';
  /** Indices of the paths read as mains and sub for the phase difference. */
  mainsPath: number;
  subPath: number | null;
  /** Each path's level at the crossover, dB (same order as `paths`). */
  pathLevelsDb: number[];
  sumLevelDb: number;
  /** Mains phase minus sub phase at the crossover, (−180, 180]; null with one path. */
  phaseDifferenceDeg: number | null;
  referenceHz: number;
  referenceLevelDb: number;
  /** The flatness measure: largest deviation of the sum from its level at 4·fc over fc/2 … 2·fc, dB ≥ 0 (dsp assessBlend). */
  flatnessDb: number;
  /** The same with its sign, and where. */
  maxDeviationDb: number;
  maxDeviationHz: number;
  /** The flatness band, Hz. */
  bandHz: [number, number];
  deepestDipDb: number;
  deepestDipHz: number;
  /** System −3 dB point (low end); null when the sum is still above it at 5 Hz. */
  minus3DbHz: number | null;
}

export interface BlendAnswer {
  frequencyHz: number[];
  paths: { name: string; magnitudeDb: number[]; phaseDeg: number[] }[];
  sum: { magnitudeDb: number[]; phaseDeg: number[]; groupDelayMs: number[] };
  metrics: BlendMetricsAnswer | null;
}

/**
 * Which paths are the mains and the sub, and the crossover the metrics are read at:
 * mains = the first high-pass path (else path 0), sub = the first low-pass path (else the next
 * path); crossoverHz = the request's, else the geometric mean of those two corners (the corner
 * itself when only one of them is filtered), else none.
 */
export function blendCrossover(req: Pick<BlendRequest, 'paths' | 'crossoverHz'>): { crossoverHz: number | null; source: 'request' | 'filters'; mainsIndex: number; subIndex: number | null } {
  const hi = req.paths.findIndex((p) => p.filter.response === 'highpass');
  const lo = req.paths.findIndex((p) => p.filter.response === 'lowpass');
  const mainsIndex = hi >= 0 ? hi : 0;
  let subIndex: number | null = lo >= 0 && lo !== mainsIndex ? lo : null;
  if (subIndex === null && req.paths.length > 1) subIndex = mainsIndex === 0 ? 1 : 0;
  if (req.crossoverHz !== undefined) return { crossoverHz: req.crossoverHz, source: 'request', mainsIndex, subIndex };
  const hiHz = hi >= 0 ? req.paths[hi]?.filter.cornerHz : undefined;
  const loHz = lo >= 0 ? req.paths[lo]?.filter.cornerHz : undefined;
  const crossoverHz = hiHz !== undefined && loHz !== undefined ? Math.sqrt(hiHz * loHz) : (hiHz ?? loHz ?? null);
  return { crossoverHz, source: 'filters', mainsIndex, subIndex };
}

export function computeBlend(req: BlendRequest): BlendAnswer {
  const frequencyHz = logFrequencyGridHz(req.grid);
  const paths: PathSpec[] = req.paths;
  const result = blendResponse({ temperatureC: req.temperatureC, frequencyHz, paths });
  const choice = blendCrossover(req);
  let metrics: BlendMetricsAnswer | null = null;
  const fLow = frequencyHz[0] as number;
  const fHigh = frequencyHz[frequencyHz.length - 1] as number;
  if (choice.crossoverHz !== null && choice.crossoverHz >= fLow && choice.crossoverHz <= fHigh) {
    const m = blendMetrics(result, { crossoverHz: choice.crossoverHz, mainsIndex: choice.mainsIndex, subIndex: choice.subIndex ?? choice.mainsIndex });
    // Flatness, dip and −3 dB point: the one assessment every screen and piece of advice uses (not this plot's grid).
    const a = assessBlend({ temperatureC: req.temperatureC, paths, crossoverHz: choice.crossoverHz });
    metrics = {
      crossoverHz: roundTo(m.crossoverHz, 3),
      crossoverSource: choice.source,
      mainsPath: choice.mainsIndex,
      subPath: choice.subIndex,
      pathLevelsDb: m.pathLevelsDb.map((v) => roundTo(v, 3)),
      sumLevelDb: roundTo(m.sumLevelDb, 3),
      phaseDifferenceDeg: choice.subIndex === null ? null : maybe(m.phaseDifferenceDeg, 2),
      referenceHz: roundTo(a.referenceHz, 3),
      referenceLevelDb: roundTo(a.referenceLevelDb, 3),
      flatnessDb: roundTo(a.flatnessDb, 2),
      maxDeviationDb: roundTo(a.maxDeviationDb, 2),
      maxDeviationHz: roundTo(a.maxDeviationHz, 1),
      bandHz: [roundTo(a.bandHz[0], 1), roundTo(a.bandHz[1], 1)],
      deepestDipDb: roundTo(a.deepestDipDb, 2),
      deepestDipHz: roundTo(a.deepestDipHz, 1),
      minus3DbHz: maybe(a.minus3DbHz, 1),
    };
  }
  return {
    // 0.001 Hz, 0.001 dB, 0.01°, 1 µs: finer than any plot or read-out needs, and short to send.
    frequencyHz: rounded(result.frequencyHz, 3),
    paths: result.paths.map((p) => ({ name: p.name, magnitudeDb: rounded(p.magnitudeDb, 3), phaseDeg: rounded(p.phaseDeg, 2) })),
    sum: { magnitudeDb: rounded(result.sum.magnitudeDb, 3), phaseDeg: rounded(result.sum.phaseDeg, 2), groupDelayMs: rounded(result.sum.groupDelayMs, 3) },
    metrics,
  };
}

export interface CrossoverSweepAnswerRow {
  rank: number;
  /** The present setting, unchanged. */
  present: boolean;
  crossoverHz: number;
  mainsFilter: FilterShape;
  subFilter: FilterShape;
  /** Every sub's delay moved by this, ms (negative: the mains get the delay instead); 0 on the present row. */
  shiftMs: number;
  /** Every sub's polarity flipped. */
  flip: boolean;
  /** The processor delays and polarities this row runs. */
  set: SettingsAnswer;
  /** The flatness measure at this row's setting, dB (as assessment.flatnessDb). */
  flatnessDb: number;
  /** The whole system at this row's setting (the flatness measure, dip, −3 dB point). */
  assessment: AssessmentAnswer;
  /** Against the present setting: flatness gained, −3 dB point moved up (octaves), bass below the crossover lost (dB). */
  gainDb: number;
  extensionLossOctaves: number;
  bassCutDb: number;
  /** Keeps the −3 dB point within a third of an octave and the bass within 1 dB of the present setting. */
  keepsBass: boolean;
  /** The crossover is below the mains' own −3 dB point plus half an octave. */
  nearMainsRolloff: boolean;
  /** Worth changing to (ranked above the present row). */
  worthIt: boolean;
  /** Mains level one octave below the crossover relative to two octaves above it, dB (how much low bass the mains still carry). */
  mainsLowBassDb: number;
}

export interface CrossoverSweepAnswer {
  speedOfSoundMps: number;
  flatness: { definition: string };
  /** The mains' own −3 dB point from their roll-off, and the lowest crossover clear of it (+ half an octave), Hz. */
  mainsMinus3DbHz: number | null;
  lowestClearHz: number | null;
  candidatesHz: number[];
  rows: CrossoverSweepAnswerRow[];
}

export function computeCrossoverSweep(req: CrossoverSweepRequest): CrossoverSweepAnswer {
  const candidatesHz = [...(req.candidatesHz ?? DEFAULT_SWEEP_CANDIDATES_HZ)];
  const r = crossoverSweep({ model: modelFromRequest(req), pairings: req.pairings, candidatesHz, maxShiftMs: req.maxDelayMs });
  return {
    speedOfSoundMps: roundTo(speedOfSoundMps(req.temperatureC), 3),
    flatness: { definition: FLATNESS_DEFINITION.text },
    mainsMinus3DbHz: r.mainsMinus3DbHz === null ? null : roundTo(r.mainsMinus3DbHz, 1),
    lowestClearHz: r.lowestClearHz === null ? null : roundTo(r.lowestClearHz, 1),
    candidatesHz,
    // Ranked again on the rounded figures the answer shows, with the same rule the editor uses to merge partial answers.
    rows: rankSweepRows(
      r.rows.map((row) => ({
      rank: row.rank,
      present: row.present,
      crossoverHz: row.crossoverHz,
      mainsFilter: { ...row.mainsFilter },
      subFilter: { ...row.subFilter },
      shiftMs: roundTo(row.shiftMs, 2),
      flip: row.flip,
      set: settingsAnswer(row.model),
      flatnessDb: roundTo(row.assessment.flatnessDb, 2),
      assessment: assessmentAnswer(row.assessment),
      gainDb: roundTo(row.comparison.flatnessGainDb, 2),
      extensionLossOctaves: roundTo(row.comparison.extensionLossOctaves, 3),
      bassCutDb: roundTo(row.comparison.bassCutDb, 2),
      keepsBass: row.comparison.keepsBass,
      nearMainsRolloff: row.nearMainsRolloff,
      worthIt: row.worthIt,
      mainsLowBassDb: roundTo(row.mainsLowBassDb, 2),
      })),
      req.crossoverHz,
    ),
  };
}
