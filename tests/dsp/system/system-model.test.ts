import { describe, expect, it } from 'vitest';
import { blendResponse, retimeSources, systemPaths, type SystemModel } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

const lr4 = { family: 'linkwitz-riley' as const, order: 4 };
const model: SystemModel = {
  temperatureC: 20,
  crossoverHz: 80,
  mainsHighpass: { family: 'butterworth', order: 2 },
  subLowpass: lr4,
  mains: { name: 'L', distanceM: 3, delayMs: 1, gainDb: 0, invert: false, rolloff: { kind: 'sealed', cornerHz: 50, q: 0.7 } },
  subs: [
    { name: 'Sub 1', distanceM: 4, delayMs: 0, gainDb: -1.5, invert: true, rolloff: [{ kind: 'vented', cornerHz: 20 }, { kind: 'lowpass', cornerHz: 160, q: 0.7 }] },
    { name: 'Sub 2', distanceM: 2.5, delayMs: 2, gainDb: 0.5, invert: false },
  ],
};

describe('systemPaths', () => {
  it('the main channel first with the high-pass at the crossover, then every sub with the low-pass, each with its own settings (written out by hand)', () => {
    expect(systemPaths(model)).toEqual([
      { name: 'L', filter: { family: 'butterworth', order: 2, response: 'highpass', cornerHz: 80 }, rolloff: { kind: 'sealed', cornerHz: 50, q: 0.7 }, gainDb: 0, delayMs: 1, invert: false, distanceM: 3 },
      { name: 'Sub 1', filter: { family: 'linkwitz-riley', order: 4, response: 'lowpass', cornerHz: 80 }, rolloff: [{ kind: 'vented', cornerHz: 20 }, { kind: 'lowpass', cornerHz: 160, q: 0.7 }], gainDb: -1.5, delayMs: 0, invert: true, distanceM: 4 },
      { name: 'Sub 2', filter: { family: 'linkwitz-riley', order: 4, response: 'lowpass', cornerHz: 80 }, gainDb: 0.5, delayMs: 2, invert: false, distanceM: 2.5 },
    ]);
    expect('rolloff' in (systemPaths(model)[2] as object)).toBe(false);
  });
  it('an LR4 main and sub at the same distance, level and delay sum flat (published: Linkwitz 1976)', () => {
    const flat: SystemModel = { ...model, mainsHighpass: lr4, mains: { ...model.mains, rolloff: undefined }, subs: [{ name: 'Sub', distanceM: 3, delayMs: 1, gainDb: 0, invert: false }] };
    const r = blendResponse({ temperatureC: 20, frequencyHz: [20, 40, 80, 160, 320], paths: systemPaths(flat) });
    assertInDelta(r.sum.magnitudeDb, [0, 0, 0, 0, 0], 1e-9);
  });
});

describe('retimeSources', () => {
  it('moves each sub by its shift and flips it when asked; the delay all sources share is taken out (by hand)', () => {
    // Sub delays 0 − 0.5 = −0.5 and 2 + 0.3 = 2.3 ms, mains 1 ms: the smallest, −0.5 ms, comes off every source.
    const r = retimeSources(model, [{ shiftMs: -0.5, flip: true }, { shiftMs: 0.3, flip: false }]);
    assertInDelta(r.mains.delayMs, 1.5, 1e-12);
    assertInDelta(r.subs[0]!.delayMs, 0, 1e-12);
    assertInDelta(r.subs[1]!.delayMs, 2.8, 1e-12);
    expect(r.subs.map((s) => s.invert)).toEqual([false, false]);
    // Everything else stays.
    expect({ ...r, mains: { ...r.mains, delayMs: 1 }, subs: r.subs.map((s, k) => ({ ...s, delayMs: model.subs[k]!.delayMs, invert: model.subs[k]!.invert })) }).toEqual(model);
  });
  it('keeps every difference between the sources’ delays except the shifts, so the sum at the seat only moves by them', () => {
    const r = retimeSources(model, [{ shiftMs: 4, flip: false }]);
    // Sub 1 0 + 4 = 4 ms, mains 1 ms, Sub 2 2 ms: the smallest, 1 ms, comes off all three; the differences stay.
    expect([r.mains.delayMs, r.subs[0]!.delayMs, r.subs[1]!.delayMs]).toEqual([0, 3, 1]);
    const none = retimeSources(model, []);
    // No change: the shared 0 ms stays; the smallest delay is already 0 (Sub 1).
    expect([none.mains.delayMs, none.subs[0]!.delayMs, none.subs[1]!.delayMs]).toEqual([1, 0, 2]);
  });
  it('leaves its input alone', () => {
    const copy = JSON.parse(JSON.stringify(model)) as SystemModel;
    retimeSources(model, [{ shiftMs: -3, flip: true }, { shiftMs: 1, flip: true }]);
    expect(model).toEqual(copy);
  });
});
