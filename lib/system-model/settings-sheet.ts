/**
 * Settings sheet: the figures a processor needs, per channel and per sub, and a short room-mode summary
 * (`computeSettingsSheet`, computed from the document: no request and nothing written back), and its CSV export.
 * Distances, delays, trims and sub gains are `systemChannelSettings` — the one definition Layout, the exports and the
 * API share, already rounded (0.01 m, 0.01 ms, 0.1 dB); the room summary calls dsp/ (roomModes,
 * schroederFrequencyHz). The seat-to-seat spread is seatBalanceStateFromDocument's (Seat balance's own measure, on the
 * Modes tab's grid); the processor filters are processorFiltersFromDocument's, grouped as the panel shows them. No
 * mathematics of its own.
 */
import { roomModes, schroederFrequencyHz, SETTING_RESOLUTION, type ModeKind } from '@/dsp';
import type { Slope, SystemDocument } from '@/lib/validations/system';
import { systemChannelSettings } from './channel-settings';
import { mlpSeat, profileById } from './geometry';
import { deviationWords, groupOutputs, groupVoicing, LFE_NOTE, numberedSections, processorFiltersFromDocument, type OutputGroup } from './processor-filters';
import type { SeatBalanceSummary } from './seat-balance';
import { seatBalanceStateFromDocument } from './seat-balance-document';

/** Decimals each setting is rounded to (and shown and exported with): delay 2, trim and gain 1, distance 2. */
export const SETTING_DECIMALS = { delayMs: 2, trimDb: 1, distanceM: 2 } as const satisfies Record<keyof typeof SETTING_RESOLUTION, number>;

/** Decimals of the seat-to-seat spread figures on the sheet and in its CSV (as Seat balance rounds them). */
export const SPREAD_DECIMALS = { meanSpreadDb: 2, maxSpreadDb: 2, maxSpreadHz: 1, meanLevelDb: 2 } as const satisfies Record<keyof SeatBalanceSummary, number>;

/** The seat-to-seat spread over the band with every sub neutral (own delay 0 ms, 0 dB, normal; distance alignment kept) and with the System's settings. */
interface SheetSeatBalance {
  band: { startHz: number; stopHz: number };
  neutral: SeatBalanceSummary;
  system: SeatBalanceSummary;
}

export interface SheetChannel {
  id: string;
  channel: string;
  profileName: string;
  /** Distance to the MLP, m (0.01 m). */
  distanceM: number;
  /** "measured" when the document holds a distance override, else from the positions. */
  distanceSource: 'measured' | 'geometry';
  /** Distance alignment to the farthest speaker or sub, plus the mains delay (the delay all share taken out), ms (0.01 ms). */
  delayMs: number;
  /** Level match by distance (inverse-square) plus the channel's offset, dB (0.1 dB). */
  trimDb: number;
  /** The channel's own offset from the System, dB (already inside trimDb). */
  offsetDb: number;
  highpassHz: number;
  slope: string;
}

export interface SheetSub {
  id: string;
  name: string;
  profileName: string;
  count: number;
  /** Distance to the MLP, m (0.01 m). */
  distanceM: number;
  distanceSource: 'measured' | 'geometry';
  /** Distance alignment to the farthest speaker or sub, plus the sub's own delay (the delay all share taken out), ms (0.01 ms). */
  delayMs: number;
  /** The sub's own delay from the System, ms (already inside delayMs). */
  ownDelayMs: number;
  polarity: 'normal' | 'inverted';
  /** Sub gain, dB (0.1 dB). */
  gainDb: number;
  lowpassHz: number;
  slope: string;
}

export interface SheetMode {
  frequencyHz: number;
  indices: readonly [number, number, number];
  kind: ModeKind;
}

/** Outputs that run the same filters, once, with every section at full precision (the panel's numbers). */
interface SheetFilterGroup {
  key: string;
  /** The first output's id (main-<speaker id>, sub-<sub id>, lfe). */
  id: string;
  kind: OutputGroup['kind'];
  labels: string[];
  filters: { role: string; words: string }[];
  sections: ReturnType<typeof numberedSections>;
  /** The digital filters against the analog ones, in words; null when not computed. */
  deviation: string | null;
  problem: string | null;
  /** The speakers' own switch positions (set on the speaker, not in the processor): groupVoicing's lines. */
  voicing: { labels: string[] | null; text: string }[];
}

/** Every processor output's biquads at the System's sample rate (processorFiltersFromDocument, as the panel shows them). */
interface SheetProcessorFilters {
  sampleRateHz: number;
  convention: string;
  groups: SheetFilterGroup[];
  /** The LFE low-pass's assumed slope, when the System has an LFE output. */
  lfeNote: string | null;
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
  /** Null when Seat balance cannot measure the System (no sub, fewer than two seats, a position outside the room). */
  seatBalance: SheetSeatBalance | null;
  processorFilters: SheetProcessorFilters;
}

/** "Linkwitz–Riley 4th order (24 dB/oct)". */
export function slopeLabel(slope: Slope): string {
  const family = slope.family === 'linkwitz-riley' ? 'Linkwitz–Riley' : 'Butterworth';
  const suffix = slope.order === 1 ? 'st' : slope.order === 2 ? 'nd' : slope.order === 3 ? 'rd' : 'th';
  return `${family} ${slope.order}${suffix} order (${6 * slope.order} dB/oct)`;
}

