/**
 * From the System document to the inputs of dsp/ and of the compute API. Pure and shared by the
 * editor (browser) and the route handlers (server), so a distance changed on Layout is the same
 * distance Timing and Blend use. No mathematics of its own beyond picking fields: geometry comes
 * from dsp/.
 */
import { systemPaths, type PathSpec } from '@/dsp';
import type { SystemDocument } from '@/lib/validations/system';
import { blendMainSpeaker, systemModelFromDocument } from './system-from-document';

export { toPointM, mlpSeat, profileById, distanceToSeatM, geometricDistanceM } from './geometry';
export {
  blendMainSpeaker,
  mainsRolloff,
  subRolloff,
  subRolloffs,
  subLevelMatchDb,
  mainsSource,
  subSource,
  systemModelFromDocument,
  applyTimingToDocument,
  timingSettingsOf,
  type TimingSettings,
} from './system-from-document';
export { systemChannelSettings } from './channel-settings';

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
