/**
 * Lesson frame: one frame of a Lesson Step's plot (`computeLessonFrame`), the System's mains channel and subs summed by
 * dsp/ in the browser (so a sweep can be recomputed every animation frame without a round trip), with the blend
 * read-outs at the crossover. The paths are the whole-system model's (`systemPaths`), the same ones
 * POST /api/v1/blend sums for the document, with phase drawn from the first arrival at the MLP as Blend draws it
 * (`fromFirstArrival`). No request and nothing written back: a frame is computed from the document.
 */
import { assessBlend, blendMetrics, blendResponse, logFrequencyGridHz, roomModes, systemPaths, type BlendAssessment, type BlendMetrics, type BlendResult } from '@/dsp';
import type { SystemDocument } from '@/lib/validations/system';
import { fromFirstArrival } from './first-arrival';
import { distanceToSeatM } from './geometry';
import { systemModelFromDocument } from './system-from-document';

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
export function computeLessonFrame(doc: SystemDocument): LessonFrame | null {
  const model = systemModelFromDocument(doc);
  if (!model) return null;
  const paths = systemPaths(model);
  const temperatureC = doc.room.temperatureC;
  // Phase drawn from the first arrival at the MLP, as Blend draws it (levels and phase differences do not change).
  const result = blendResponse({ temperatureC, frequencyHz: frameGridHz(), paths: fromFirstArrival(paths).paths });
  const crossoverHz = doc.bassManagement.crossoverHz;
  const metrics = paths.length >= 1 ? blendMetrics(result, { crossoverHz, mainsIndex: 0, subIndex: paths.length > 1 ? 1 : 0 }) : null;
  const assessment = paths.length >= 1 ? assessBlend({ temperatureC, paths, crossoverHz }) : null;
  const main = paths[0];
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
