/**
 * The EQ designer on a System (issue 16): the request for its subs at the MLP or the seats' average on the modal model
 * (`eqDesignRequestFromDocument`), the compute behind POST /api/v1/eq-design for an inline curve or the model
 * (`computeEqDesign`; stored measurements are in eq-design-measured.ts), and the answer written back as the same EQ on
 * every sub output (`applyEqDesignToDocument`). The mathematics is dsp's: modalTransfers for the room, each sub's path as
 * Blend hears it (pathResponse: the crossover low-pass, roll-offs, voicing, EQ, gain, polarity, delay), their sum at the
 * seats (pathsThroughRoomPower), designEq for the search.
 */
import { designEq, logFrequencyGridHz, modalTransfers, pathResponse, pathsThroughRoomPower, type EqDesign, type EqFilter, type EqTarget, type PathSpec } from '@/dsp';
import type { EqDesignCurveRequest, EqDesignModelRequest } from '@/lib/validations/compute-eq-design';
import { eqDesignModelRequestSchema } from '@/lib/validations/compute-eq-design';
import type { SystemDocument } from '@/lib/validations/system';
import { systemChannelSettings } from './channel-settings';
import { mlpSeat, profileById, toPointM } from './geometry';
import { positionsOutsideRoom } from './room-bounds';
import { roundAllTo, roundAllToSignificant, roundTo, roundToSignificant } from './rounding';
import { subRolloffs } from './system-from-document';
import { voicingFilters } from './voicing';

type Levels = { rmsDb: number; maxDb: number };

/** The answer of POST /api/v1/eq-design. Curves are relative to the target's level (levelOffsetDb in the input's units). */
export interface EqDesignAnswer {
  source: 'curve' | 'model' | 'measured';
  /** Which input was used, in words ("model at Row 1 centre", "measured, power average of 3 seats"). */
  input: string;
  /** The seats the input came from (none for a curve). */
  seats: string[];
  filters: { kind: 'peaking'; centerHz: number; gainDb: number; q: number }[];
  /** The filters as biquads at sampleRateHz, H(z) = (b0 + b1·z⁻¹ + b2·z⁻²) / (1 + a1·z⁻¹ + a2·z⁻²), full precision. */
  sections: { b0: number; b1: number; b2: number; a1: number; a2: number }[];
  sampleRateHz: number;
  residual: { before: Levels; after: Levels };
  nulls: { frequencyHz: number; depthDb: number; lowHz: number; highHz: number; reason: string }[];
  frequencyHz: number[];
  inputDb: number[];
  targetDb: number[];
  eqDb: number[];
  correctedDb: number[];
  levelOffsetDb: number;
  band: { startHz: number; stopHz: number };
  target: EqTarget;
  caution: string;
}

const EQ_DESIGN_CAUTION = 'Boosting the sub’s low end costs amplifier and driver headroom; check the Headroom tab after EQ, and keep listening levels safe.';

/** The designer's options as the requests carry them. */
type DesignChoices = Pick<EqDesignModelRequest, 'target' | 'band' | 'maxFilters' | 'maxBoostDb' | 'maxCutDb' | 'q' | 'sampleRateHz' | 'nullDepthDb' | 'targetLevelDb'>;

/** One design, shaped for the answer: curves relative to the target's level, rounded at the edge. */
export function eqDesignAnswer(curve: { frequencyHz: Float64Array; magnitudeDb: Float64Array; targetShapeDb?: Float64Array | undefined }, r: DesignChoices, meta: Pick<EqDesignAnswer, 'source' | 'input' | 'seats'>): EqDesignAnswer {
  const d: EqDesign = designEq({
    frequencyHz: curve.frequencyHz,
    magnitudeDb: curve.magnitudeDb,
    ...(curve.targetShapeDb ? { targetShapeDb: curve.targetShapeDb } : {}),
    target: r.target,
    band: r.band,
    maxFilters: r.maxFilters,
    maxBoostDb: r.maxBoostDb,
    maxCutDb: r.maxCutDb,
    q: r.q,
    sampleRateHz: r.sampleRateHz,
    nullDepthDb: r.nullDepthDb,
    ...(r.targetLevelDb !== undefined ? { targetLevelDb: r.targetLevelDb } : {}),
  });
  const rel = (v: Float64Array) => roundAllTo(v.map((x) => x - d.levelOffsetDb), 2);
  const levels = (l: Levels) => ({ rmsDb: roundTo(l.rmsDb, 2), maxDb: roundTo(l.maxDb, 2) });
  return {
    ...meta,
    filters: d.filters.map((f) => ({ ...f })),
    sections: d.sections.map(({ b0, b1, b2, a1, a2 }) => ({ b0, b1, b2, a1, a2 })),
    sampleRateHz: d.sampleRateHz,
    residual: { before: levels(d.residual.before), after: levels(d.residual.after) },
    nulls: d.nulls.map((n) => ({ frequencyHz: roundToSignificant(n.frequencyHz, 4), depthDb: roundTo(n.depthDb, 1), lowHz: roundToSignificant(n.lowHz, 4), highHz: roundToSignificant(n.highHz, 4), reason: n.reason })),
    frequencyHz: roundAllToSignificant(d.frequencyHz, 6),
    inputDb: rel(d.inputDb),
    targetDb: rel(d.targetDb),
    eqDb: roundAllTo(d.eqDb, 2),
    correctedDb: rel(d.correctedDb),
    levelOffsetDb: roundTo(d.levelOffsetDb, 2),
    band: d.band,
    target: r.target,
    caution: EQ_DESIGN_CAUTION,
  };
}

