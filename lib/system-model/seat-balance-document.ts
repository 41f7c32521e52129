/**
 * Seat balance on a System: its request (`seatBalanceRequestFromDocument`: every seat and sub, on the Modes tab's
 * grid and band, so the numbers match the seat-to-seat spread shown there), the recommendation written back
 * (`applySeatBalanceToDocument`) and the measures of its present settings for the Settings sheet
 * (`seatBalanceStateFromDocument`, no search).
 */
import { logFrequencyGridHz, modalTransfers, seatBalanceEvaluator, type SubSetting } from '@/dsp';
import { SEAT_BALANCE_LIMITS, seatBalanceModelRequestSchema, type SeatBalanceModelRequest } from '@/lib/validations/compute-seat-balance';
import type { SystemDocument } from '@/lib/validations/system';
import { systemChannelSettings } from './channel-settings';
import { toPointM } from './geometry';
import { positionsOutsideRoom } from './room-bounds';
import { roundTo, roundToSignificant } from './rounding';
import { withFixedPath, type SeatBalanceAnswer, type SeatBalanceExtras, type SeatBalanceSummary } from './seat-balance';

/** The Modes tab's grid and spread band (roomResponseRequestFromDocument): Seat balance measures on the same points. */
export const SYSTEM_SEAT_BALANCE_GRID = { startHz: 15, stopHz: 200, pointsPerOctave: 48 } as const;
export const SYSTEM_SEAT_BALANCE_BAND = { startHz: 20, stopHz: 120 } as const;

/** Why a System cannot be balanced, or its request with the extras (present settings, box counts). */
export type SeatBalanceDocumentRequest =
  | { ok: true; request: SeatBalanceModelRequest; extras: Required<Pick<SeatBalanceExtras, 'present' | 'fixedGainDb' | 'fixedDelayMs'>> }
  | { ok: false; reason: string };

/**
 * The part of each sub's processor delay that is distance alignment (the channel settings' delay less the sub's own
 * delay), the smallest made 0: the processor applies it whatever Seat balance says, so it is part of each sub's path.
 */
export function subAlignmentDelaysMs(doc: SystemDocument): number[] {
  const cs = systemChannelSettings(doc);
  const fixed = doc.subs.map((s, i) => (cs.subs[i]?.delayMs ?? 0) - s.delayMs);
  const least = Math.min(...fixed);
  return fixed.map((d) => d - least);
}

/** The request for a System's subs and seats (the limits and placement are the caller's to add). */
export function seatBalanceRequestFromDocument(doc: SystemDocument, options: { placementCount?: number; seed?: number } = {}): SeatBalanceDocumentRequest {
  if (doc.subs.length === 0) return { ok: false, reason: 'Add a sub first: Seat balance sets the subs.' };
  if (doc.seats.length < 2) return { ok: false, reason: 'Add a second seat: Seat balance makes several seats alike.' };
  if (doc.seats.length > SEAT_BALANCE_LIMITS.maxSeats) return { ok: false, reason: `Seat balance works on at most ${SEAT_BALANCE_LIMITS.maxSeats} seats; this System has ${doc.seats.length}.` };
  const outside = positionsOutsideRoom(doc).filter((o) => /^(subs|seats)\./.test(o.path));
  if (outside.length > 0) return { ok: false, reason: 'A seat or sub stands outside the room: move it inside on Layout first.' };
  const parsed = seatBalanceModelRequestSchema.safeParse({
    room: { ...doc.room },
    seats: doc.seats.map((s) => ({ name: s.name, xM: s.xM, yM: s.yM, zM: s.zM })),
    subs: doc.subs.map((s) => ({ name: s.name, xM: s.xM, yM: s.yM, zM: s.zM })),
    band: { ...SYSTEM_SEAT_BALANCE_BAND },
    grid: { ...SYSTEM_SEAT_BALANCE_GRID },
    ...(options.placementCount ? { placement: { count: options.placementCount } } : {}),
    seed: options.seed ?? 1,
  });
  if (!parsed.success) return { ok: false, reason: parsed.error.issues[0]?.message ?? 'The System cannot be balanced as it is.' };
  return {
    ok: true,
    request: parsed.data,
    extras: {
      present: doc.subs.map((s) => ({ delayMs: s.delayMs, gainDb: s.gainDb, invert: s.invert })),
      fixedGainDb: doc.subs.map((s) => 20 * Math.log10(s.count)),
      fixedDelayMs: subAlignmentDelaysMs(doc),
    },
  };
}

