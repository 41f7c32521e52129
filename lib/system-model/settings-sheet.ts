/**
 * The Settings sheet of a System (SPEC §5): the figures a processor needs, per channel and per sub,
 * and a short room-mode summary. Picks fields from the document and calls dsp/ for the arithmetic
 * (delaysAndTrims, roomModes, schroederFrequencyHz); no mathematics of its own.
 */
import { delaysAndTrims, roomModes, schroederFrequencyHz, type ModeKind } from '@/dsp';
import type { Slope, SystemDocument } from '@/lib/validations/system';
import { distanceToSeatM, mlpSeat, profileById } from './index';

export interface SheetChannel {
  id: string;
  channel: string;
  profileName: string;
  distanceM: number;
  /** "measured" when the document holds a distance override, else from the positions. */
  distanceSource: 'measured' | 'geometry';
  /** Distance alignment to the farthest main speaker (processor convention) plus the mains delay. */
  delayMs: number;
  trimDb: number;
  highpassHz: number;
  slope: string;
}

export interface SheetSub {
  id: string;
  name: string;
  profileName: string;
  count: number;
  distanceM: number;
  distanceSource: 'measured' | 'geometry';
  delayMs: number;
  polarity: 'normal' | 'inverted';
  gainDb: number;
  lowpassHz: number;
  slope: string;
}

export interface SheetMode {
  frequencyHz: number;
  indices: readonly [number, number, number];
  kind: ModeKind;
}

export interface SettingsSheet {
  layout: string;
  mlpName: string;
  temperatureC: number;
  crossoverHz: number;
  mainsDelayMs: number;
  lfeLowpassHz: number;
  lfeGainDb: number;
  channels: SheetChannel[];
  subs: SheetSub[];
  room: { lengthM: number; widthM: number; heightM: number; volumeM3: number; rt60S: number };
  schroederHz: number;
  /** The lowest modes (up to 12, below 200 Hz). */
  firstModes: SheetMode[];
  /** The lowest axial mode along each dimension. */
  firstAxialHz: { length: number | null; width: number | null; height: number | null };
  notes: string;
}

/** "Linkwitz–Riley 4th order (24 dB/oct)". */
export function slopeLabel(slope: Slope): string {
  const family = slope.family === 'linkwitz-riley' ? 'Linkwitz–Riley' : 'Butterworth';
  const suffix = slope.order === 1 ? 'st' : slope.order === 2 ? 'nd' : slope.order === 3 ? 'rd' : 'th';
  return `${family} ${slope.order}${suffix} order (${6 * slope.order} dB/oct)`;
}

export function settingsSheet(doc: SystemDocument): SettingsSheet {
  const bm = doc.bassManagement;
  const mainsDistancesM = doc.speakers.map((s) => distanceToSeatM(doc, s));
  const aligned = mainsDistancesM.length ? delaysAndTrims({ distancesM: mainsDistancesM, temperatureC: doc.room.temperatureC }) : null;
  const channels: SheetChannel[] = doc.speakers.map((s, i) => ({
    id: s.id,
    channel: s.channel,
    profileName: profileById(doc, s.profileId)?.name ?? s.profileId,
    distanceM: mainsDistancesM[i] as number,
    distanceSource: s.distanceOverrideM != null ? 'measured' : 'geometry',
    delayMs: (aligned?.delaysMs[i] ?? 0) + bm.mainsDelayMs,
    trimDb: s.trimDb,
    highpassHz: bm.crossoverHz,
    slope: slopeLabel(bm.mainsHighpass),
  }));
  const subs: SheetSub[] = doc.subs.map((s) => ({
    id: s.id,
    name: s.name,
    profileName: profileById(doc, s.profileId)?.name ?? s.profileId,
    count: s.count,
    distanceM: distanceToSeatM(doc, s),
    distanceSource: s.distanceOverrideM != null ? 'measured' : 'geometry',
    delayMs: s.delayMs,
    polarity: s.invert ? 'inverted' : 'normal',
    gainDb: s.gainDb,
    lowpassHz: bm.crossoverHz,
    slope: slopeLabel(bm.subLowpass),
  }));
  const { lengthM, widthM, heightM, rt60S, temperatureC } = doc.room;
  const volumeM3 = lengthM * widthM * heightM;
  const modes = roomModes({ lengthM, widthM, heightM, maxHz: 200, temperatureC }).modes;
  const firstAxial = (axis: 0 | 1 | 2) => modes.find((m) => m.kind === 'axial' && m.indices[axis] > 0)?.frequencyHz ?? null;
  return {
    layout: doc.layout,
    mlpName: mlpSeat(doc).name,
    temperatureC,
    crossoverHz: bm.crossoverHz,
    mainsDelayMs: bm.mainsDelayMs,
    lfeLowpassHz: bm.lfeLowpassHz,
    lfeGainDb: bm.lfeGainDb,
    channels,
    subs,
    room: { lengthM, widthM, heightM, volumeM3, rt60S },
    schroederHz: schroederFrequencyHz({ volumeM3, rt60S }),
    firstModes: modes.slice(0, 12).map((m) => ({ frequencyHz: m.frequencyHz, indices: m.indices, kind: m.kind })),
    firstAxialHz: { length: firstAxial(0), width: firstAxial(1), height: firstAxial(2) },
    notes: doc.notes,
  };
}

const round = (x: number, digits: number) => Number(x.toFixed(digits));

/** One CSV row per channel and sub, with units in the column names (RFC 4180 quoting). */
export function settingsSheetCsv(name: string, revision: number, doc: SystemDocument): string {
  const sheet = settingsSheet(doc);
  const header = ['system', 'revision', 'kind', 'id', 'label', 'profile', 'distanceM', 'distanceSource', 'delayMs', 'trimDb', 'gainDb', 'polarity', 'crossoverHz', 'filter', 'slope', 'count'];
  const rows: (string | number)[][] = [
    ...sheet.channels.map((c) => [name, revision, 'channel', c.id, c.channel, c.profileName, round(c.distanceM, 3), c.distanceSource, round(c.delayMs, 2), round(c.trimDb, 1), '', 'normal', c.highpassHz, 'highpass', c.slope, 1]),
    ...sheet.subs.map((s) => [name, revision, 'sub', s.id, s.name, s.profileName, round(s.distanceM, 3), s.distanceSource, round(s.delayMs, 2), '', round(s.gainDb, 1), s.polarity, s.lowpassHz, 'lowpass', s.slope, s.count]),
  ];
  const cell = (v: string | number) => {
    const s = String(v);
    // Quote per RFC 4180; a leading = + - @ is prefixed so spreadsheets do not run it as a formula.
    const safe = typeof v === 'string' && /^[=+\-@]/.test(s) ? `'${s}` : s;
    return /[",\r\n]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
  };
  return [header, ...rows].map((r) => r.map(cell).join(',')).join('\r\n') + '\r\n';
}
