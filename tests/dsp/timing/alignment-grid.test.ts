import { describe, expect, it } from 'vitest';
import type { PathSpec } from '@/dsp';
import { compilePath } from '@/dsp/blend/path-plan';
import { ALIGNMENT_POINTS_PER_OCTAVE, alignmentGrid, pathComplex } from '@/dsp/timing/alignment-grid';
import { assertInDelta } from '../../helpers/assert-in-delta';
import { pathOracle, speedOfSoundOracle } from '../oracle/path-oracle';

describe('alignmentGrid', () => {
  it('fc/2 … 2fc at 48 points per octave (97 points, index 48 is fc), then 4fc as the reference (by hand)', () => {
    for (const fc of [80, 63.7, 150]) {
      const g = alignmentGrid(fc);
      expect(ALIGNMENT_POINTS_PER_OCTAVE).toBe(48);
      expect(g.bandCount).toBe(97);
      expect(g.frequencyHz.length).toBe(98);
      expect(g.crossoverIndex).toBe(48);
      expect(g.refIndex).toBe(97);
      g.frequencyHz.slice(0, 97).forEach((f, i) => assertInDelta(f, (fc / 2) * Math.pow(2, i / 48), 1e-9 * fc, `${fc} Hz grid [${i}]`));
      assertInDelta(g.frequencyHz[48] as number, fc, 1e-9 * fc);
      assertInDelta(g.frequencyHz[96] as number, 2 * fc, 1e-9 * fc);
      expect(g.frequencyHz[97]).toBe(4 * fc);
      g.omega.forEach((w, i) => assertInDelta(w, 2 * Math.PI * (g.frequencyHz[i] as number), 1e-12 * w));
    }
  });
});

describe('pathComplex', () => {
  it('equals the path’s complex response with its delay, evaluated from the definitions with complex.js (reference library)', () => {
    const c = speedOfSoundOracle(20);
    const paths: PathSpec[] = [
      { name: 'mains', filter: { family: 'butterworth', order: 3, response: 'highpass', cornerHz: 90 }, rolloff: { kind: 'sealed', cornerHz: 55, q: 0.8 }, gainDb: 1.5, delayMs: 3.2, invert: false, distanceM: 2.7 },
      { name: 'sub', filter: { family: 'linkwitz-riley', order: 8, response: 'lowpass', cornerHz: 90 }, rolloff: [{ kind: 'vented', cornerHz: 25 }, { kind: 'lowpass', cornerHz: 200, q: 0.7 }], gainDb: -3, delayMs: 0, invert: true, distanceM: 5.1 },
    ];
    const g = alignmentGrid(90);
    for (const p of paths) {
      const { re, im } = pathComplex(compilePath(p, c), g.omega);
      g.omega.forEach((w, i) => {
        const h = pathOracle(p, 20, w);
        assertInDelta(re[i] as number, h.re, 1e-12 * Math.max(h.abs(), 1e-6), `${p.name} Re at ${g.frequencyHz[i]} Hz`);
        assertInDelta(im[i] as number, h.im, 1e-12 * Math.max(h.abs(), 1e-6), `${p.name} Im at ${g.frequencyHz[i]} Hz`);
      });
    }
  });
});
