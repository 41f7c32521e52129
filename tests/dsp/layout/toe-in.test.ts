import { describe, expect, it } from 'vitest';
import { toeInDeg } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

describe('toeInDeg (geometry)', () => {
  it('a speaker 1.5 m left of the aim line and 1.5·√3 m in front turns 30° toward +x', () => {
    const r = toeInDeg({ speakerM: { x: 1, y: 0.5, z: 1 }, aimM: { x: 2.5, y: 0.5 + 1.5 * Math.sqrt(3), z: 1 } });
    assertInDelta(r.toeInDeg, 30, 1e-9);
    assertInDelta(r.rotationDeg, 30, 1e-9);
    assertInDelta(r.tiltDeg, 0, 1e-12);
  });
  it('is measured from facingDeg', () => {
    assertInDelta(toeInDeg({ speakerM: { x: 0, y: 0, z: 0 }, aimM: { x: 1, y: 1, z: 0 }, facingDeg: 45 }).toeInDeg, 0, 1e-9);
  });
  it('throws RangeError naming aimM when it coincides with the speaker', () => {
    expect(() => toeInDeg({ speakerM: { x: 0, y: 0, z: 0 }, aimM: { x: 0, y: 0, z: 1 } })).toThrow(/aimM/);
  });
});
