import Complex from 'complex.js';
import { describe, expect, it } from 'vitest';
import { blendSumResponse, logFrequencyGridHz, pathResponse, pathsThroughRoomPower, summedModalResponse, modalTransfers, type PathSpec } from '@/dsp';

// pathResponse is the one path of a blend as a complex curve; pathsThroughRoomPower is Σ transfer × path. The oracles:
// a blend of that single path (the same definition summed by blendSumResponse), the path's filters multiplied out by hand
// with complex.js (reference library), and dsp's summedModalResponse for plain gain/delay/polarity paths.

const F = logFrequencyGridHz({ startHz: 15, stopHz: 400, pointsPerOctave: 12 });
const sub: PathSpec = {
  name: 'sub',
  filter: { family: 'linkwitz-riley', order: 4, response: 'lowpass', cornerHz: 80 },
  rolloff: [{ kind: 'sealed', cornerHz: 30, q: 0.7 }],
  eq: [{ kind: 'peaking', centerHz: 45, gainDb: -4, q: 3 }],
  gainDb: -2,
  delayMs: 3.5,
  invert: true,
  distanceM: 2,
};

describe('pathResponse', () => {
  it('equals the blend of that one path, level and phase', () => {
    const r = pathResponse(sub, F, 20);
    const blend = blendSumResponse({ temperatureC: 20, frequencyHz: F, paths: [sub] });
    F.forEach((_, i) => {
      expect(Math.abs(r.magnitudeDb[i]! - blend.sum.magnitudeDb[i]!)).toBeLessThan(1e-9);
      const phase = (Math.atan2(r.im[i]!, r.re[i]!) * 180) / Math.PI;
      const d = ((phase - blend.sum.phaseDeg[i]! + 540) % 360) - 180;
      // blendSumResponse's phase uses a fast polynomial atan2 (dsp/internal/fast-math): within 1e-4°.
      expect(Math.abs(d)).toBeLessThan(1e-4);
    });
  });
  it('a plain LR4 low-pass with gain, polarity and delay multiplied out by hand (complex.js; Linkwitz 1976)', () => {
    const path: PathSpec = { name: 's', filter: { family: 'linkwitz-riley', order: 4, response: 'lowpass', cornerHz: 80 }, gainDb: 6, delayMs: 2, invert: true };
    const r = pathResponse(path, F);
    F.forEach((f, i) => {
      const x = new Complex(0, f / 80);
      const bw2 = new Complex(1, 0).div(x.mul(x).add(x.mul(Math.SQRT2)).add(1));
      const h = bw2.mul(bw2).mul(-Math.pow(10, 6 / 20)).mul(new Complex(0, -2 * Math.PI * f * 0.002).exp());
      expect(Math.abs(r.re[i]! - h.re)).toBeLessThan(1e-12);
      expect(Math.abs(r.im[i]! - h.im)).toBeLessThan(1e-12);
    });
  });
});

describe('pathsThroughRoomPower', () => {
  it('with plain gain/delay/polarity paths equals summedModalResponse at each seat', () => {
    const room = { lengthM: 6.4, widthM: 4.9, heightM: 2.7 };
    const subs = [{ x: 0.3, y: 0.3, z: 0.3 }, { x: 4.6, y: 2.8, z: 0.3 }];
    const seats = [{ x: 2.45, y: 3.7, z: 1.1 }, { x: 1.6, y: 3.7, z: 1.1 }];
    const settings = [{ gainDb: 0, delayMs: 0, invert: false }, { gainDb: -1.5, delayMs: 4.2, invert: true }];
    const t = modalTransfers({ room, sourcesM: subs, receiversM: seats, frequencyHz: F, rt60S: 0.4, temperatureC: 20 });
    const wire = { family: 'butterworth', order: 1, response: 'none', cornerHz: 1 } as const;
    const paths = settings.map((s) => pathResponse({ name: 's', filter: wire, ...s }, F));
    const power = pathsThroughRoomPower(t.transfers, paths);
    seats.forEach((seat, k) => {
      const ref = summedModalResponse({ room, sources: subs.map((positionM, s) => ({ positionM, ...settings[s]! })), receiverM: seat, frequencyHz: F, rt60S: 0.4, temperatureC: 20 });
      F.forEach((_, i) => expect(Math.abs(10 * Math.log10(power[k]![i]!) - ref.sum.magnitudeDb[i]!)).toBeLessThan(1e-9));
    });
  });
  it('refuses rows that do not match the paths', () => {
    expect(() => pathsThroughRoomPower([[{ re: [1], im: [0] }]], [])).toThrow(/one row per path/);
    expect(() => pathsThroughRoomPower([[{ re: [1, 2], im: [0, 0] }]], [{ re: [1], im: [0] }])).toThrow(/same 1 grid points/);
  });
});
