import { describe, expect, it } from 'vitest';
import type { SystemModel } from '@/dsp';
import { systemModelFromRequest, systemRequestFromModel } from '@/lib/system-model/system-request';

/** A model written by hand: one main channel and two subs, one sub with no roll-off given. */
const model: SystemModel = {
  temperatureC: 22,
  crossoverHz: 90,
  mainsHighpass: { family: 'butterworth', order: 2 },
  subLowpass: { family: 'linkwitz-riley', order: 4 },
  mains: { name: 'L', distanceM: 3.14159265, delayMs: 1.25, gainDb: -1, invert: false, rolloff: { kind: 'sealed', cornerHz: 60, q: 0.7 } },
  subs: [
    { name: 'Front', distanceM: 2.718281828, delayMs: 0, gainDb: 75, invert: true, rolloff: [{ kind: 'sealed', cornerHz: 25, q: 0.7 }, { kind: 'lowpass', cornerHz: 180, q: 0.7 }] },
    { name: 'Back', distanceM: 4, delayMs: 3.5, gainDb: -80, invert: false },
  ],
};

describe('systemRequestFromModel and systemModelFromRequest: the system part of Timing and Crossover sweep requests', () => {
  it('distances to 0.1 mm, sub levels held within ±60 dB, missing roll-offs sent as none', () => {
    const req = systemRequestFromModel(model);
    expect(req.temperatureC).toBe(22);
    expect(req.crossoverHz).toBe(90);
    expect(req.mains).toEqual({ name: 'L', distanceM: 3.1416, delayMs: 1.25, gainDb: -1, rolloff: { kind: 'sealed', cornerHz: 60, q: 0.7 } });
    expect(req.subs.map((s) => s.distanceM)).toEqual([2.7183, 4]);
    expect(req.subs.map((s) => s.gainDb)).toEqual([60, -60]);
    expect(req.subs.map((s) => s.invert)).toEqual([true, false]);
    expect(req.subs[1]!.rolloff).toEqual({ kind: 'none' });
  });

  it('copies what it sends: changing the request leaves the model alone', () => {
    const req = systemRequestFromModel(model);
    expect(req.subs[0]!.rolloff).toEqual(model.subs[0]!.rolloff);
    expect(req.subs[0]!.rolloff).not.toBe(model.subs[0]!.rolloff);
    expect(req.mainsHighpass).not.toBe(model.mainsHighpass);
  });

  it('back to the model: every field as sent, the mains never inverted', () => {
    const back = systemModelFromRequest(systemRequestFromModel(model));
    expect(back.mains).toEqual({ name: 'L', distanceM: 3.1416, delayMs: 1.25, gainDb: -1, invert: false, rolloff: model.mains.rolloff });
    expect(back.subs[0]).toEqual({ name: 'Front', distanceM: 2.7183, delayMs: 0, gainDb: 60, invert: true, rolloff: model.subs[0]!.rolloff });
    expect(back.subs[1]).toEqual({ name: 'Back', distanceM: 4, delayMs: 3.5, gainDb: -60, invert: false, rolloff: { kind: 'none' } });
    expect({ t: back.temperatureC, fc: back.crossoverHz, hp: back.mainsHighpass, lp: back.subLowpass }).toEqual({ t: 22, fc: 90, hp: model.mainsHighpass, lp: model.subLowpass });
  });
});
