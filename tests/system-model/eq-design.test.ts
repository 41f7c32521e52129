/**
 * The EQ designer on a System, proven by applying it: the request built from the document hears the subs as Modes
 * does (the same modal sum, with each sub's gain, delay and polarity) through their roll-offs and the crossover
 * low-pass; the answer is written into the document as the Apply button will; and the applied document, run through the
 * model again (its subs now with that EQ), shows the residual the designer promised.
 */
import { describe, expect, it } from 'vitest';
import { summedModalResponse } from '@/dsp';
import { juniperLaneDocument } from '@/lib/demo/systems';
import { applyEqDesignToDocument, computeEqDesign, eqDesignModelCurve, eqDesignRequestFromDocument, type EqDesignAnswer } from '@/lib/system-model/eq-design';
import { roomResponseRequestFromDocument } from '@/lib/system-model/room-response';
import { roomResponseRequestSchema } from '@/lib/validations/compute-room';
import type { SystemDocument } from '@/lib/validations/system';
import { residualOf } from '../dsp/eq/eq-oracle';
import { testSystem } from './test-system';

function requestOf(doc: SystemDocument, options: Parameters<typeof eqDesignRequestFromDocument>[1] = {}) {
  const r = eqDesignRequestFromDocument(doc, options);
  if (!r.ok) throw new Error(r.reason);
  return r.request;
}

// Levels of the test System's sub profile and crossover, from their analog formulas (independent of the code):
// vented = 4th-order Butterworth high-pass, |H|² = x⁸/(1 + x⁸) (Thiele 1971); upper roll-off, second order with Q,
// |H|² = 1/((1 − x²)² + (x/Q)²); LR4 low-pass, |H| = 1/(1 + x⁴) (Linkwitz 1976: a Butterworth 2nd order squared) — the
// analog filter, as the one model (Blend) hears it; the processor's digital filter differs from it by under 0.001 dB in
// this band at 48 kHz (tests/dsp/filters).
const ventedDb = (f: number, fc: number) => 10 * Math.log10((f / fc) ** 8 / (1 + (f / fc) ** 8));
const secondOrderLowpassDb = (f: number, fc: number, q: number) => -10 * Math.log10((1 - (f / fc) ** 2) ** 2 + (f / fc / q) ** 2);
const lr4LowpassDb = (f: number, fc: number) => -20 * Math.log10(1 + (f / fc) ** 4);

describe('eqDesignRequestFromDocument: the subs as they play now', () => {
  it('at the MLP: each sub’s gain with its boxes, its processor delay as Modes sets it, its polarity, both roll-offs; the crossover low-pass; the processor’s rate; the Modes grid', () => {
    const doc = testSystem();
    const r = requestOf(doc);
    expect(r.at).toBe('Centre chair');
    const modes = roomResponseRequestSchema.parse(roomResponseRequestFromDocument(doc));
    r.subs.forEach((s, i) => {
      expect(s.gainDb).toBeCloseTo(modes.subs[i]!.gainDb, 12);
      expect(s.delayMs).toBeCloseTo(modes.subs[i]!.delayMs, 12);
      expect(s.invert).toBe(modes.subs[i]!.invert);
      expect(s.rolloffs).toEqual([{ kind: 'vented', cornerHz: 20 }, { kind: 'lowpass', cornerHz: 180, q: 0.7 }]);
      expect(s.eq).toEqual([]);
    });
    expect(r.subs[0]!.gainDb).toBeCloseTo(20 * Math.log10(2), 12); // Sub A has two boxes
    expect(r.lowpass).toEqual({ family: 'linkwitz-riley', order: 4, cornerHz: 80 });
    expect(r.sampleRateHz).toBe(48000);
    expect(r.grid).toEqual({ startHz: 15, stopHz: 200, pointsPerOctave: 48 });
    expect(r.band).toEqual({ startHz: 20, stopHz: 120 });
    expect(requestOf(doc, { at: 'average', maxFilters: 3, target: { kind: 'house', riseDb: 4, belowHz: 50 } })).toMatchObject({ at: 'average', maxFilters: 3, target: { kind: 'house', riseDb: 4, belowHz: 50 } });
  });

  it('says why it cannot: no sub, a sub outside the room, a bad option', () => {
    const doc = testSystem();
    expect(eqDesignRequestFromDocument({ ...doc, subs: [] })).toMatchObject({ ok: false, reason: expect.stringMatching(/Add a sub/) });
    expect(eqDesignRequestFromDocument({ ...doc, subs: [{ ...doc.subs[0]!, xM: 9 }] })).toMatchObject({ ok: false, reason: expect.stringMatching(/outside the room/) });
    expect(eqDesignRequestFromDocument(doc, { maxFilters: 12 })).toMatchObject({ ok: false, reason: expect.stringMatching(/^maxFilters/) });
  });

  it('its curve is the Modes tab’s modal sum at the MLP times the roll-offs and the processor’s low-pass', () => {
    const doc = testSystem();
    const curve = eqDesignModelCurve(requestOf(doc));
    const modes = roomResponseRequestSchema.parse(roomResponseRequestFromDocument(doc));
    const mlp = modes.seats.find((s) => s.name === 'Centre chair')!;
    const sum = summedModalResponse({
      room: modes.room,
      sources: modes.subs.map((s) => ({ positionM: { x: s.xM, y: s.yM, z: s.zM }, gainDb: s.gainDb, delayMs: s.delayMs, invert: s.invert })),
      receiverM: { x: mlp.xM, y: mlp.yM, z: mlp.zM },
      frequencyHz: curve.frequencyHz,
      rt60S: modes.room.rt60S,
      temperatureC: modes.room.temperatureC,
      maxModeHz: 1.5 * 200,
    });
    curve.frequencyHz.forEach((f, i) => {
      const expected = sum.sum.magnitudeDb[i]! + ventedDb(f, 20) + secondOrderLowpassDb(f, 180, 0.7) + lr4LowpassDb(f, 80);
      expect(Math.abs(curve.magnitudeDb[i]! - expected)).toBeLessThan(1e-6);
      // followLowpass: the target follows the low-pass.
      expect(Math.abs(curve.targetShapeDb![i]! - lr4LowpassDb(f, 80))).toBeLessThan(1e-6);
    });
  });
});

