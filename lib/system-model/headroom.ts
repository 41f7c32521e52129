/**
 * Headroom: the System's request (`headroomRequestFromDocument`: one row per speaker and per sub with its profile, its
 * amplifier and its distance to the MLP) and the compute behind POST /api/v1/headroom (`computeHeadroom`, assembled
 * from dsp/headroom).
 */
import { combinedSplDb, exposureMinutes, headroomCheck, LFE_PEAK_DB, maxSplDb, REFERENCE_LEVEL_DB, REFERENCE_PEAK_DB } from '@/dsp';
import type { HeadroomRequest } from '@/lib/validations/compute-headroom';
import type { SystemDocument } from '@/lib/validations/system';
import { distanceToSeatM, profileById } from './geometry';
import { roundTo, roundToSignificant } from './rounding';

export interface HeadroomRowOut {
  name: string;
  /** Maximum SPL at the binding limit: the amplifier's power, or the speaker's rating when the amplifier is above it. */
  maxSplDb: number;
  /** Maximum SPL with the amplifier's full power. */
  amplifierSplDb: number;
  /** Maximum SPL at the speaker's rated power; null when the profile gives no rating. */
  ratedSplDb: number | null;
  /** Which limit sets maxSplDb (and so the headroom verdict). */
  binding: 'amplifier' | 'speaker';
  /** The power maxSplDb is computed at: min(amplifier, rating), W. */
  usablePowerW: number;
  ratedPowerW: number | null;
  perUnitSplDb: number;
  sensitivity1WDb: number;
  targetPeakDb: number;
  headroomDb: number;
  deficitDb: number;
  meetsTarget: boolean;
  powerW: number;
  powerNeededW: number;
  /** Set when ratedPowerW was given: does the power needed (or the amplifier) exceed the speaker's rating? */
  exceedsRatedPower: boolean | null;
  amplifierAboveRating: boolean | null;
}

export interface HeadroomAnswer {
  referenceLevelDb: number;
  channelTargetPeakDb: number;
  subTargetPeakDb: number;
  channels: HeadroomRowOut[];
  subs: HeadroomRowOut[];
  /** The subs together against the LFE peak (115 dB SPL); each sub's own row is held to its share of it. */
  subsCombined: { summation: 'coherent' | 'power'; maxSplDb: number; targetPeakDb: number; headroomDb: number; meetsTarget: boolean; powerScale: number } | null;
  allMeetTarget: boolean;
  exposure: { levelDba: number; minutes: number }[];
  safety: string[];
}

export interface HeadroomOptions {
  /** Boundary gain added to the mains, dB (default 0: free field). */
  mainsRoomGainDb?: number;
  /** Room gain of the subs, dB (default 0). */
  subsRoomGainDb?: number;
  subSummation?: 'coherent' | 'power';
}

const clampDistance = (d: number) => Math.min(100, Math.max(0.1, d));

/** One row per speaker and per sub, with its profile's sensitivity, impedance and rating, its amplifier and its distance to the MLP. */
export function headroomRequestFromDocument(doc: SystemDocument, options: HeadroomOptions = {}): HeadroomRequest | null {
  const row = (name: string, profileId: string, powerW: number, distanceM: number, count: number, roomGainDb: number) => {
    const p = profileById(doc, profileId);
    if (!p) return null;
    return { name, sensitivityDb: p.sensitivityDb, sensitivityRef: p.sensitivityReference, impedanceOhm: p.impedanceOhm, powerW, distanceM: clampDistance(distanceM), count, roomGainDb, ratedPowerW: p.ratedPowerW };
  };
  const channels = doc.speakers.map((s) => row(s.channel, s.profileId, s.amplifierPowerW, distanceToSeatM(doc, s), 1, options.mainsRoomGainDb ?? 0)).filter((r) => r !== null);
  const subs = doc.subs.map((s) => row(s.name, s.profileId, s.amplifierPowerW, distanceToSeatM(doc, s), s.count, options.subsRoomGainDb ?? 0)).filter((r) => r !== null);
  if (channels.length === 0 && subs.length === 0) return null;
  return { channels, subs, subSummation: options.subSummation ?? 'coherent' };
}

type Row = HeadroomRequest['channels'][number];

