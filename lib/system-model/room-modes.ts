/**
 * Modes: the System's request (`roomModesRequestFromDocument`), the compute behind POST /api/v1/room-modes
 * (`computeRoomModes`, assembled from dsp/room: no mathematics of its own beyond picking and rounding) and a change of
 * the room written to the document (`applyRoomToDocument`).
 */
import {
  bonelloCheck,
  modeCountsPerThirdOctave,
  nearCoincidentModes,
  nominalMidbandHz,
  roomModes,
  roomProportionCheck,
  schroederFrequencyHz,
  statisticalModeCount,
  type ModeKind,
  type RoomMode,
} from '@/dsp';
import type { RoomModesRequest } from '@/lib/validations/compute-room';
import type { SystemDocument } from '@/lib/validations/system';
import { positionsOutsideRoom, type OutsidePosition } from './room-bounds';
import { roundAllToSignificant, roundToSignificant } from './rounding';

export type Indices = [number, number, number];

export interface RoomModeOut {
  frequencyHz: number;
  indices: Indices;
  kind: ModeKind;
}

export interface ThirdOctaveBandOut {
  centerHz: number;
  /** The band's label, IEC 61260-1 nominal mid-band frequency (25, 31.5, 40 … 160, 200). */
  nominalHz: number;
  lowerHz: number;
  upperHz: number;
  count: number;
  axial: number;
  tangential: number;
  oblique: number;
}

export interface RoomModesAnswer {
  speedOfSoundMps: number;
  volumeM3: number;
  modes: RoomModeOut[];
  kindCounts: Record<ModeKind, number>;
  schroederHz: number;
  statisticalCount: { frequencyHz: number; expected: number; enumerated: number; source: string };
  thirdOctaveBands: ThirdOctaveBandOut[];
  bonello: { passes: boolean; startHz: number; stopHz: number; decreasingAtHz: number[]; coincidencesAtHz: number[]; coincidenceToleranceHz: number; source: string } | null;
  nearCoincident: { tolerancePercent: number; belowHz: number; pairs: { lowerHz: number; upperHz: number; separationHz: number; lower: Indices; upper: Indices }[]; truncated: boolean };
  proportions: { passes: boolean; lengthToHeight: number; widthToHeight: number; criteria: { name: string; passes: boolean }[]; source: string };
}

/** Body of POST /api/v1/room-modes for the System's room. */
export function roomModesRequestFromDocument(doc: SystemDocument, maxHz = 200): RoomModesRequest {
  const { lengthM, widthM, heightM, temperatureC, rt60S } = doc.room;
  return { lengthM, widthM, heightM, maxHz, temperatureC, rt60S };
}

const BONELLO_TOLERANCE_HZ = 0.5;
const COINCIDENT_PERCENT = 2;
const MAX_PAIRS = 200;

const kindCount = (modes: readonly RoomMode[], kind: ModeKind) => modes.reduce((n, m) => n + (m.kind === kind ? 1 : 0), 0);
const indicesOf = (m: RoomMode): Indices => [m.indices[0], m.indices[1], m.indices[2]];

