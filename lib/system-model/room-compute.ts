/**
 * The answers of POST /api/v1/room-modes and /api/v1/room-response, assembled from dsp/ (no
 * mathematics of its own beyond picking, averaging for the 0 dB reference and rounding).
 */
import {
  bonelloCheck,
  logFrequencyGridHz,
  modeCountsPerThirdOctave,
  modePressureMap,
  nearCoincidentModes,
  quarterWaveNotchHz,
  roomModes,
  roomProportionCheck,
  schroederFrequencyHz,
  seatSpreadDb,
  speedOfSoundMps,
  statisticalModeCount,
  summedModalResponse,
  type ModeKind,
  type RoomMode,
} from '@/dsp';
import type { RoomModesRequest, RoomResponseRequest } from '@/lib/validations/compute-room';
import { fixed, fixedArray, sig, sigArray } from './room-format';

export type Indices = [number, number, number];

export interface RoomModeOut {
  frequencyHz: number;
  indices: Indices;
  kind: ModeKind;
}

export interface ThirdOctaveBandOut {
  centerHz: number;
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

const BONELLO_TOLERANCE_HZ = 0.5;
const COINCIDENT_PERCENT = 2;
const MAX_PAIRS = 200;

const kindCount = (modes: readonly RoomMode[], kind: ModeKind) => modes.reduce((n, m) => n + (m.kind === kind ? 1 : 0), 0);
const indicesOf = (m: RoomMode): Indices => [m.indices[0], m.indices[1], m.indices[2]];

/** POST /api/v1/room-modes (SPEC §6) and the extras a practitioner reads beside the mode table. */
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
          startHz: sig(r.bands[0]?.centerHz ?? 20, 4),
          stopHz: sig(lastBonello.centerHz, 4),
          decreasingAtHz: sigArray(r.decreasingAtHz, 4),
          coincidencesAtHz: sigArray(r.coincidencesAtHz, 4),
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
    speedOfSoundMps: sig(c, 6),
    volumeM3: sig(volumeM3, 6),
    modes: modes.map((m) => ({ frequencyHz: sig(m.frequencyHz, 6), indices: indicesOf(m), kind: m.kind })),
    kindCounts: { axial: kindCount(modes, 'axial'), tangential: kindCount(modes, 'tangential'), oblique: kindCount(modes, 'oblique') },
    schroederHz: sig(schroederHz, 5),
    statisticalCount: {
      frequencyHz: maxHz,
      expected: sig(statisticalModeCount({ lengthM, widthM, heightM, frequencyHz: maxHz, temperatureC }), 5),
      enumerated: modes.length,
      source: 'published: H. Kuttruff, Room Acoustics, ch. 3',
    },
    thirdOctaveBands: bands.map((b) => ({
      centerHz: sig(b.centerHz, 4),
      lowerHz: sig(b.lowerHz, 4),
      upperHz: sig(b.upperHz, 4),
      count: b.count,
      axial: kindCount(b.modes, 'axial'),
      tangential: kindCount(b.modes, 'tangential'),
      oblique: kindCount(b.modes, 'oblique'),
    })),
    bonello,
    nearCoincident: {
      tolerancePercent: COINCIDENT_PERCENT,
      belowHz: sig(belowHz, 5),
      pairs: allPairs.slice(0, MAX_PAIRS).map((p) => ({
        lowerHz: sig(p.lower.frequencyHz, 6),
        upperHz: sig(p.upper.frequencyHz, 6),
        separationHz: sig(p.separationHz, 3),
        lower: indicesOf(p.lower),
        upper: indicesOf(p.upper),
      })),
      truncated: allPairs.length > MAX_PAIRS,
    },
    proportions: {
      passes: proportions.passes,
      lengthToHeight: sig(proportions.lengthToHeight, 4),
      widthToHeight: sig(proportions.widthToHeight, 4),
      criteria: proportions.criteria,
      source: 'published: ITU-R BS.1116-3 (2015)',
    },
  };
}

export interface RoomResponseAnswer {
  speedOfSoundMps: number;
  frequencyHz: number[];
  modeCount: number;
  maxModeHz: number;
  schroederHz: number;
  /** Absolute level taken as 0 dB, dB re 1 Pa per m³/s of volume velocity. */
  referenceDb: number;
  subs: { name: string }[];
  seats: { name: string; summedDb: number[]; perSubDb: number[][]; bandMeanDb: number }[];
  spread: { startHz: number; stopHz: number; spreadDb: number[]; meanSpreadDb: number; maxSpreadDb: number; maxSpreadHz: number } | null;
  map: { indices: Indices; kind: ModeKind; frequencyHz: number; zM: number; columns: number; rows: number; xM: number[]; yM: number[]; pressure: number[][] } | null;
  quarterWave: { name: string; distanceM: number; notchHz: number }[];
}

const point = (p: { xM: number; yM: number; zM: number }) => ({ x: p.xM, y: p.yM, z: p.zM });

