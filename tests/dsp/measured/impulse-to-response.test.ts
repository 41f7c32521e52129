import { describe, expect, it } from 'vitest';
import { impulseToResponse } from '@/dsp/measured/impulse-to-response';
import { impulseWindow } from '@/dsp/measured/impulse-window';
import { angleDiffDeg, assertInDelta } from '../../helpers/assert-in-delta';
import { impulseCase, impulseFixture, sosImpulse } from './impulse-fixture';

const fs = impulseFixture.sampleRateHz;
const fixtureGrid = { startHz: 20, stopHz: 2000, pointsPerOctave: 48 };

function worstErrors(name: string) {
  const c = impulseCase(name);
  const samples = sosImpulse(c.sos, c.delaySamples, impulseFixture.lengthSamples);
  const curve = impulseToResponse({ window: impulseWindow({ samples, sampleRateHz: fs }), ...fixtureGrid });
  assertInDelta(curve.frequencyHz, impulseFixture.frequencyHz, 1e-9, 'frequencyHz');
  let magnitudeDb = 0;
  let phaseDeg = 0;
  curve.frequencyHz.forEach((_, i) => {
    magnitudeDb = Math.max(magnitudeDb, Math.abs((curve.magnitudeDb[i] as number) - (c.magnitudeDb[i] as number)));
    phaseDeg = Math.max(phaseDeg, Math.abs(angleDiffDeg(curve.phaseDeg[i] as number, c.phaseDeg[i] as number)));
  });
  return { magnitudeDb, phaseDeg, curve, c };
}

describe('impulseToResponse against scipy.signal (reference library: sosfilt, sosfreqz; scripts/reference/impulse-fixtures.py)', () => {
  it('the test’s difference equation reproduces scipy.signal.sosfilt’s impulse responses (within 1e-12)', () => {
    for (const c of impulseFixture.cases) {
      const samples = sosImpulse(c.sos, c.delaySamples, impulseFixture.lengthSamples);
      for (const [index, value] of c.sampleChecks) assertInDelta(samples[index as number] as number, value as number, 1e-12, `${c.name}[${index}]`);
    }
  });

  for (const name of ['lr4-lowpass-80-delayed', 'sealed-highpass-50-q0707']) {
    it(`${name}: magnitude within 0.1 dB and true phase within 2° of sosfreqz over 20 Hz–2 kHz (default window)`, () => {
      const { magnitudeDb, phaseDeg } = worstErrors(name);
      expect(magnitudeDb).toBeLessThan(0.1);
      expect(phaseDeg).toBeLessThan(2);
    });
  }

  it('LR4 low-pass delayed a further 95 ms (100 ms in all): the default window starts 20 ms before the peak with a 10 ms fade-in and still matches (sosfreqz phase shifted by the extra delay, −360·f·0.095 s)', () => {
    const c = impulseCase('lr4-lowpass-80-delayed');
    const extra = 4560; // 95 ms at 48 kHz
    const samples = sosImpulse(c.sos, c.delaySamples + extra, impulseFixture.lengthSamples);
    const window = impulseWindow({ samples, sampleRateHz: fs });
    expect(window.startSample).toBe(c.peakSample + extra - 960); // 20 ms before the peak
    expect(window.fadeInSamples).toBe(480); // 10 ms
    const curve = impulseToResponse({ window, ...fixtureGrid });
    curve.frequencyHz.forEach((f, i) => {
      assertInDelta(curve.magnitudeDb[i] as number, c.magnitudeDb[i] as number, 0.1, `magnitude at ${f} Hz`);
      assertInDelta(angleDiffDeg(curve.phaseDeg[i] as number, (c.phaseDeg[i] as number) - 360 * f * 0.095), 0, 2, `phase at ${f} Hz`);
    });
  });

  it('LR4 low-pass delayed 5 ms: the arrival (the peak, largest |h|) is within one sample of scipy’s argmax, and 5 ms later than the undelayed filter’s', () => {
    const { curve, c } = worstErrors('lr4-lowpass-80-delayed');
    const oneSampleMs = 1000 / fs;
    assertInDelta(curve.arrivalMs, (c.peakSample * 1000) / fs, oneSampleMs, 'arrival vs numpy.argmax');
    const undelayed = impulseWindow({ samples: sosImpulse(c.sos, 0, impulseFixture.lengthSamples), sampleRateHz: fs });
    assertInDelta(curve.arrivalMs - undelayed.arrivalMs, 5, oneSampleMs, 'arrival difference');
  });
});

describe('impulseToResponse on exact signals (the DFT of a shifted unit impulse: Oppenheim & Schafer, published)', () => {
  it('a unit impulse at sample d: 0 dB everywhere and phase −360·f·d/fs (true phase, wrapped), up to 0.45·fs on the default grid', () => {
    const d = 37;
    const rateHz = 8000; // 0.45·fs = 3.6 kHz, below the default 20 kHz top
    const samples = new Float64Array(800);
    samples[d] = 1;
    const curve = impulseToResponse({ window: impulseWindow({ samples, sampleRateHz: rateHz }) });
    expect(curve.frequencyHz[0]).toBe(10);
    expect(curve.frequencyHz[curve.frequencyHz.length - 1]).toBeLessThanOrEqual(0.45 * rateHz);
    expect(curve.frequencyHz[curve.frequencyHz.length - 1]).toBeGreaterThan(0.45 * rateHz * 2 ** (-1 / 48));
    assertInDelta(curve.magnitudeDb, new Float64Array(curve.frequencyHz.length), 1e-9, 'magnitudeDb');
    curve.frequencyHz.forEach((f, i) => {
      assertInDelta(angleDiffDeg(curve.phaseDeg[i] as number, (-360 * f * d) / rateHz), 0, 1e-6, `phase at ${f} Hz`);
      expect(curve.phaseDeg[i]).toBeGreaterThan(-180);
      expect(curve.phaseDeg[i]).toBeLessThanOrEqual(180);
    });
    assertInDelta(curve.arrivalMs, (d * 1000) / rateHz, 1e-12);
  });

  it('an impulse of height 0.5 inverted reads −6.02 dB and 180° (dB re the impulse’s units)', () => {
    const samples = new Float64Array(1000);
    samples[0] = -0.5;
    const curve = impulseToResponse({ window: impulseWindow({ samples, sampleRateHz: fs }), startHz: 100, stopHz: 1000 });
    assertInDelta(curve.magnitudeDb, new Float64Array(curve.frequencyHz.length).fill(20 * Math.log10(0.5)), 1e-9);
    curve.phaseDeg.forEach((p) => assertInDelta(angleDiffDeg(p, 180), 0, 1e-9));
  });
});

describe('impulseToResponse refusals', () => {
  const window = impulseWindow({ samples: [0, 1, 0.5, 0.25, 0], sampleRateHz: 1000 });
  it('refuses a grid that starts at or above 0.45·fs, naming startHz', () => {
    expect(() => impulseToResponse({ window, startHz: 450 })).toThrow(/startHz/);
    expect(() => impulseToResponse({ window, startHz: 100, stopHz: 50 })).toThrow(/startHz must be below stopHz/);
  });
  it('refuses non-positive or non-finite grid bounds', () => {
    expect(() => impulseToResponse({ window, startHz: 0 })).toThrow(/startHz/);
    expect(() => impulseToResponse({ window, stopHz: Number.NaN })).toThrow(/stopHz/);
    expect(() => impulseToResponse({ window, pointsPerOctave: -1 })).toThrow(/pointsPerOctave/);
  });
});
