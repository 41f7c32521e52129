import { describe, expect, it } from 'vitest';
import { logFrequencyGridHz } from '@/dsp';
import { impulseToResponse } from '@/dsp/measured/impulse-to-response';
import { impulseWindow } from '@/dsp/measured/impulse-window';
import { inRoomExtension } from '@/dsp/measured/in-room-extension';
import { assertInDelta } from '../../helpers/assert-in-delta';
import { impulseCase, impulseFixture, sosImpulse } from './impulse-fixture';

// A sealed box is a second-order high-pass: |H|² = x⁴ / ((1 − x²)² + x²/Q²), x = f/fc (published: R. H. Small,
// "Closed-Box Loudspeaker Systems", J. Audio Eng. Soc. 20, 1972).
const sealedPower = (hz: number, cornerHz: number, q: number) => {
  const x2 = (hz / cornerHz) ** 2;
  return (x2 * x2) / ((1 - x2) ** 2 + x2 / (q * q));
};

/** Mean of |H|² over ln f in [startHz, stopHz] by the trapezoid rule on 20 000 steps, as dB (the power mean). */
function analyticMeanDb(cornerHz: number, q: number, startHz = 200, stopHz = 2000): number {
  const steps = 20_000;
  const span = Math.log(stopHz / startHz);
  let sum = 0;
  for (let i = 0; i <= steps; i++) {
    const weight = i === 0 || i === steps ? 0.5 : 1;
    sum += weight * sealedPower(startHz * Math.exp((span * i) / steps), cornerHz, q);
  }
  return 10 * Math.log10(sum / steps);
}

/**
 * Solved by hand: |H|² = g with g = 10^((mean − drop)/10) and u = x² gives (1 − g)·u² + g·(2 − 1/Q²)·u − g = 0, whose
 * one positive root is u = (−B + √(B² + 4·(1 − g)·g)) / (2·(1 − g)), B = g·(2 − 1/Q²); the point is fc·√u.
 */
function analyticPointHz(cornerHz: number, q: number, meanDb: number, dropDb: number): number {
  const g = 10 ** ((meanDb - dropDb) / 10);
  const a = 1 - g;
  const b = g * (2 - 1 / (q * q));
  const u = (-b + Math.sqrt(b * b + 4 * a * g)) / (2 * a);
  return cornerHz * Math.sqrt(u);
}

const grid = logFrequencyGridHz({ startHz: 10, stopHz: 20000, pointsPerOctave: 48 });

describe('inRoomExtension: a sealed box of known corner and Q against the analytic points (Small 1972)', () => {
  for (const [cornerHz, q] of [[50, 0.707], [40, 1.0], [35, 0.5], [60, 1.4]] as const) {
    it(`fc ${cornerHz} Hz, Q ${q}: the −3, −6 and −10 dB points below the 200 Hz–2 kHz power mean within 0.5 Hz`, () => {
      const magnitudeDb = grid.map((f) => 10 * Math.log10(sealedPower(f, cornerHz, q)));
      const ext = inRoomExtension({ frequencyHz: grid, magnitudeDb });
      const meanDb = analyticMeanDb(cornerHz, q);
      assertInDelta(ext.meanLevelDb, meanDb, 0.01, 'mean level');
      expect([ext.bandStartHz, ext.bandStopHz]).toEqual([200, 2000]);
      assertInDelta(ext.minus3DbHz as number, analyticPointHz(cornerHz, q, meanDb, 3), 0.5, '−3 dB');
      assertInDelta(ext.minus6DbHz as number, analyticPointHz(cornerHz, q, meanDb, 6), 0.5, '−6 dB');
      assertInDelta(ext.minus10DbHz as number, analyticPointHz(cornerHz, q, meanDb, 10), 0.5, '−10 dB');
    });
  }

  it('from an impulse response: the scipy sealed-box fixture (50 Hz, Q 0.707, bilinear at 48 kHz) through the default window and transform', () => {
    const c = impulseCase('sealed-highpass-50-q0707');
    const window = impulseWindow({ samples: sosImpulse(c.sos, 0, impulseFixture.lengthSamples), sampleRateHz: impulseFixture.sampleRateHz });
    const curve = impulseToResponse({ window });
    const ext = inRoomExtension({ frequencyHz: curve.frequencyHz, magnitudeDb: curve.magnitudeDb });
    const meanDb = analyticMeanDb(50, 0.707);
    assertInDelta(ext.minus3DbHz as number, analyticPointHz(50, 0.707, meanDb, 3), 0.5, '−3 dB');
    assertInDelta(ext.minus10DbHz as number, analyticPointHz(50, 0.707, meanDb, 10), 0.5, '−10 dB');
  });
});

