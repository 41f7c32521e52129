/**
 * Blend: the System's request (`blendRequestFromDocument`: the shown main channel and every sub as the paths of the
 * whole-system model) and the compute behind POST /api/v1/blend (`computeBlend`: validated request → dsp → JSON-ready
 * answer, plain arrays, rounded). No mathematics of its own beyond choosing which paths are "mains" and "sub" for the
 * read-outs.
 */
import { assessBlend, blendMetrics, blendResponse, logFrequencyGridHz, systemPaths, type PathSpec } from '@/dsp';
import type { BlendRequest } from '@/lib/validations/compute-blend';
import type { SystemDocument } from '@/lib/validations/system';
import { roundAllTo, roundTo } from './rounding';
import { blendMainSpeaker, systemModelFromDocument } from './system-from-document';

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

export interface BlendRequestBody {
  temperatureC: number;
  grid: { startHz: number; stopHz: number; pointsPerOctave: number };
  paths: PathSpec[];
}

/** The body of POST /api/v1/blend for the System's mains channel and all its subs. */
export function blendRequestFromDocument(doc: SystemDocument, options: { channel?: string; startHz?: number; stopHz?: number; pointsPerOctave?: number } = {}): BlendRequestBody | null {
  const speaker = blendMainSpeaker(doc, options.channel);
  if (!speaker) return null;
  return {
    temperatureC: doc.room.temperatureC,
    grid: { startHz: options.startHz ?? 10, stopHz: options.stopHz ?? 1000, pointsPerOctave: options.pointsPerOctave ?? 48 },
    paths: systemPaths(systemModelFromDocument(doc, speaker.channel)!),
  };
}

const maybe = (v: number | null, decimals: number): number | null => (v === null || !Number.isFinite(v) ? null : roundTo(v, decimals));

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

/** The answer of POST /api/v1/blend: every path and the sum on the request's grid, and the read-outs at the crossover. */
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
    frequencyHz: roundAllTo(result.frequencyHz, 3),
    paths: result.paths.map((p) => ({ name: p.name, magnitudeDb: roundAllTo(p.magnitudeDb, 3), phaseDeg: roundAllTo(p.phaseDeg, 2) })),
    sum: { magnitudeDb: roundAllTo(result.sum.magnitudeDb, 3), phaseDeg: roundAllTo(result.sum.phaseDeg, 2), groupDelayMs: roundAllTo(result.sum.groupDelayMs, 3) },
    metrics,
  };
}
