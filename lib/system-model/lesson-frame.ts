/**
 * One frame of a Lesson Step's plot: the System's mains channel and subs summed by dsp/ in the
 * browser (so a sweep can be recomputed every animation frame without a round trip), with the
 * blend read-outs at the crossover. Inputs come from blendRequestFromDocument, so the numbers are
 * the ones POST /api/v1/blend gives for the same document.
 */
import { assessBlend, blendMetrics, blendResponse, logFrequencyGridHz, roomModes, type BlendAssessment, type BlendMetrics, type BlendResult } from '@/dsp';
import type { SystemDocument } from '@/lib/validations/system';
import { blendRequestFromDocument, distanceToSeatM } from './index';

export const FRAME_START_HZ = 10;
export const FRAME_STOP_HZ = 1000;
const POINTS_PER_OCTAVE = 32;

let cachedGrid: Float64Array | null = null;
/** The shared log grid of every frame (10 Hz–1 kHz, 1/32 octave), made once. */
export function frameGridHz(): Float64Array {
  if (!cachedGrid) cachedGrid = logFrequencyGridHz({ startHz: FRAME_START_HZ, stopHz: FRAME_STOP_HZ, pointsPerOctave: POINTS_PER_OCTAVE });
  return cachedGrid;
}

export interface LessonFrame {
  result: BlendResult;
  metrics: BlendMetrics | null;
  /** The one flatness assessment (flatness, dip, −3 dB point) of the same paths. */
  assessment: BlendAssessment | null;
  crossoverHz: number;
  mainsName: string;
  /** Air distance of the mains channel and of each sub to the MLP, m. */
  mainsDistanceM: number;
  subDistancesM: number[];
}

/** The blend of the document's mains channel (L) and all its subs; null when it has no speakers. */
export function lessonFrame(doc: SystemDocument): LessonFrame | null {
  const req = blendRequestFromDocument(doc, { startHz: FRAME_START_HZ, stopHz: FRAME_STOP_HZ, pointsPerOctave: POINTS_PER_OCTAVE });
  if (!req) return null;
  const result = blendResponse({ temperatureC: req.temperatureC, frequencyHz: frameGridHz(), paths: req.paths });
  const crossoverHz = doc.bassManagement.crossoverHz;
  const metrics = req.paths.length >= 1 ? blendMetrics(result, { crossoverHz, mainsIndex: 0, subIndex: req.paths.length > 1 ? 1 : 0 }) : null;
  const assessment = req.paths.length >= 1 ? assessBlend({ temperatureC: req.temperatureC, paths: req.paths, crossoverHz }) : null;
  const main = req.paths[0];
  return {
    result,
    metrics,
    assessment,
    crossoverHz,
    mainsName: main?.name ?? 'mains',
    mainsDistanceM: main?.distanceM ?? 0,
    subDistancesM: doc.subs.map((s) => distanceToSeatM(doc, s)),
  };
}

/** Axial room modes up to `maxHz` (for a Modes step's markers). */
export function axialModesHz(doc: SystemDocument, maxHz = 200): { hz: number; label: string }[] {
  const { modes } = roomModes({ lengthM: doc.room.lengthM, widthM: doc.room.widthM, heightM: doc.room.heightM, maxHz, temperatureC: doc.room.temperatureC });
  return modes.filter((m) => m.kind === 'axial').map((m) => ({ hz: m.frequencyHz, label: m.indices.join(',') }));
}