describe('inRoomExtension: reading the curve', () => {
  it('takes the first fall going down from the band, not a lower one, and interpolates in log-frequency', () => {
    // 0 dB in the band, a 4 dB dip from 100 to 120 Hz (edges at 90 and 130 Hz), back to 0 dB, then −20 dB at 20 Hz.
    const f = [20, 40, 90, 100, 120, 130, 200, 2000];
    const db = [-20, 0, 0, -4, -4, 0, 0, 0];
    const ext = inRoomExtension({ frequencyHz: f, magnitudeDb: db });
    assertInDelta(ext.meanLevelDb, 0, 1e-12);
    // −3 dB between 130 Hz (0 dB) and 120 Hz (−4 dB): 3/4 of the way in log f: 130·(120/130)^0.75 (by hand).
    assertInDelta(ext.minus3DbHz as number, 130 * (120 / 130) ** 0.75, 1e-9);
    // −6 dB is not in the dip: between 40 Hz (0 dB) and 20 Hz (−20 dB), 6/20 of the way: 40·(1/2)^0.3.
    assertInDelta(ext.minus6DbHz as number, 40 * 0.5 ** 0.3, 1e-9);
    assertInDelta(ext.minus10DbHz as number, 40 * 0.5 ** 0.5, 1e-9);
  });

  it('null where the curve never falls that far within the data', () => {
    const f = [20, 100, 200, 2000];
    const ext = inRoomExtension({ frequencyHz: f, magnitudeDb: [-5, 0, 0, 0] });
    expect(ext.minus3DbHz).not.toBeNull();
    expect(ext.minus6DbHz).toBeNull();
    expect(ext.minus10DbHz).toBeNull();
    expect(inRoomExtension({ frequencyHz: f, magnitudeDb: [0, 0, 0, 0] }).minus3DbHz).toBeNull();
  });

  it('the band can be moved: the mean follows it (power mean: 0 dB and −∞-ish halves average to −3.01 dB)', () => {
    const f = logFrequencyGridHz({ startHz: 20, stopHz: 4000, pointsPerOctave: 480 });
    const db = Float64Array.from(f, (hz) => (hz < 400 ? 0 : -200));
    const ext = inRoomExtension({ frequencyHz: f, magnitudeDb: db, bandStartHz: 200, bandStopHz: 800 });
    assertInDelta(ext.meanLevelDb, 10 * Math.log10(0.5), 0.02);
    expect(ext.minus3DbHz).toBeNull(); // the curve is at 0 dB all the way down to 20 Hz: never 3 dB below −3.01 dB
  });

  it('refuses a bad band or curve, naming the field', () => {
    const f = [20, 100, 200, 2000];
    const db = [0, 0, 0, 0];
    expect(() => inRoomExtension({ frequencyHz: f, magnitudeDb: db, bandStartHz: 500, bandStopHz: 300 })).toThrow(/bandStopHz must be above bandStartHz/);
    expect(() => inRoomExtension({ frequencyHz: f, magnitudeDb: db, bandStartHz: 3000, bandStopHz: 5000 })).toThrow(/bandStartHz–bandStopHz: no point/);
    expect(() => inRoomExtension({ frequencyHz: f, magnitudeDb: db, bandStartHz: -1 })).toThrow(/bandStartHz/);
    expect(() => inRoomExtension({ frequencyHz: f, magnitudeDb: [0, Number.NaN, 0, 0] })).toThrow(/magnitudeDb\[1\]/);
    expect(() => inRoomExtension({ frequencyHz: [100, 50, 200, 2000], magnitudeDb: db })).toThrow(/frequencyHz/);
  });
});