/** The System's Settings sheet. */
export function computeSettingsSheet(doc: SystemDocument): SettingsSheet {
  const bm = doc.bassManagement;
  const settings = systemChannelSettings(doc);
  const channels: SheetChannel[] = doc.speakers.map((s, i) => ({
    id: s.id,
    channel: s.channel,
    profileName: profileById(doc, s.profileId)?.name ?? s.profileId,
    distanceM: settings.mains[i]!.distanceM,
    distanceSource: s.distanceOverrideM != null ? 'measured' : 'geometry',
    delayMs: settings.mains[i]!.delayMs,
    trimDb: settings.mains[i]!.trimDb,
    offsetDb: s.trimDb,
    highpassHz: bm.crossoverHz,
    slope: slopeLabel(bm.mainsHighpass),
  }));
  const subs: SheetSub[] = doc.subs.map((s, j) => ({
    id: s.id,
    name: s.name,
    profileName: profileById(doc, s.profileId)?.name ?? s.profileId,
    count: s.count,
    distanceM: settings.subs[j]!.distanceM,
    distanceSource: s.distanceOverrideM != null ? 'measured' : 'geometry',
    delayMs: settings.subs[j]!.delayMs,
    ownDelayMs: s.delayMs,
    polarity: s.invert ? 'inverted' : 'normal',
    gainDb: settings.subs[j]!.gainDb,
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
    seatBalance: seatBalanceOf(doc),
    processorFilters: processorFiltersOf(doc),
  };
}

function processorFiltersOf(doc: SystemDocument): SheetProcessorFilters {
  const pf = processorFiltersFromDocument(doc);
  const groups = groupOutputs(pf.outputs).map(({ key, kind, labels, first, outputs }) => ({
    key,
    id: first.id,
    kind,
    labels,
    filters: first.filters.map((f) => ({ role: f.role, words: f.words })),
    sections: numberedSections(first),
    deviation: first.result ? deviationWords(first.result.deviation) : null,
    problem: first.problem,
    voicing: groupVoicing({ outputs }),
  }));
  return { sampleRateHz: pf.sampleRateHz, convention: pf.convention, groups, lfeNote: pf.outputs.some((o) => o.kind === 'lfe') ? LFE_NOTE : null };
}

function seatBalanceOf(doc: SystemDocument): SheetSeatBalance | null {
  const state = seatBalanceStateFromDocument(doc);
  return state ? { band: state.band, neutral: state.before, system: state.present } : null;
}

/** A setting written with the decimals it was rounded to ("0.90", "-4.4"): a number, never a formula. */
class Setting {
  constructor(readonly text: string) {}
}
const setting = (x: number, decimals: number) => new Setting(x.toFixed(decimals));

/**
 * One CSV row per channel and sub, then the seat-to-seat spread (all subs neutral, and with the System's settings), with
 * units in the column names (RFC 4180 quoting). Distances, delays, trims and gains are the sheet's
 * (systemChannelSettings), written with the decimals they were rounded to; the spread rows are the sheet's too.
 */
export function settingsSheetCsv(name: string, revision: number, doc: SystemDocument): string {
  const sheet = computeSettingsSheet(doc);
  const d = SETTING_DECIMALS;
  const header = ['system', 'revision', 'kind', 'id', 'label', 'profile', 'distanceM', 'distanceSource', 'delayMs', 'trimDb', 'gainDb', 'polarity', 'crossoverHz', 'filter', 'slope', 'count', 'ownDelayMs', 'bandHz', 'meanSpreadDb', 'maxSpreadDb', 'maxSpreadHz', 'meanLevelDb'];
  const noSpread = ['', '', '', '', ''];
  const sb = sheet.seatBalance;
  const spread = (id: string, label: string, m: SeatBalanceSummary) => {
    const band = sb ? `${sb.band.startHz}-${sb.band.stopHz}` : '';
    const p = SPREAD_DECIMALS;
    return [name, revision, 'seat-spread', id, label, '', '', '', '', '', '', '', '', '', '', '', '', band, setting(m.meanSpreadDb, p.meanSpreadDb), setting(m.maxSpreadDb, p.maxSpreadDb), setting(m.maxSpreadHz, p.maxSpreadHz), setting(m.meanLevelDb, p.meanLevelDb)];
  };
  const rows: (string | number | Setting)[][] = [
    ...sheet.channels.map((c) => [name, revision, 'channel', c.id, c.channel, c.profileName, setting(c.distanceM, d.distanceM), c.distanceSource, setting(c.delayMs, d.delayMs), setting(c.trimDb, d.trimDb), '', 'normal', c.highpassHz, 'highpass', c.slope, 1, '', ...noSpread]),
    ...sheet.subs.map((s) => [name, revision, 'sub', s.id, s.name, s.profileName, setting(s.distanceM, d.distanceM), s.distanceSource, setting(s.delayMs, d.delayMs), '', setting(s.gainDb, d.trimDb), s.polarity, s.lowpassHz, 'lowpass', s.slope, s.count, setting(s.ownDelayMs, d.delayMs), ...noSpread]),
    ...(sb ? [spread('neutral', 'every sub own delay 0 ms, 0 dB, normal', sb.neutral), spread('system', 'the System settings', sb.system)] : []),
  ];
  const cell = (v: string | number | Setting) => {
    const s = v instanceof Setting ? v.text : String(v);
    // Quote per RFC 4180; a leading = + - @ in text is prefixed so spreadsheets do not run it as a formula.
    const safe = typeof v === 'string' && /^[=+\-@]/.test(s) ? `'${s}` : s;
    return /[",\r\n]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
  };
  return [header, ...rows].map((r) => r.map(cell).join(',')).join('\r\n') + '\r\n';
}
