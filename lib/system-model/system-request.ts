/**
 * The whole system as the Timing and Crossover sweep requests carry it (one main channel and every sub, as the
 * processor runs them), both ways: from the model built from the document, and back to the model dsp evaluates.
 * Shared by the Timing and Crossover sweep features so neither imports the other.
 */
import type { EqFilter, RolloffChain, RolloffSpec, SystemModel, SystemSource } from '@/dsp';
import type { TimingRequest } from '@/lib/validations/compute-blend';
import { roundTo } from './rounding';

/** The part of a Timing or Crossover sweep request that describes the system. */
export type SystemRequest = Pick<TimingRequest, 'temperatureC' | 'crossoverHz' | 'mainsHighpass' | 'subLowpass' | 'mains' | 'subs'>;

/** A roll-off chain as the request schema takes it (a plain array). */
const asChain = (r: RolloffChain): RolloffSpec | RolloffSpec[] => (Array.isArray(r) ? [...r] : (r as RolloffSpec));

/** A source's EQ as the request carries it: a plain array, left out when there is none. */
const eqOf = (s: SystemSource): { eq?: EqFilter[] } => (s.eq && s.eq.length > 0 ? { eq: [...s.eq] } : {});

/** The system part of a request for a model: distances to 0.1 mm, sub levels within the schema's ±60 dB. */
export function systemRequestFromModel(model: SystemModel): SystemRequest {
  return {
    temperatureC: model.temperatureC,
    crossoverHz: model.crossoverHz,
    mainsHighpass: { ...model.mainsHighpass },
    subLowpass: { ...model.subLowpass },
    mains: { name: model.mains.name, distanceM: roundTo(model.mains.distanceM, 4), delayMs: model.mains.delayMs, gainDb: model.mains.gainDb, rolloff: asChain(model.mains.rolloff ?? { kind: 'none' }) as TimingRequest['mains']['rolloff'], ...eqOf(model.mains) },
    subs: model.subs.map((s) => ({
      name: s.name,
      distanceM: roundTo(s.distanceM, 4),
      delayMs: s.delayMs,
      gainDb: Math.max(-60, Math.min(60, s.gainDb)),
      invert: s.invert,
      rolloff: asChain(s.rolloff ?? { kind: 'none' }),
      ...eqOf(s),
    })),
  };
}

/** The whole-system model a Timing or Crossover sweep request describes. */
export function systemModelFromRequest(req: SystemRequest): SystemModel {
  return {
    temperatureC: req.temperatureC,
    crossoverHz: req.crossoverHz,
    mainsHighpass: req.mainsHighpass,
    subLowpass: req.subLowpass,
    mains: { name: req.mains.name, distanceM: req.mains.distanceM, delayMs: req.mains.delayMs, gainDb: req.mains.gainDb, invert: false, rolloff: req.mains.rolloff, ...(req.mains.eq ? { eq: req.mains.eq } : {}) },
    subs: req.subs.map((s) => ({ name: s.name, distanceM: s.distanceM, delayMs: s.delayMs, gainDb: s.gainDb, invert: s.invert, rolloff: s.rolloff, ...(s.eq ? { eq: s.eq } : {}) })),
  };
}
