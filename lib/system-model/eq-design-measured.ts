/**
 * The EQ designer on stored measurements (POST /api/v1/eq-design with `measurements`): which files a System's subs and
 * seats offer (`eqDesignMeasuredRequestFromDocument`) and the design on them (`computeMeasuredEqDesign`).
 *
 * Two kinds of file are accepted, and the answer says which was used:
 * - each sub alone at a seat (role = the sub's name, as Seat balance picks them), taken without processing: the subs
 *   are summed with their present gain, polarity and processor delay and the crossover low-pass. Summing needs phase
 *   from one timing reference; without phase only a System with one sub can use them (one sub's magnitude is enough).
 * - every sub playing together through the processor as it is set now, EQ bypassed (role "subs" or "all subs"): used
 *   as measured, magnitude only (phase not needed, nothing added).
 * Several seats are power-averaged.
 */
import { logFrequencyGridHz, measuredSeatTransfer, pathResponse, pathsThroughRoomPower, resampleCurve } from '@/dsp';
import { invalid } from '@/lib/errors';
import { eqDesignMeasuredRequestSchema, type EqDesignMeasuredRequest } from '@/lib/validations/compute-eq-design';
import type { SystemDocument } from '@/lib/validations/system';
import { systemChannelSettings } from './channel-settings';
import { mlpSeat } from './geometry';
import { roundTo, roundToSignificant } from './rounding';
import { eqDesignAnswer, lowpassLevelDb, subPath, type EqDesignAnswer, type EqDesignDocumentOptions } from './eq-design';

/** The roles that mark a file measured with every sub playing together. */
const ALL_SUBS_ROLES: readonly string[] = ['subs', 'all subs'];

/** A stored measurement as the Library lists it (no points). */
export interface EqMeasurementRef {
  id: string;
  name: string;
  seat: string | null;
  role: string | null;
  hasPhase: boolean;
}

/** The points of one stored measurement, as the route loads them. */
export interface StoredCurve {
  frequencyHz: readonly number[];
  magnitudeDb: readonly number[];
  phaseDeg: readonly number[] | null;
}

const key = (v: string | null | undefined) => (v ?? '').trim().toLowerCase();

/**
 * The measured request for a System's subs at the MLP (default) or every seat: for each seat, a file of each sub alone
 * (with phase; or, with one sub, without) or else a file of all subs together; the newest first. The kind that covers
 * more seats is used (each sub alone on a tie), on the seats it covers.
 */
export function eqDesignMeasuredRequestFromDocument(
  doc: SystemDocument,
  measurements: readonly EqMeasurementRef[],
  options: Omit<EqDesignDocumentOptions, 'withPresentEq'> = {},
): { ok: true; request: EqDesignMeasuredRequest; used: { seat: string; sub?: string; name: string }[] } | { ok: false; reason: string } {
  if (doc.subs.length === 0) return { ok: false, reason: 'Add a sub first: the EQ designer sets the EQ of the sub outputs.' };
  const { at = 'mlp', ...choices } = options;
  const seats = at === 'mlp' ? [mlpSeat(doc)] : doc.seats;
  const alone = (sub: string, seat: string) => measurements.find((m) => key(m.role) === key(sub) && key(m.seat) === key(seat) && (m.hasPhase || doc.subs.length === 1));
  const together = (seat: string) => measurements.find((m) => ALL_SUBS_ROLES.includes(key(m.role)) && key(m.seat) === key(seat));
  const perSub = seats.filter((seat) => doc.subs.every((sub) => alone(sub.name, seat.name)));
  const all = seats.filter((seat) => together(seat.name));
  if (perSub.length === 0 && all.length === 0) {
    const where = at === 'mlp' ? `at the MLP (${seats[0]?.name})` : 'at any seat';
    return { ok: false, reason: `No usable measurement ${where}. Upload, per seat (seat = the seat's name), one file of each sub alone with phase (role = the sub's name) or one file of every sub playing together with the subs’ EQ bypassed (role = "all subs").` };
  }
  const usePerSub = perSub.length >= all.length;
  const used: { seat: string; sub?: string; name: string }[] = [];
  const rows: { seat: string; sub?: string; measurementId: string }[] = [];
  for (const seat of usePerSub ? perSub : all) {
    if (usePerSub) {
      for (const sub of doc.subs) {
        const m = alone(sub.name, seat.name)!;
        rows.push({ seat: seat.name, sub: sub.name, measurementId: m.id });
        used.push({ seat: seat.name, sub: sub.name, name: m.name });
      }
    } else {
      const m = together(seat.name)!;
      rows.push({ seat: seat.name, measurementId: m.id });
      used.push({ seat: seat.name, name: m.name });
    }
  }
  const delays = systemChannelSettings(doc).subs.map((c) => c.delayMs);
  const bm = doc.bassManagement;
  const parsed = eqDesignMeasuredRequestSchema.safeParse({
    measurements: rows,
    // The files hold no processing: each sub's whole processor delay (alignment and its own), its gain and polarity.
    ...(usePerSub ? { subs: doc.subs.map((s, i) => ({ name: s.name, gainDb: s.gainDb, delayMs: Math.min(100, roundTo((delays[i] as number) - Math.min(...delays), 2)), invert: s.invert })) } : {}),
    lowpass: { family: bm.subLowpass.family, order: bm.subLowpass.order, cornerHz: bm.crossoverHz },
    sampleRateHz: bm.sampleRateHz,
    ...choices,
  });
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    return { ok: false, reason: issue ? `${issue.path.join('.')}: ${issue.message}` : 'The measurements cannot be used as they are.' };
  }
  return { ok: true, request: parsed.data, used };
}

