import { describe, expect, it } from 'vitest';
import { nearCoincidentModes, roomModes } from '@/dsp';

describe('nearCoincidentModes', () => {
  it('a cube has coincident axial modes (1,0,0), (0,1,0), (0,0,1) (published: Bonello 1981 — cubes are the classic bad case)', () => {
    const { modes } = roomModes({ lengthM: 4, widthM: 4, heightM: 4, maxHz: 50, temperatureC: 20 });
    const pairs = nearCoincidentModes(modes, { toleranceHz: 0.01 });
    expect(pairs.filter((p) => p.lower.kind === 'axial' && p.upper.kind === 'axial').length).toBeGreaterThanOrEqual(3);
  });
  it('finds 63.56 (0,0,1) and 64.05 (2,1,0) in the 6.4 × 4.9 × 2.7 room within 1 %', () => {
    const { modes } = roomModes({ lengthM: 6.4, widthM: 4.9, heightM: 2.7, maxHz: 70, temperatureC: 20 });
    const pairs = nearCoincidentModes(modes, { tolerancePercent: 1 });
    expect(pairs.some((p) => p.lower.indices.join() === '0,0,1' && p.upper.indices.join() === '2,1,0')).toBe(true);
  });
  it('throws RangeError naming toleranceHz', () => {
    expect(() => nearCoincidentModes([], { toleranceHz: -1 })).toThrow(/toleranceHz/);
  });
});
