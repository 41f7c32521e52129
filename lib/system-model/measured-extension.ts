/**
 * The mains' in-room extension behind POST /api/v1/measured/extension (`computeMeasuredExtension`): one source's curves
 * at one or more seats (several → their spatial average, on a common log grid when their grids differ), the −3/−6/−10 dB
 * points below the mean level over a band, and a crossover judged against them. The mathematics is dsp's.
 */
import { crossoverAgainstExtension, EXTENSION_BAND_DEFAULTS, inRoomExtension, logFrequencyGridHz, resampleCurve, spatialAverageDb, type CrossoverAgainstExtension } from '@/dsp';
import { invalid } from '@/lib/errors';
import type { ExtensionRequest } from '@/lib/validations/measured-extension';
import { roundAllTo, roundAllToSignificant, roundTo, roundToSignificant } from './rounding';

/** The magnitude of one seat's curve, as stored or sent inline. */
export interface ExtensionCurvePoints {
  name?: string;
  frequencyHz: readonly number[];
  magnitudeDb: readonly number[];
}

export interface ExtensionAnswer {
  band: { startHz: number; stopHz: number };
  /** Power mean of the analysed curve over the band, dB. */
  meanLevelDb: number;
  /** Where the curve, going down from the band, first falls 3, 6 and 10 dB below the mean; null when it does not within the data. */
  pointsHz: { minus3: number | null; minus6: number | null; minus10: number | null };
  /** How many seats' curves were power-averaged (1: the curve itself). */
  averagedFrom: number;
  /** Each curve's name, in order (given, else "Seat N"). */
  names: string[];
  /** True when the curves' grids differed and each was resampled onto a common log grid before averaging. */
  resampled: boolean;
  /** The lowest frequency of the analysed curve: a null point lies below it. */
  lowestMeasuredHz: number;
  /** The analysed curve: the one curve, or the seats' spatial average. */
  curve: { frequencyHz: number[]; magnitudeDb: number[] };
  crossover?: {
    crossoverHz: number;
    octavesAboveMinus3: number | null;
    octavesAboveMinus6: number | null;
    verdict: CrossoverAgainstExtension['clearance'];
    rule: string;
    /** One sentence: what the verdict means for this crossover. */
    summary: string;
  };
}

/** Points per octave of the common grid curves of different grids are resampled to. */
const COMMON_GRID_POINTS_PER_OCTAVE = 96;

const hz = (v: number) => `${roundTo(v, 1)} Hz`;
const oct = (v: number) => `${Math.abs(v).toFixed(2)} octave${Math.abs(Math.abs(v) - 1) < 0.005 ? '' : 's'}`;
/** "0.63 octaves above" or "1.22 octaves below" (a crossover under the point). */
const side = (v: number) => `${oct(v)} ${v < 0 ? 'below' : 'above'}`;

function sameGrid(curves: readonly ExtensionCurvePoints[]): boolean {
  const first = curves[0]!.frequencyHz;
  return curves.every((c) => c.frequencyHz.length === first.length && c.frequencyHz.every((f, i) => f === first[i]));
}

/** The curve to analyse: the one curve, or the seats' power average (resampled onto a common log grid when grids differ). */
function analysedCurve(curves: readonly ExtensionCurvePoints[]): { frequencyHz: ArrayLike<number>; magnitudeDb: ArrayLike<number>; resampled: boolean } {
  const first = curves[0]!;
  if (curves.length === 1) return { frequencyHz: first.frequencyHz, magnitudeDb: first.magnitudeDb, resampled: false };
  if (sameGrid(curves)) return { frequencyHz: first.frequencyHz, magnitudeDb: spatialAverageDb({ seatsMagnitudeDb: curves.map((c) => c.magnitudeDb) }), resampled: false };
  const startHz = Math.max(...curves.map((c) => c.frequencyHz[0]!));
  const stopHz = Math.min(...curves.map((c) => c.frequencyHz[c.frequencyHz.length - 1]!));
  if (!(stopHz >= 2 * startHz)) {
    throw invalid(`The curves share only ${hz(startHz)}–${hz(stopHz)}; at least an octave in common is needed to average them.`, [
      { path: 'curves', message: `share less than an octave (${hz(startHz)}–${hz(stopHz)})` },
    ]);
  }
  const grid = logFrequencyGridHz({ startHz, stopHz: stopHz * (1 + 1e-12), pointsPerOctave: COMMON_GRID_POINTS_PER_OCTAVE });
  const seats = curves.map((c) => resampleCurve({ frequencyHz: c.frequencyHz, magnitudeDb: c.magnitudeDb, targetHz: grid }).magnitudeDb);
  return { frequencyHz: grid, magnitudeDb: spatialAverageDb({ seatsMagnitudeDb: seats }), resampled: true };
}

