import { describe, expect, it } from 'vitest';
import { filterSections, rolloffSections } from '@/dsp';

describe('filterSections / rolloffSections', () => {
  it('LR8 is two copies of the BW4 sections (published: Linkwitz 1976)', () => {
    const lr = filterSections({ family: 'linkwitz-riley', order: 8, response: 'lowpass', cornerHz: 80 });
    const bw = filterSections({ family: 'butterworth', order: 4, response: 'lowpass', cornerHz: 80 });
    expect(lr).toEqual([...bw, ...bw]);
  });
  it("'none' has no sections and a roll-off 'none' neither", () => {
    expect(filterSections({ family: 'butterworth', order: 99, response: 'none', cornerHz: -1 })).toEqual([]);
    expect(rolloffSections({ kind: 'none' })).toEqual([]);
    expect(rolloffSections(undefined)).toEqual([]);
  });
  it('throws RangeError naming response and rolloff.kind for unknown kinds', () => {
    expect(() => filterSections({ family: 'butterworth', order: 2, response: 'bandpass' as never, cornerHz: 80 })).toThrow(/response/);
    expect(() => rolloffSections({ kind: 'horn' } as never)).toThrow(/rolloff\.kind/);
  });
});