/**
 * Writes the answer's per-sub settings into the System. Seat balance fixes the subs against each other; how the group
 * sits against the mains is Timing's and the level match's, so the group keeps its present mean delay, its present
 * level at the seats (one gain offset for all subs) and, where it can, each sub's present polarity (inverting every
 * sub together changes no seat's level). None of that changes the seat-to-seat spread.
 */
export function applySeatBalanceToDocument(
  doc: SystemDocument,
  answer: Pick<SeatBalanceAnswer, 'subs' | 'after' | 'present'>,
  options: { delaysIncludeAlignment?: boolean } = {},
): SystemDocument {
  if (answer.subs.length !== doc.subs.length) return doc;
  const present = answer.present;
  // Offsets common to every sub are rounded first, so the subs' relative delays and gains stay exactly the answer's.
  const levelOffsetDb = roundTo(present ? present.meanLevelDb - answer.after.meanLevelDb : 0, 1);
  const matches = answer.subs.filter((s, i) => s.invert === doc.subs[i]!.invert).length;
  const flipAll = matches * 2 < answer.subs.length;
  const mean = (v: number[]) => v.reduce((a, x) => a + x, 0) / v.length;
  // From measurements the answer's delays are the whole processor delay: the distance alignment comes off.
  const alignment = options.delaysIncludeAlignment ? subAlignmentDelaysMs(doc) : doc.subs.map(() => 0);
  const own = answer.subs.map((s, i) => s.delayMs - (alignment[i] as number));
  const keepMean = mean(doc.subs.map((s) => s.delayMs)) - mean(own);
  const shift = roundTo(Math.min(Math.max(keepMean, -Math.min(...own)), 100 - Math.max(...own)), 2);
  return {
    ...doc,
    subs: doc.subs.map((sub, i) => {
      const a = answer.subs[i] as SubSetting;
      return {
        ...sub,
        delayMs: Math.max(0, roundTo((own[i] as number) + shift, 2)),
        gainDb: roundTo(Math.min(30, Math.max(-30, a.gainDb + levelOffsetDb)), 1),
        invert: flipAll ? !a.invert : a.invert,
      };
    }),
  };
}

/** The seat-to-seat spread of a System with every sub neutral and with its present settings (the Settings sheet's). */
export function seatBalanceStateFromDocument(doc: SystemDocument): { before: SeatBalanceSummary; present: SeatBalanceSummary; band: { startHz: number; stopHz: number } } | null {
  const r = seatBalanceRequestFromDocument(doc);
  if (!r.ok) return null;
  const { request, extras } = r;
  const grid = request.grid ?? SYSTEM_SEAT_BALANCE_GRID;
  const frequencyHz = logFrequencyGridHz(grid);
  const t = modalTransfers({ room: request.room, sourcesM: request.subs.map(toPointM), receiversM: request.seats.map(toPointM), frequencyHz, rt60S: request.room.rt60S, temperatureC: request.room.temperatureC, maxModeHz: 1.5 * grid.stopHz });
  const transfers = withFixedPath(t.frequencyHz, t.transfers, extras.fixedGainDb, extras.fixedDelayMs);
  const ev = seatBalanceEvaluator({ frequencyHz: t.frequencyHz, transfers, startHz: request.band.startHz, stopHz: request.band.stopHz, maxOutputLossDb: request.limits.maxOutputLossDb });
  const summary = (settings: readonly SubSetting[]): SeatBalanceSummary => {
    const m = ev.measure(settings);
    return { meanSpreadDb: roundTo(m.meanSpreadDb, 2), maxSpreadDb: roundTo(m.maxSpreadDb, 2), maxSpreadHz: roundToSignificant(m.maxSpreadHz, 4), meanLevelDb: roundTo(m.meanLevelDb, 2) };
  };
  return { before: summary(request.subs.map(() => ({ delayMs: 0, gainDb: 0, invert: false }))), present: summary(extras.present), band: request.band };
}

