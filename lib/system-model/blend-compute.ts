/**
 * The compute behind POST /api/v1/blend and /api/v1/crossover-sweep: validated request → dsp →
 * JSON-ready answer (plain arrays, rounded). No mathematics of its own beyond choosing which
 * paths are "mains" and "sub" for the read-outs and turning a relative delay into processor
 * settings (positive delays only).
 */
import { arrivalTimeMs, blendMetrics, blendResponse, crossoverSweep, logFrequencyGridHz, speedOfSoundMps, type FilterShape, type PathSpec } from '@/dsp';
import { DEFAULT_SWEEP_CANDIDATES_HZ, type BlendRequest, type CrossoverSweepRequest } from '@/lib/validations/compute-blend';
import { compareSweepRows } from './blend-sweep';

export { compareSweepRows };

/** Rounds to `decimals` places (keeps −300 dB silence and integers exact; bodies stay small). */
export function roundTo(value: number, decimals: number): number {
  const k = 10 ** decimals;
  return Math.round(value * k) / k;
}

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
  /** Signed largest deviation of the sum from the reference within ±1 octave of the crossover. */
  maxDeviationDb: number;
  maxDeviationHz: number;
  peakToPeakDb: number;
  deepestDipDb: number;
  deepestDipHz: number;
  /** System −3 dB point (low end); null when the sum is still above it at the grid's bottom. */
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
    metrics = {
      crossoverHz: roundTo(m.crossoverHz, 3),
      crossoverSource: choice.source,
      mainsPath: choice.mainsIndex,
      subPath: choice.subIndex,
      pathLevelsDb: m.pathLevelsDb.map((v) => roundTo(v, 3)),
      sumLevelDb: roundTo(m.sumLevelDb, 3),
      phaseDifferenceDeg: choice.subIndex === null ? null : maybe(m.phaseDifferenceDeg, 2),
      referenceHz: roundTo(m.referenceHz, 3),
      referenceLevelDb: roundTo(m.referenceLevelDb, 3),
      maxDeviationDb: roundTo(m.maxDeviationDb, 3),
      maxDeviationHz: roundTo(m.maxDeviationHz, 2),
      peakToPeakDb: roundTo(m.peakToPeakDb, 3),
      deepestDipDb: roundTo(m.deepestDipDb, 3),
      deepestDipHz: roundTo(m.deepestDipHz, 2),
      minus3DbHz: maybe(m.minus3DbHz, 2),
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
  crossoverHz: number;
  mainsFilter: FilterShape;
  subFilter: FilterShape;
  /** Largest |sum − reference| within ±1 octave at the best delay and polarity, dB (lower is flatter). */
  flatnessDb: number;
  deepestDipDb: number;
  dipHz: number;
  /** How much later the sub's sound should arrive than the mains' at the listener, ms (negative: earlier). */
  relativeDelayMs: number;
  /** Processor settings for the given distances (only positive delays: one of the two is 0). */
  subDelayMs: number;
  mainsDelayMs: number;
  invertSub: boolean;
  /** Mains level one octave below the crossover relative to two octaves above it, dB (how much low bass the mains still carry). */
  mainsLowBassDb: number;
}

export interface CrossoverSweepAnswer {
  speedOfSoundMps: number;
  /** Sub arrival minus mains arrival from the given distances, ms. */
  arrivalDifferenceMs: number;
  candidatesHz: number[];
  rows: CrossoverSweepAnswerRow[];
}

/** Processor delays (both ≥ 0) that make the sub lag the mains by relativeDelayMs at the listener, given its arrival lag. */
export function processorDelays(relativeDelayMs: number, arrivalDifferenceMs: number): { subDelayMs: number; mainsDelayMs: number } {
  const sub = relativeDelayMs - arrivalDifferenceMs;
  return { subDelayMs: Math.max(0, sub), mainsDelayMs: Math.max(0, -sub) };
}

export function computeCrossoverSweep(req: CrossoverSweepRequest): CrossoverSweepAnswer {
  const candidatesHz = [...(req.candidatesHz ?? DEFAULT_SWEEP_CANDIDATES_HZ)];
  const arrivalDifferenceMs =
    arrivalTimeMs({ distanceM: req.subDistanceM, temperatureC: req.temperatureC }) - arrivalTimeMs({ distanceM: req.mainsDistanceM, temperatureC: req.temperatureC });
  const rows: Omit<CrossoverSweepAnswerRow, 'rank'>[] = [];
  req.pairings.forEach((pairing) => {
    const { rows: r } = crossoverSweep({
      temperatureC: req.temperatureC,
      mainsRolloff: req.mainsRolloff,
      subRolloff: req.subRolloff,
      mainsFilter: pairing.mainsFilter,
      subFilter: pairing.subFilter,
      candidatesHz,
      delaySearch: { maxDelayMs: req.maxDelayMs },
      mainsGainDb: req.mainsGainDb,
      subGainDb: req.subGainDb,
    });
    for (const row of r) {
      const relativeDelayMs = row.bestSubDelayMs - row.bestMainsDelayMs;
      const settings = processorDelays(relativeDelayMs, arrivalDifferenceMs);
      rows.push({
        crossoverHz: row.crossoverHz,
        mainsFilter: { ...pairing.mainsFilter },
        subFilter: { ...pairing.subFilter },
        flatnessDb: roundTo(row.flatnessDb, 3),
        deepestDipDb: roundTo(row.deepestDipDb, 3),
        dipHz: roundTo(row.dipHz, 2),
        relativeDelayMs: roundTo(relativeDelayMs, 3),
        subDelayMs: roundTo(settings.subDelayMs, 3),
        mainsDelayMs: roundTo(settings.mainsDelayMs, 3),
        invertSub: row.invertSub,
        mainsLowBassDb: roundTo(row.mainsLowBassDb, 2),
      });
    }
  });
  rows.sort(compareSweepRows);
  return {
    speedOfSoundMps: roundTo(speedOfSoundMps(req.temperatureC), 3),
    arrivalDifferenceMs: roundTo(arrivalDifferenceMs, 3),
    candidatesHz,
    rows: rows.map((r, i) => ({ rank: i + 1, ...r })),
  };
}
