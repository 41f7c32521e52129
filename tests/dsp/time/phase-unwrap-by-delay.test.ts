import { describe, expect, it } from 'vitest';
import { logFrequencyGridHz } from '@/dsp/grid/log-frequency-grid';
import { unwrapDeg } from '@/dsp/measured/unwrap-phase';
import { phaseUnwrapByDelay } from '@/dsp/time/phase-unwrap-by-delay';
import { assertInDelta } from '../../helpers/assert-in-delta';

const gridHz = logFrequencyGridHz({ startHz: 10, stopHz: 20_000, pointsPerOctave: 24 });
const wrap = (deg: number) => deg - 360 * Math.round(deg / 360);

describe('phaseUnwrapByDelay (expected: the analytic phase of a delay, −360·f·d; common practice)', () => {
  it('recovers a 20 ms delay’s phase on a 24-per-octave grid to 20 kHz, where a plain unwrap does not', () => {
    const trueDeg = Float64Array.from(gridHz, (f) => -360 * f * 0.02);
    const wrapped = trueDeg.map(wrap);
    const offset = (trueDeg[0] as number) - (wrapped[0] as number);
    const result = phaseUnwrapByDelay(gridHz, wrapped);
    assertInDelta(result.unwrappedDeg.map((p) => p + offset), trueDeg, 1e-6, 'unwrapped');
    assertInDelta(result.bottomGroupDelayS, 0.02, 1e-12, 'bottom group delay');
    assertInDelta(result.topGroupDelayS, 0.02, 1e-12, 'top group delay');
    const plain = unwrapDeg(wrapped).map((p) => p + offset);
    expect(Math.max(...plain.map((p, i) => Math.abs(p - (trueDeg[i] as number))))).toBeGreaterThan(360);
  });

  it('one 175° jump (as at a null of a sum) on a 12-per-octave grid is kept as a jump and does not derail the points after it (a prediction from that one step alone would add 360°)', () => {
    const sparseHz = logFrequencyGridHz({ startHz: 10, stopHz: 20_000, pointsPerOctave: 12 });
    const jumpAt = 60;
    const trueDeg = Float64Array.from(sparseHz, (f, i) => -360 * f * 0.005 + (i >= jumpAt ? 175 : 0));
    const result = phaseUnwrapByDelay(sparseHz, trueDeg.map(wrap));
    const offset = (trueDeg[0] as number) - (result.unwrappedDeg[0] as number);
    assertInDelta(result.unwrappedDeg.map((p) => p + offset), trueDeg, 1e-6, 'unwrapped');
  });
});
