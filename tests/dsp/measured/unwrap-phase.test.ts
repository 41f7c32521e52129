import { describe, expect, it } from 'vitest';
import { unwrapDeg } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

describe('unwrapDeg (common practice: each step taken as the one within ±180°)', () => {
  it('170°, −170° continues to 190°; −170°, 170° to −190°', () => {
    assertInDelta(unwrapDeg([170, -170]), [170, 190], 1e-12);
    assertInDelta(unwrapDeg([-170, 170]), [-170, -190], 1e-12);
  });
  it('a delay’s phase −360·f·τ, wrapped to (−180, 180], comes back whole when the steps stay under 180° (geometry)', () => {
    // τ = 9.7 ms on 20…1000 Hz in 1 Hz steps: each step is 3.5°, the whole curve −348° … −3492°.
    const f = Array.from({ length: 981 }, (_, i) => 20 + i);
    const exact = f.map((hz) => -360 * hz * 0.0097);
    const wrapped = exact.map((deg) => deg - 360 * Math.round(deg / 360));
    const back = unwrapDeg(wrapped);
    // The first point keeps its wrapped value; every later one follows it by whole turns.
    const offset = exact[0]! - wrapped[0]!;
    assertInDelta(back, exact.map((deg) => deg - offset), 1e-9);
  });
  it('keeps an input already continuous, and gives nothing for nothing', () => {
    assertInDelta(unwrapDeg(new Float64Array([0, 90, 179, 268])), [0, 90, 179, 268], 1e-12);
    expect(unwrapDeg([]).length).toBe(0);
    assertInDelta(unwrapDeg([-45]), [-45], 0);
  });
  it('leaves its input alone', () => {
    const input = [170, -170, 170];
    unwrapDeg(input);
    expect(input).toEqual([170, -170, 170]);
  });
});
