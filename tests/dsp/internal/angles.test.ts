import { describe, expect, it } from 'vitest';
import { DEG_TO_RAD, LN_POWER_TO_DB, RAD_TO_DEG, wrapDeg } from '@/dsp/internal/angles';
import { assertInDelta } from '../../helpers/assert-in-delta';

describe('wrapDeg', () => {
  it('wraps to (−180, 180]: 180 stays, −180 becomes 180, whole turns vanish (geometry)', () => {
    expect(wrapDeg(180)).toBe(180);
    expect(wrapDeg(-180)).toBe(180);
    expect(wrapDeg(540)).toBe(180);
    expect(wrapDeg(-540)).toBe(180);
    expect(wrapDeg(0)).toBe(0);
    expect(wrapDeg(720)).toBe(0);
    expect(wrapDeg(190)).toBe(-170);
    expect(wrapDeg(-190)).toBe(170);
    expect(wrapDeg(359)).toBe(-1);
    expect(wrapDeg(-181)).toBe(179);
  });
  it('keeps the direction: cos and sin of the wrapped angle equal those of the angle (geometry)', () => {
    for (let a = -2000; a <= 2000; a += 37.3) {
      const w = wrapDeg(a);
      expect(w).toBeGreaterThan(-180);
      expect(w).toBeLessThanOrEqual(180);
      assertInDelta(Math.cos(w * (Math.PI / 180)), Math.cos(a * (Math.PI / 180)), 1e-9, `cos ${a}`);
      assertInDelta(Math.sin(w * (Math.PI / 180)), Math.sin(a * (Math.PI / 180)), 1e-9, `sin ${a}`);
    }
  });
});

describe('angle and level constants', () => {
  it('π rad is 180°, 180° is π rad, and ln(power) of 10 is 10 dB (definitions)', () => {
    assertInDelta(Math.PI * RAD_TO_DEG, 180, 1e-12);
    assertInDelta(180 * DEG_TO_RAD, Math.PI, 1e-15);
    assertInDelta(LN_POWER_TO_DB * Math.log(10), 10, 1e-12);
    assertInDelta(LN_POWER_TO_DB * Math.log(2), 3.0103, 1e-4);
  });
});
