/**
 * Compare behind POST /api/v1/measured/compare (`computeMeasuredCompare`): runs of a source shown as differences from a
 * reference run, smoothed, on the range they all cover, levels as measured or matched over a band. The mathematics is
 * dsp's `compareRuns`; here the range checks that name the field, the names and the rounding.
 */
import { compareRuns, COMPARE_MIN_COMMON_OCTAVES } from '@/dsp';
import { invalid } from '@/lib/errors';
import type { CompareRequest } from '@/lib/validations/measured-compare';
import { roundAllTo, roundAllToSignificant, roundTo, roundToSignificant } from './rounding';

/** One run's magnitude, as stored or sent inline, with the name it is shown by. */
export interface CompareRunPoints {
  name: string;
  frequencyHz: readonly number[];
  magnitudeDb: readonly number[];
}

export interface CompareDifference {
  name: string;
  /** (run + levelOffsetDb) − reference on the grid, dB, smoothed as asked. */
  differenceDb: number[];
  /** What was added to the run to match levels over the band, dB (0: levels as measured). */
  levelOffsetDb: number;
  minDb: number;
  maxDb: number;
  /** The difference of largest size (signed) and its frequency. */
  largest: { differenceDb: number; frequencyHz: number };
}

export interface CompareAnswer {
  /** The common log grid, Hz. */
  frequencyHz: number[];
  /** The range every run covers (the grid's ends), Hz. */
  rangeHz: { startHz: number; stopHz: number };
  smoothingFraction: number;
  /** 'as measured' (no level matching) or 'matched' over matchLevelBandHz. */
  levels: 'as measured' | 'matched';
  matchLevelBandHz: { startHz: number; stopHz: number } | null;
  reference: { name: string };
  differences: CompareDifference[];
}

const hz = (v: number) => `${roundToSignificant(v, 4)} Hz`;

/** The runs as differences from the reference. The runs sharing under an octave, or a band outside that range, are refused (400 naming the field). */
export function computeMeasuredCompare(req: CompareRequest, reference: CompareRunPoints, others: readonly CompareRunPoints[]): CompareAnswer {
  const runs = [reference, ...others];
  const startHz = Math.max(...runs.map((r) => r.frequencyHz[0] as number));
  const stopHz = Math.min(...runs.map((r) => r.frequencyHz[r.frequencyHz.length - 1] as number));
  if (!(stopHz >= startHz * 2 ** COMPARE_MIN_COMMON_OCTAVES * (1 - 1e-9))) {
    throw invalid(`The runs share only ${hz(startHz)}–${hz(stopHz)}; at least an octave in common is needed to compare them.`, [
      { path: 'others', message: `share less than an octave with the reference and each other (${hz(startHz)}–${hz(stopHz)})` },
    ]);
  }
  const band = req.matchLevelBandHz;
  if (band && (band.startHz < startHz * (1 - 1e-9) || band.stopHz > stopHz * (1 + 1e-9))) {
    throw invalid(`The runs share ${hz(startHz)}–${hz(stopHz)}; the level-matching band ${hz(band.startHz)}–${hz(band.stopHz)} must lie within it.`, [
      { path: 'matchLevelBandHz', message: `the band ${hz(band.startHz)}–${hz(band.stopHz)} is not within the runs' common range (${hz(startHz)}–${hz(stopHz)})` },
    ]);
  }
  const compared = compareRuns({
    reference,
    others,
    smoothingFraction: req.smoothingFraction,
    pointsPerOctave: req.pointsPerOctave,
    ...(band ? { matchLevelBandHz: band } : {}),
  });
  return {
    frequencyHz: roundAllToSignificant(compared.frequencyHz, 6),
    rangeHz: { startHz: roundToSignificant(compared.startHz, 6), stopHz: roundToSignificant(compared.stopHz, 6) },
    smoothingFraction: req.smoothingFraction,
    levels: band ? 'matched' : 'as measured',
    matchLevelBandHz: band ? { startHz: band.startHz, stopHz: band.stopHz } : null,
    reference: { name: reference.name },
    differences: compared.differences.map((d, k) => ({
      name: (others[k] as CompareRunPoints).name,
      differenceDb: roundAllTo(d.differenceDb, 3),
      levelOffsetDb: roundTo(d.levelOffsetDb, 3),
      minDb: roundTo(d.minDb, 3),
      maxDb: roundTo(d.maxDb, 3),
      largest: { differenceDb: roundTo(d.largestDb, 3), frequencyHz: roundToSignificant(d.largestHz, 6) },
    })),
  };
}