function rowOut(row: Row, defaultTarget: number): HeadroomRowOut {
  const targetPeakDb = row.targetPeakDb ?? defaultTarget;
  const opts = { sensitivityDb: row.sensitivityDb, sensitivityRef: row.sensitivityRef, impedanceOhm: row.impedanceOhm, powerW: row.powerW, distanceM: row.distanceM, count: row.count, roomGainDb: row.roomGainDb };
  const h = headroomCheck({ ...opts, targetPeakDb, ...(row.ratedPowerW === undefined ? {} : { ratedPowerW: row.ratedPowerW }) });
  const m = maxSplDb(opts);
  return {
    name: row.name,
    maxSplDb: roundTo(h.maxSplDb, 2),
    amplifierSplDb: roundTo(h.amplifierSplDb, 2),
    ratedSplDb: h.ratedSplDb === null ? null : roundTo(h.ratedSplDb, 2),
    binding: h.binding,
    usablePowerW: h.usablePowerW,
    ratedPowerW: row.ratedPowerW ?? null,
    perUnitSplDb: roundTo(m.perUnitSplDb, 2),
    sensitivity1WDb: roundTo(m.sensitivity1WDb, 2),
    targetPeakDb: roundTo(targetPeakDb, 2),
    headroomDb: roundTo(h.headroomDb, 2),
    deficitDb: roundTo(h.deficitDb, 2),
    meetsTarget: h.meetsTarget,
    powerW: row.powerW,
    powerNeededW: roundToSignificant(h.powerNeededW, 4),
    exceedsRatedPower: row.ratedPowerW === undefined ? null : h.powerNeededW > row.ratedPowerW,
    amplifierAboveRating: row.ratedPowerW === undefined ? null : row.powerW > row.ratedPowerW,
  };
}

const EXPOSURE_LEVELS_DBA = [85, 88, 91, 94, 97, 100, 103, 105, 110, 115];

/** Hearing-safety and installation cautions shown with every headroom answer. */
export const HEADROOM_SAFETY_NOTES = [
  'Reference level means peaks of 105 dB SPL per channel and 115 dB SPL from the subs. Such levels can damage hearing: calibrate at the −20 dBFS test signal (85 dB SPL), not at full scale, and keep sessions short.',
  'NIOSH recommends at most 85 dBA averaged over 8 hours with a 3 dB exchange rate: every 3 dB more halves the safe time (100 dBA: 15 minutes a day). Published: NIOSH, Criteria for a Recommended Standard: Occupational Noise Exposure, 1998.',
  'Wear hearing protection while running level sweeps or stress tests, and warn everyone in the room before playing test signals.',
  'Amplifier power above a speaker’s rating can destroy drivers; the power-needed figures assume undistorted peaks and are not a licence to drive past the rating.',
  'Where the amplifier is above the speaker’s rating, the maximum SPL and the verdict are taken at the rating (the binding limit): set the amplifier’s gain or a limiter so the speaker never gets more. The speaker maker’s ratings and instructions come first; a rating says nothing about how long a driver takes its full power.',
  'Mounting speakers or subs on walls and ceilings and any electrical work (dedicated circuits, in-wall wiring) must follow local building and electrical codes; use rated hardware and a licensed professional where the codes require one.',
];

/** Maximum SPL at the MLP against the target per channel and per sub, the subs together, and the exposure table. */
export function computeHeadroom(input: HeadroomRequest): HeadroomAnswer {
  const channels = input.channels.map((r) => rowOut(r, REFERENCE_PEAK_DB));
  // With several subs each carries its share of the 115 dB LFE peak: 115 − 20·log10(N) in phase, − 10·log10(N) as power.
  const shareDb = input.subs.length > 1 ? (input.subSummation === 'coherent' ? 20 : 10) * Math.log10(input.subs.length) : 0;
  const subs = input.subs.map((r) => rowOut(r, LFE_PEAK_DB - shareDb));
  let subsCombined: HeadroomAnswer['subsCombined'] = null;
  if (input.subs.length > 0) {
    const levels = input.subs.map((r) => headroomCheck({ ...r, targetPeakDb: LFE_PEAK_DB }).maxSplDb);
    const combinedDb = combinedSplDb({ levelsDb: levels, summation: input.subSummation });
    const target = LFE_PEAK_DB;
    const headroomDb = combinedDb - target;
    subsCombined = { summation: input.subSummation, maxSplDb: roundTo(combinedDb, 2), targetPeakDb: target, headroomDb: roundTo(headroomDb, 2), meetsTarget: headroomDb >= 0, powerScale: roundToSignificant(Math.pow(10, -headroomDb / 10), 4) };
  }
  const subsOk = subsCombined ? subsCombined.meetsTarget : true;
  return {
    referenceLevelDb: REFERENCE_LEVEL_DB,
    channelTargetPeakDb: REFERENCE_PEAK_DB,
    subTargetPeakDb: LFE_PEAK_DB,
    channels,
    subs,
    subsCombined,
    allMeetTarget: channels.every((c) => c.meetsTarget) && subsOk,
    exposure: EXPOSURE_LEVELS_DBA.map((levelDba) => ({ levelDba, minutes: roundToSignificant(exposureMinutes({ levelDba }), 3) })),
    safety: HEADROOM_SAFETY_NOTES,
  };
}