/** Power mean of dB values, dB (10·log10 of the mean of 10^(L/10)). */
function powerMeanDb(values: number[]): number {
  if (values.length === 0) return 0;
  const mean = values.reduce((s, v) => s + Math.pow(10, v / 10), 0) / values.length;
  return 10 * Math.log10(mean);
}

/**
 * Modal seat responses from the subs (each with its gain, delay, polarity, and their sum), the seat-to-seat spread,
 * one mode's floor map and front-wall notches. Levels are relative: 0 dB is the power mean of the summed response
 * over all seats within the spread band.
 */
export function computeRoomResponse(input: RoomResponseRequest): RoomResponseAnswer {
  const { room, grid, seats, subs, spread, map, quarterWave } = input;
  const dims = { lengthM: room.lengthM, widthM: room.widthM, heightM: room.heightM };
  const frequencyHz = logFrequencyGridHz(grid);
  const maxModeHz = 1.5 * grid.stopHz;
  const sources = subs.map((s) => ({ positionM: point(s), gainDb: s.gainDb, delayMs: s.delayMs, invert: s.invert }));
  let modeCount = 0;
  const raw = seats.map((seat) => {
    const r = summedModalResponse({ room: dims, sources, receiverM: point(seat), frequencyHz, rt60S: room.rt60S, temperatureC: room.temperatureC, maxModeHz });
    modeCount = r.modeCount;
    return r;
  });
  const inBand = (f: number) => f >= spread.startHz && f <= spread.stopHz;
  const bandValues = (curve: Float64Array) => Array.from(curve).filter((_, i) => inBand(frequencyHz[i] as number));
  const allBand = raw.flatMap((r) => bandValues(r.sum.magnitudeDb));
  const referenceDb = allBand.length > 0 ? powerMeanDb(allBand) : powerMeanDb(raw.flatMap((r) => Array.from(r.sum.magnitudeDb)));
  const rel = (curve: Float64Array) => fixedArray(Array.from(curve, (v) => v - referenceDb), 2);
  let spreadOut: RoomResponseAnswer['spread'] = null;
  if (seats.length >= 2 && allBand.length > 0) {
    const s = seatSpreadDb({ frequencyHz, seatsMagnitudeDb: raw.map((r) => r.sum.magnitudeDb), startHz: spread.startHz, stopHz: spread.stopHz });
    spreadOut = { startHz: spread.startHz, stopHz: spread.stopHz, spreadDb: fixedArray(s.spreadDb, 2), meanSpreadDb: fixed(s.meanSpreadDb, 2), maxSpreadDb: fixed(s.maxSpreadDb, 2), maxSpreadHz: sig(s.maxSpreadHz, 4) };
  }
  let mapOut: RoomResponseAnswer['map'] = null;
  if (map) {
    const [nl, nw, nh] = map.indices;
    const m = modePressureMap({ room: dims, indices: [nl, nw, nh], zM: map.zM, columns: map.columns, rows: map.rows });
    const c = speedOfSoundMps(room.temperatureC);
    const modeHz = (c / 2) * Math.hypot(nl / room.lengthM, nw / room.widthM, nh / room.heightM);
    const nonZero = [nl, nw, nh].filter((n) => n > 0).length;
    const pressure: number[][] = [];
    for (let r = 0; r < m.rows; r++) pressure.push(fixedArray(m.pressure.subarray(r * m.columns, (r + 1) * m.columns), 3));
    mapOut = {
      indices: [nl, nw, nh],
      kind: nonZero === 1 ? 'axial' : nonZero === 2 ? 'tangential' : 'oblique',
      frequencyHz: sig(modeHz, 6),
      zM: map.zM,
      columns: m.columns,
      rows: m.rows,
      xM: sigArray(m.xM, 4),
      yM: sigArray(m.yM, 4),
      pressure,
    };
  }
  return {
    speedOfSoundMps: sig(speedOfSoundMps(room.temperatureC), 6),
    frequencyHz: sigArray(frequencyHz, 5),
    modeCount,
    maxModeHz: sig(maxModeHz, 5),
    schroederHz: sig(schroederFrequencyHz({ volumeM3: room.lengthM * room.widthM * room.heightM, rt60S: room.rt60S }), 5),
    referenceDb: fixed(referenceDb, 2),
    subs: subs.map((s) => ({ name: s.name })),
    seats: seats.map((seat, i) => {
      const r = raw[i]!;
      return { name: seat.name, summedDb: rel(r.sum.magnitudeDb), perSubDb: r.perSource.map((p) => rel(p.magnitudeDb)), bandMeanDb: fixed(powerMeanDb(bandValues(r.sum.magnitudeDb)) - referenceDb, 2) };
    }),
    spread: spreadOut,
    map: mapOut,
    quarterWave: quarterWave.map((q) => ({ name: q.name, distanceM: q.distanceM, notchHz: sig(quarterWaveNotchHz({ distanceM: q.distanceM, temperatureC: room.temperatureC }), 5) })),
  };
}
