import { describe, expect, it } from 'vitest';
import { blendTraces, groupDelayDomain, magnitudeDomain } from '@/components/blend/blend-series';
import { traceStyles } from '@/components/charts/theme';
import type { BlendAnswer } from '@/lib/system-model/blend';

/** A blend answer with only the fields the axes and traces read. */
function answer(frequencyHz: number[], sumDb: number[], pathDb: number[][], groupDelayMs: number[] = frequencyHz.map(() => 0)): BlendAnswer {
  const zeros = frequencyHz.map(() => 0);
  return {
    frequencyHz,
    sum: { magnitudeDb: sumDb, phaseDeg: zeros, groupDelayMs },
    paths: pathDb.map((magnitudeDb, k) => ({ name: k === 0 ? 'L' : `Sub ${k}`, magnitudeDb, phaseDeg: zeros })),
  } as unknown as BlendAnswer;
}

describe('magnitudeDomain(data, stopHz)', () => {
  it('is −30 … 6 dB without data', () => {
    expect(magnitudeDomain(undefined, 1000)).toEqual([-30, 6]);
  });
  it('rises in 6 dB steps to clear the loudest value shown by at least 1 dB', () => {
    // 8 dB at 1 kHz needs a top of 12 dB (8 + 1 = 9, rounded up to a multiple of 6); 40 dB at 5 kHz is beyond the plot.
    expect(magnitudeDomain(answer([100, 1000, 5000], [0, 8, 40], [[3, 2, 1]]), 1000)).toEqual([-30, 12]);
  });
  it('stops at 30 dB', () => {
    expect(magnitudeDomain(answer([100, 1000, 5000], [0, 8, 40], [[3, 2, 1]]), 20_000)).toEqual([-30, 30]);
  });
});

describe('groupDelayDomain(data)', () => {
  it('is 0 … 20 ms without data', () => {
    expect(groupDelayDomain(undefined)).toEqual([0, 20]);
  });
  it('spans the sum from 15 Hz up in 5 ms steps, at least 0 … 5 ms', () => {
    // 100 ms at 10 Hz is below 15 Hz and left out; −3 and 12 ms round out to −5 and 15 ms.
    expect(groupDelayDomain(answer([10, 20, 100], [0, 0, 0], [], [100, -3, 12]))).toEqual([-5, 15]);
    expect(groupDelayDomain(answer([20, 100], [0, 0], [], [1, NaN]))).toEqual([0, 5]);
  });
});

describe('blendTraces(data)', () => {
  it('draws the mains, each sub and the sum; the sum alone for group delay', () => {
    const traces = blendTraces(answer([100], [0], [[0], [0], [0], [0]]));
    expect(traces.magnitude.map((t) => t.id)).toEqual(['mains', 'sub-0', 'sub-1', 'sub-2', 'sum']);
    expect(traces.magnitude[0]?.label).toBe('Mains (L)');
    expect(traces.groupDelay.map((t) => t.id)).toEqual(['sum']);
    // Amber and brown alternate; from the third sub on they are dashed.
    expect(traces.magnitude.slice(1, 4).map((t) => [t.color, Boolean(t.dashed)])).toEqual([
      [traceStyles.sub.color, false],
      [traceStyles.sub2.color, false],
      [traceStyles.sub.color, true],
    ]);
  });
  it('draws nothing without data', () => {
    expect(blendTraces(undefined)).toEqual({ magnitude: [], phase: [], groupDelay: [] });
  });
});