/** POST /api/v1/eq-design on measurements: `curves[i]` is the measurement named by `request.measurements[i]`. */
export function computeMeasuredEqDesign(request: EqDesignMeasuredRequest, curves: readonly StoredCurve[]): EqDesignAnswer {
  const grid = logFrequencyGridHz(request.grid);
  // The grid points every file covers; the band must lie inside them.
  let fromHz = 0;
  let toHz = Infinity;
  let limiting = 0;
  curves.forEach((c, i) => {
    const first = c.frequencyHz[0] ?? Infinity;
    const last = c.frequencyHz[c.frequencyHz.length - 1] ?? 0;
    if (first > request.band.startHz * (1 + 1e-9) || last < request.band.stopHz * (1 - 1e-9)) limiting = i;
    fromHz = Math.max(fromHz, first);
    toHz = Math.min(toHz, last);
  });
  const path = (i: number) => `measurements.${i}.measurementId`;
  if (fromHz > request.band.startHz * (1 + 1e-9) || toHz < request.band.stopHz * (1 - 1e-9)) {
    const c = curves[limiting]!;
    const message = `covers ${roundToSignificant(c.frequencyHz[0] ?? 0, 4)}–${roundToSignificant(c.frequencyHz[c.frequencyHz.length - 1] ?? 0, 4)} Hz; the band needs ${request.band.startHz}–${request.band.stopHz} Hz`;
    throw invalid(`${path(limiting)}: ${message}`, [{ path: path(limiting), message }]);
  }
  const f = grid.filter((x) => x >= fromHz * (1 - 1e-12) && x <= toHz * (1 + 1e-12));
  const n = f.length;
  const seats: string[] = [];
  for (const m of request.measurements) if (!seats.some((s) => key(s) === key(m.seat))) seats.push(m.seat);
  const power = new Float64Array(n);
  const subs = request.subs ?? [];
  const perSub = request.measurements[0]?.sub !== undefined;
  // Per-sub files hold no processing: each sub's path (dsp's, as Blend hears it: the crossover low-pass, gain,
  // polarity, delay; its roll-offs are in the file) is applied here; files of all subs together already hold it.
  const paths = perSub ? subs.map((sub) => pathResponse(subPath(sub, request.lowpass), f)) : [];
  for (const seat of seats) {
    const index = (sub?: string) => request.measurements.findIndex((m) => key(m.seat) === key(seat) && key(m.sub) === key(sub));
    let seatPower: Float64Array;
    if (!perSub) {
      const r = resampleCurve({ ...curves[index()]!, phaseDeg: undefined, targetHz: f });
      seatPower = r.magnitudeDb.map((db) => Math.pow(10, db / 10));
    } else if (subs.length === 1 && !curves[index(subs[0]!.name)]!.phaseDeg) {
      // One sub without phase: its magnitude is all there is; the path's level applies (delay and polarity change nothing).
      const r = resampleCurve({ ...curves[index(subs[0]!.name)]!, phaseDeg: undefined, targetHz: f });
      seatPower = r.magnitudeDb.map((db, k) => Math.pow(10, (db + (paths[0]!.magnitudeDb[k] as number)) / 10));
    } else {
      const transfers = subs.map((sub) => {
        const i = index(sub.name);
        const c = curves[i]!;
        if (!c.phaseDeg) throw invalid(`${path(i)}: ${sub.name} at ${seat} has no phase. Summing several subs needs phase measured from one timing reference; or upload one file per seat with every sub playing (role "all subs") and leave \`sub\` out.`, [{ path: path(i), message: 'has no phase' }]);
        return [measuredSeatTransfer({ frequencyHz: c.frequencyHz, magnitudeDb: c.magnitudeDb, phaseDeg: c.phaseDeg, targetHz: f })];
      });
      seatPower = pathsThroughRoomPower(transfers, paths)[0]!;
    }
    seatPower.forEach((p, k) => (power[k] = (power[k] as number) + p / seats.length));
  }
  const where = seats.length === 1 ? `measured at ${seats[0]}` : `measured, power average of ${seats.length} seats`;
  const how = perSub ? (subs.length === 1 && curves.every((c) => !c.phaseDeg) ? 'the sub alone, magnitude' : 'each sub alone with phase, summed with its present settings') : 'every sub playing together';
  const curve = { frequencyHz: f, magnitudeDb: power.map((p) => 10 * Math.log10(p + 1e-300)), ...(request.lowpass && request.followLowpass ? { targetShapeDb: lowpassLevelDb(request.lowpass, f) } : {}) };
  return eqDesignAnswer(curve, request, { source: 'measured', input: `${where} (${how})`, seats });
}