/** The answer of POST /api/v1/room-modes: the mode table and the extras a practitioner reads beside it. */
export function computeRoomModes(input: RoomModesRequest): RoomModesAnswer {
  const { lengthM, widthM, heightM, maxHz, temperatureC, rt60S } = input;
  const { speedOfSoundMps: c, modes } = roomModes({ lengthM, widthM, heightM, maxHz, temperatureC });
  const volumeM3 = lengthM * widthM * heightM;
  const schroederHz = schroederFrequencyHz({ volumeM3, rt60S });
  // Only complete one-third-octave bands (upper edge within maxHz) are counted: a cut band would look like a decrease.
  const bands = maxHz >= 22.4 ? modeCountsPerThirdOctave(modes, { startHz: 20, stopHz: maxHz }).filter((b) => b.upperHz <= maxHz * (1 + 1e-9)) : [];
  const bonelloBands = bands.filter((b) => b.centerHz <= 200 * 1.01);
  const lastBonello = bonelloBands[bonelloBands.length - 1];
  const bonello = lastBonello
    ? (() => {
        const r = bonelloCheck(modes, { startHz: 20, stopHz: lastBonello.centerHz, coincidenceToleranceHz: BONELLO_TOLERANCE_HZ });
        return {
          passes: r.passes,
          startHz: roundToSignificant(r.bands[0]?.centerHz ?? 20, 4),
          stopHz: roundToSignificant(lastBonello.centerHz, 4),
          decreasingAtHz: roundAllToSignificant(r.decreasingAtHz, 4),
          coincidencesAtHz: roundAllToSignificant(r.coincidencesAtHz, 4),
          coincidenceToleranceHz: BONELLO_TOLERANCE_HZ,
          source: 'published: O. J. Bonello, J. Audio Eng. Soc. 29(9), 1981',
        };
      })()
    : null;
  const belowHz = Math.min(maxHz, schroederHz);
  const allPairs = nearCoincidentModes(
    modes.filter((m) => m.frequencyHz <= belowHz),
    { tolerancePercent: COINCIDENT_PERCENT },
  );
  const proportions = roomProportionCheck({ lengthM, widthM, heightM });
  return {
    speedOfSoundMps: roundToSignificant(c, 6),
    volumeM3: roundToSignificant(volumeM3, 6),
    modes: modes.map((m) => ({ frequencyHz: roundToSignificant(m.frequencyHz, 6), indices: indicesOf(m), kind: m.kind })),
    kindCounts: { axial: kindCount(modes, 'axial'), tangential: kindCount(modes, 'tangential'), oblique: kindCount(modes, 'oblique') },
    schroederHz: roundToSignificant(schroederHz, 5),
    statisticalCount: {
      frequencyHz: maxHz,
      expected: roundToSignificant(statisticalModeCount({ lengthM, widthM, heightM, frequencyHz: maxHz, temperatureC }), 5),
      enumerated: modes.length,
      source: 'published: H. Kuttruff, Room Acoustics, ch. 3',
    },
    thirdOctaveBands: bands.map((b) => ({
      centerHz: roundToSignificant(b.centerHz, 4),
      nominalHz: nominalMidbandHz(b.centerHz, 3),
      lowerHz: roundToSignificant(b.lowerHz, 4),
      upperHz: roundToSignificant(b.upperHz, 4),
      count: b.count,
      axial: kindCount(b.modes, 'axial'),
      tangential: kindCount(b.modes, 'tangential'),
      oblique: kindCount(b.modes, 'oblique'),
    })),
    bonello,
    nearCoincident: {
      tolerancePercent: COINCIDENT_PERCENT,
      belowHz: roundToSignificant(belowHz, 5),
      pairs: allPairs.slice(0, MAX_PAIRS).map((p) => ({
        lowerHz: roundToSignificant(p.lower.frequencyHz, 6),
        upperHz: roundToSignificant(p.upper.frequencyHz, 6),
        separationHz: roundToSignificant(p.separationHz, 3),
        lower: indicesOf(p.lower),
        upper: indicesOf(p.upper),
      })),
      truncated: allPairs.length > MAX_PAIRS,
    },
    proportions: {
      passes: proportions.passes,
      lengthToHeight: roundToSignificant(proportions.lengthToHeight, 4),
      widthToHeight: roundToSignificant(proportions.widthToHeight, 4),
      criteria: proportions.criteria,
      source: 'published: ITU-R BS.1116-3 (2015)',
    },
  };
}

type Room = SystemDocument['room'];

/**
 * The document with `patch` applied to the room and every position left exactly where it was, with the positions that
 * now lie outside the room (`positionsOutsideRoom`). Making the room larger again brings them back inside unchanged.
 * Changing the room never moves a seat, speaker or sub: what no longer fits is reported.
 */
export function applyRoomToDocument(doc: SystemDocument, patch: Partial<Room>): { doc: SystemDocument; outside: OutsidePosition[] } {
  const next = { ...doc, room: { ...doc.room, ...patch } };
  return { doc: next, outside: positionsOutsideRoom(next) };
}