function crossoverSummary(crossoverHz: number, verdict: CrossoverAgainstExtension, minus3Hz: number | null, minus6Hz: number | null, lowestHz: number): string {
  const at = `A crossover at ${hz(crossoverHz)}`;
  const { octavesAboveMinus3Db: above3, octavesAboveMinus6Db: above6 } = verdict;
  if (verdict.clearance === 'unknown') return `The −3 dB point lies below the lowest measured frequency (${hz(lowestHz)}); measure lower to judge ${at.toLowerCase()}.`;
  if (above3 === null || minus3Hz === null) return `The mains do not fall 3 dB below their mean down to ${hz(lowestHz)}: ${at.toLowerCase()} is clear of their in-room roll-off.`;
  const six = above6 !== null && minus6Hz !== null ? ` and ${side(above6)} the −6 dB point (${hz(minus6Hz)})` : '';
  const where = `${at} sits ${side(above3)} the in-room −3 dB point (${hz(minus3Hz)})${six}`;
  if (verdict.clearance === 'clear') return `${where}: fine.`;
  return `${where}: too close to the mains’ roll-off; move it up to at least ${hz(minus3Hz * Math.SQRT2)} or let the subs play higher.`;
}

/**
 * The in-room extension of one source from its curves at one or more seats. A band outside the analysed curve's range is
 * refused (400 naming `band`); so are curves sharing less than an octave.
 */
export function computeMeasuredExtension(req: ExtensionRequest, curves: readonly ExtensionCurvePoints[]): ExtensionAnswer {
  const band = req.band ?? { startHz: EXTENSION_BAND_DEFAULTS.bandStartHz, stopHz: EXTENSION_BAND_DEFAULTS.bandStopHz };
  const curve = analysedCurve(curves);
  const lowestHz = curve.frequencyHz[0]!;
  const highestHz = curve.frequencyHz[curve.frequencyHz.length - 1]!;
  if (band.startHz < lowestHz * (1 - 1e-9) || band.stopHz > highestHz * (1 + 1e-9)) {
    const which = curves.length > 1 ? 'The curves share' : 'The curve covers';
    throw invalid(`${which} ${hz(lowestHz)}–${hz(highestHz)}; the band ${hz(band.startHz)}–${hz(band.stopHz)} must lie within it.`, [
      { path: req.band ? 'band' : 'curves', message: `the band ${hz(band.startHz)}–${hz(band.stopHz)} is not within the data (${hz(lowestHz)}–${hz(highestHz)})` },
    ]);
  }
  const ext = inRoomExtension({ frequencyHz: Array.from(curve.frequencyHz), magnitudeDb: Array.from(curve.magnitudeDb), bandStartHz: band.startHz, bandStopHz: band.stopHz });
  const point = (v: number | null) => (v === null ? null : roundTo(v, 2));
  const answer: ExtensionAnswer = {
    band: { startHz: band.startHz, stopHz: band.stopHz },
    meanLevelDb: roundTo(ext.meanLevelDb, 3),
    pointsHz: { minus3: point(ext.minus3DbHz), minus6: point(ext.minus6DbHz), minus10: point(ext.minus10DbHz) },
    averagedFrom: curves.length,
    names: curves.map((c, i) => c.name ?? `Seat ${i + 1}`),
    resampled: curve.resampled,
    lowestMeasuredHz: roundToSignificant(lowestHz, 6),
    curve: { frequencyHz: roundAllToSignificant(curve.frequencyHz, 6), magnitudeDb: roundAllTo(curve.magnitudeDb, 3) },
  };
  if (req.crossoverHz === undefined) return answer;
  const verdict = crossoverAgainstExtension({ crossoverHz: req.crossoverHz, extension: ext, lowestMeasuredHz: lowestHz });
  const octaves = (v: number | null) => (v === null ? null : roundTo(v, 3));
  return {
    ...answer,
    crossover: {
      crossoverHz: req.crossoverHz,
      octavesAboveMinus3: octaves(verdict.octavesAboveMinus3Db),
      octavesAboveMinus6: octaves(verdict.octavesAboveMinus6Db),
      verdict: verdict.clearance,
      rule: verdict.rule,
      summary: crossoverSummary(req.crossoverHz, verdict, ext.minus3DbHz, ext.minus6DbHz, lowestHz),
    },
  };
}