describe('applyEqDesignToDocument, then the model again', () => {
  /** The residual of the applied document, recomputed through the model path against the answer's target. */
  function residualAfterApplying(doc: SystemDocument, answer: EqDesignAnswer, at: 'mlp' | 'average') {
    const applied = applyEqDesignToDocument(doc, answer);
    const curve = eqDesignModelCurve(requestOf(applied, { at, withPresentEq: true }));
    const relative = Array.from(curve.magnitudeDb, (v) => v - answer.levelOffsetDb);
    return { applied, residual: residualOf(curve.frequencyHz, relative, answer.targetDb, answer.band, answer.nulls) };
  }

  it.each<['mlp' | 'average', string]>([
    ['mlp', 'model at Centre chair'],
    ['average', 'model, power average of 2 seats'],
  ])('the test System at %s: writes the same EQ on every sub, and the applied System shows the residual promised (within the answer’s 0.01 dB rounding)', (at, input) => {
    const doc = testSystem();
    const answer = computeEqDesign(requestOf(doc, { at }));
    expect(answer.input).toBe(input);
    expect(answer.filters.length).toBeGreaterThan(0);
    expect(answer.residual.after.rmsDb).toBeLessThan(answer.residual.before.rmsDb);
    const { applied, residual } = residualAfterApplying(doc, answer, at);
    for (const s of applied.subs) expect(s.eq).toEqual(answer.filters);
    expect(Math.abs(residual.rmsDb - answer.residual.after.rmsDb)).toBeLessThan(0.011);
    expect(Math.abs(residual.maxDb - answer.residual.after.maxDb)).toBeLessThan(0.011);
  });

  it.each<['mlp' | 'average']>([['mlp'], ['average']])('at %s, the check after Apply (the present EQ on, the design’s own target level) reads as its “before” the residual the design promised', (at) => {
    const doc = testSystem();
    const answer = computeEqDesign(requestOf(doc, { at }));
    const check = computeEqDesign(requestOf(applyEqDesignToDocument(doc, answer), { at, withPresentEq: true, targetLevelDb: answer.levelOffsetDb }));
    expect(check.levelOffsetDb).toBe(answer.levelOffsetDb);
    // The nulls are found again on the equalised curve; the promise's were found before EQ: a few hundredths may differ.
    expect(Math.abs(check.residual.before.rmsDb - answer.residual.after.rmsDb)).toBeLessThan(0.05);
    expect(Math.abs(check.residual.before.maxDb - answer.residual.after.maxDb)).toBeLessThan(0.05);
  });

  it('the invented demo room (Juniper Lane) at the MLP, with a house curve: the same, and the rest of the document untouched', () => {
    const doc = juniperLaneDocument();
    const answer = computeEqDesign(requestOf(doc, { target: { kind: 'house', riseDb: 5, belowHz: 50 } }));
    const { applied, residual } = residualAfterApplying(doc, answer, 'mlp');
    expect(Math.abs(residual.rmsDb - answer.residual.after.rmsDb)).toBeLessThan(0.011);
    expect({ ...applied, subs: applied.subs.map((s) => ({ ...s, eq: [] })) }).toEqual({ ...doc, subs: doc.subs.map((s) => ({ ...s, eq: [] })) });
  });

  it('replaces the EQ the subs had, and designing again from the applied System finds the same filters (it designs without the present EQ)', () => {
    const doc = testSystem();
    const old = [{ kind: 'peaking' as const, centerHz: 33, gainDb: -4, q: 2 }];
    const withOld = { ...doc, subs: doc.subs.map((s) => ({ ...s, eq: old })) };
    const answer = computeEqDesign(requestOf(withOld));
    expect(answer).toEqual(computeEqDesign(requestOf(doc)));
    const applied = applyEqDesignToDocument(withOld, answer);
    for (const s of applied.subs) expect(s.eq).toEqual(answer.filters);
    expect(computeEqDesign(requestOf(applied)).filters).toEqual(answer.filters);
  });
});