/** The crossover low-pass as the model hears it (the same analog filter Blend sums), or a wire. */
function lowpassFilter(lowpass: EqDesignModelRequest['lowpass']): PathSpec['filter'] {
  return lowpass ? { family: lowpass.family, order: lowpass.order, response: 'lowpass', cornerHz: lowpass.cornerHz } : { family: 'butterworth', order: 1, response: 'none', cornerHz: 1 };
}

/** The low-pass's level on the grid (the target's shape when followLowpass), dB. */
export function lowpassLevelDb(lowpass: EqDesignModelRequest['lowpass'], frequencyHz: Float64Array): Float64Array {
  return pathResponse({ name: 'low-pass', filter: lowpassFilter(lowpass), gainDb: 0, delayMs: 0, invert: false }, frequencyHz).magnitudeDb;
}

/**
 * A sub's path as the model runs it (dsp's path, as Blend sums it): the crossover low-pass, `rolloffs` (its own, when the
 * curve it meets does not hold them already), its voicing and EQ, gain, polarity and processor delay; no air path (the
 * room's transfer holds it).
 */
export function subPath(unit: { name: string; gainDb: number; delayMs: number; invert: boolean; voicing?: readonly EqFilter[]; eq?: readonly EqFilter[] }, lowpass: EqDesignModelRequest['lowpass'], rolloffs: PathSpec['rolloff'] = []): PathSpec {
  return { name: unit.name, filter: lowpassFilter(lowpass), rolloff: rolloffs, eq: [...(unit.voicing ?? []), ...(unit.eq ?? [])], gainDb: unit.gainDb, delayMs: unit.delayMs, invert: unit.invert };
}

/** A level in dB of power |p|² (floored far below anything audible). */
const powerDb = (power: number) => 10 * Math.log10(power + 1e-300);

/**
 * The model's response the designer works on: at each seat every sub's modal transfer (the same modal sum as Modes and
 * Seat balance) times its path (dsp's pathResponse: the crossover low-pass, roll-offs, voicing, any EQ it already runs,
 * gain, polarity, processor delay), summed by dsp's pathsThroughRoomPower; at one seat, or the power average over the
 * seats. dB re 1 Pa per m³/s. Also the low-pass's level, the target's shape when followLowpass.
 */
export function eqDesignModelCurve(r: EqDesignModelRequest): { frequencyHz: Float64Array; magnitudeDb: Float64Array; targetShapeDb?: Float64Array; seats: string[] } {
  const f = logFrequencyGridHz(r.grid);
  const seats = r.at.toLowerCase() === 'average' ? r.seats : r.seats.filter((s) => s.name.toLowerCase() === r.at.toLowerCase());
  const t = modalTransfers({ room: r.room, sourcesM: r.subs.map(toPointM), receiversM: seats.map(toPointM), frequencyHz: f, rt60S: r.room.rt60S, temperatureC: r.room.temperatureC, maxModeHz: 1.5 * r.grid.stopHz });
  const paths = r.subs.map((sub) => pathResponse(subPath(sub, r.lowpass, sub.rolloffs), f, r.room.temperatureC));
  const perSeat = pathsThroughRoomPower(t.transfers, paths);
  const power = new Float64Array(f.length);
  for (const p of perSeat) p.forEach((x, i) => (power[i] = (power[i] as number) + x / perSeat.length));
  return {
    frequencyHz: f,
    magnitudeDb: power.map(powerDb),
    ...(r.lowpass && r.followLowpass ? { targetShapeDb: lowpassLevelDb(r.lowpass, f) } : {}),
    seats: seats.map((s) => s.name),
  };
}

