import { describe, expect, it } from 'vitest';
import { stepFromImpulse } from '@/dsp/time/step-from-impulse';
import { assertInDelta } from '../../helpers/assert-in-delta';

describe('stepFromImpulse (common practice: the step is the running integral of the impulse, trapezoid rule)', () => {
  it('an exponential impulse a·e^(−a·t) gives 1 − e^(−a·t) (analytic, from memory) within the trapezoid rule’s bound dt²·a²/12 ≈ 5e-5', () => {
    const fs = 8000;
    const a = 200; // 1/s
    const impulsePerS = Float64Array.from({ length: 2400 }, (_, n) => a * Math.exp((-a * n) / fs));
    const step = stepFromImpulse({ impulsePerS, sampleRateHz: fs });
    step.forEach((v, n) => assertInDelta(v, 1 - Math.exp((-a * n) / fs), 6e-5, `step[${n}]`));
  });

  it('a rectangle of height 1000/s for 1 ms at 8 kHz integrates to exactly 1 and then stays there (hand-computed trapezoids)', () => {
    const impulsePerS = Float64Array.from({ length: 16 }, (_, n) => (n >= 4 && n < 12 ? 1000 : 0));
    const step = stepFromImpulse({ impulsePerS, sampleRateHz: 8000 });
    assertInDelta(step, [0, 0, 0, 0, 0.0625, 0.1875, 0.3125, 0.4375, 0.5625, 0.6875, 0.8125, 0.9375, 1, 1, 1, 1], 1e-12, 'step');
  });

  it('refuses a bad sample rate or a non-finite sample, naming it', () => {
    expect(() => stepFromImpulse({ impulsePerS: [1], sampleRateHz: 0 })).toThrow(/sampleRateHz/);
    expect(() => stepFromImpulse({ impulsePerS: [1, Number.NaN], sampleRateHz: 8000 })).toThrow(/impulsePerS\[1\]/);
  });
});