/** A stored measurement as the Library lists it (no points). */
export interface SeatBalanceMeasurementRef {
  id: string;
  name: string;
  seat: string | null;
  role: string | null;
  hasPhase: boolean;
}

/** The measured request for a System, or what is missing: a file per sub (role = its name) per seat (its name). */
export type SeatBalanceMeasuredDocumentRequest =
  | { ok: true; body: { seats: { name: string }[]; subs: { name: string; present: { delayMs: number; gainDb: number; invert: boolean } }[]; measurements: { sub: string; seat: string; measurementId: string }[]; band: { startHz: number; stopHz: number }; grid: { startHz: number; stopHz: number; pointsPerOctave: number } }; used: { sub: string; seat: string; name: string }[] }
  | { ok: false; reason: string; missing: { sub: string; seat: string }[]; withoutPhase: { sub: string; seat: string; name: string }[] };

/**
 * Picks, for every sub at every seat of the System, the first listed measurement (the list is newest first) whose role
 * is the sub's name and whose seat is the seat's name (case and outer spaces ignored) and which has phase. Says which
 * pairs have no file, and which have only files without phase.
 */
export function seatBalanceMeasuredRequestFromDocument(doc: SystemDocument, measurements: readonly SeatBalanceMeasurementRef[]): SeatBalanceMeasuredDocumentRequest {
  const key = (v: string | null) => (v ?? '').trim().toLowerCase();
  const missing: { sub: string; seat: string }[] = [];
  const withoutPhase: { sub: string; seat: string; name: string }[] = [];
  const picked: { sub: string; seat: string; measurementId: string; name: string }[] = [];
  for (const sub of doc.subs) {
    for (const seat of doc.seats) {
      const matching = measurements.filter((m) => key(m.role) === key(sub.name) && key(m.seat) === key(seat.name));
      const usable = matching.find((m) => m.hasPhase);
      if (usable) picked.push({ sub: sub.name, seat: seat.name, measurementId: usable.id, name: usable.name });
      else if (matching[0]) withoutPhase.push({ sub: sub.name, seat: seat.name, name: matching[0].name });
      else missing.push({ sub: sub.name, seat: seat.name });
    }
  }
  if (doc.subs.length === 0 || doc.seats.length < 2) return { ok: false, reason: 'Seat balance needs a sub and at least two seats.', missing, withoutPhase };
  const processorDelays = systemChannelSettings(doc).subs.map((c) => c.delayMs);
  if (missing.length || withoutPhase.length) {
    const parts = [
      missing.length ? `${missing.length} sub-and-seat pair${missing.length === 1 ? ' has' : 's have'} no measurement` : '',
      withoutPhase.length ? `${withoutPhase.length} only without phase` : '',
    ].filter(Boolean);
    return { ok: false, reason: `${parts.join('; ')}. Upload one file per sub per seat, with phase from one timing reference: role = the sub's name, seat = the seat's name.`, missing, withoutPhase };
  }
  return {
    ok: true,
    body: {
      seats: doc.seats.map((s) => ({ name: s.name })),
      // The files hold no processing: the present settings are the whole processor delay (alignment and own).
      subs: doc.subs.map((s, i) => ({ name: s.name, present: { delayMs: roundTo((processorDelays[i] as number) - Math.min(...processorDelays), 2), gainDb: s.gainDb, invert: s.invert } })),
      measurements: picked.map(({ sub, seat, measurementId }) => ({ sub, seat, measurementId })),
      band: { ...SYSTEM_SEAT_BALANCE_BAND },
      grid: { ...SYSTEM_SEAT_BALANCE_GRID },
    },
    used: picked.map(({ sub, seat, name }) => ({ sub, seat, name })),
  };
}