/** POST /api/v1/eq-design for an inline curve or the modal model. */
export function computeEqDesign(request: EqDesignCurveRequest | EqDesignModelRequest): EqDesignAnswer {
  if ('frequencyHz' in request) {
    const curve = { frequencyHz: Float64Array.from(request.frequencyHz), magnitudeDb: Float64Array.from(request.magnitudeDb), targetShapeDb: request.targetShapeDb ? Float64Array.from(request.targetShapeDb) : undefined };
    return eqDesignAnswer(curve, request, { source: 'curve', input: 'the curve given', seats: [] });
  }
  const curve = eqDesignModelCurve(request);
  const input = curve.seats.length === 1 ? `model at ${curve.seats[0]}` : `model, power average of ${curve.seats.length} seats`;
  return eqDesignAnswer(curve, request, { source: 'model', input, seats: curve.seats });
}

/** What the caller picks beyond the System: where, the target and the designer's limits. */
export interface EqDesignDocumentOptions extends Partial<Omit<DesignChoices, 'sampleRateHz'>> {
  /** The MLP (default) or the power average over every seat. */
  at?: 'mlp' | 'average';
  /** Include the EQ the subs run now (to see what it does); the designer leaves it out, since its answer replaces it. */
  withPresentEq?: boolean;
}

/**
 * The model request for a System's subs: every sub as it plays now — its gain (and count of boxes), polarity, processor
 * delay as the channel settings set it (distance alignment and its own delay; the smallest made 0), both roll-offs of its
 * profile and the filters of its voicing switches — through the crossover low-pass at the processor's sample rate, at the MLP or the seats' power average, on
 * the Modes tab's grid (15–200 Hz, 48 points per octave), band 20–120 Hz unless given.
 */
export function eqDesignRequestFromDocument(doc: SystemDocument, options: EqDesignDocumentOptions = {}): { ok: true; request: EqDesignModelRequest } | { ok: false; reason: string } {
  if (doc.subs.length === 0) return { ok: false, reason: 'Add a sub first: the EQ designer sets the EQ of the sub outputs.' };
  const outside = positionsOutsideRoom(doc).filter((o) => /^(subs|seats)\./.test(o.path));
  if (outside.length > 0) return { ok: false, reason: 'A seat or sub stands outside the room: move it inside on Layout first.' };
  const { at = 'mlp', withPresentEq = false, ...choices } = options;
  const delays = systemChannelSettings(doc).subs.map((c) => c.delayMs);
  const bm = doc.bassManagement;
  const parsed = eqDesignModelRequestSchema.safeParse({
    room: { ...doc.room },
    seats: doc.seats.map((s) => ({ name: s.name, xM: s.xM, yM: s.yM, zM: s.zM })),
    at: at === 'mlp' ? mlpSeat(doc).name : 'average',
    subs: doc.subs.map((s, i) => ({
      name: s.name,
      xM: s.xM,
      yM: s.yM,
      zM: s.zM,
      gainDb: Math.max(-30, Math.min(30, s.gainDb + 20 * Math.log10(s.count))),
      delayMs: Math.min(100, roundTo((delays[i] as number) - Math.min(...delays), 2)),
      invert: s.invert,
      rolloffs: subRolloffs(profileById(doc, s.profileId)),
      voicing: voicingFilters(profileById(doc, s.profileId), s.voicing),
      ...(withPresentEq ? { eq: s.eq.map((e) => ({ ...e })) } : {}),
    })),
    lowpass: { family: bm.subLowpass.family, order: bm.subLowpass.order, cornerHz: bm.crossoverHz },
    sampleRateHz: bm.sampleRateHz,
    ...choices,
  });
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    return { ok: false, reason: issue ? `${issue.path.join('.')}: ${issue.message}` : 'The System cannot be equalised as it is.' };
  }
  return { ok: true, request: parsed.data };
}

/** Writes the designed filters as the EQ of every sub output (a common EQ on the subs; it replaces the previous EQ). */
export function applyEqDesignToDocument(doc: SystemDocument, answer: Pick<EqDesignAnswer, 'filters'>): SystemDocument {
  return { ...doc, subs: doc.subs.map((s) => ({ ...s, eq: answer.filters.map((f) => ({ kind: 'peaking' as const, centerHz: f.centerHz, gainDb: f.gainDb, q: f.q })) })) };
}
