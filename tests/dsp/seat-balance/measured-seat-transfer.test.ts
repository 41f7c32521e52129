import { describe, expect, it } from 'vitest';
import { logFrequencyGridHz, measuredSeatTransfer, modalTransfer } from '@/dsp';
import { assertInDelta, angleDiffDeg } from '../../helpers/assert-in-delta';

// A measured sub → seat curve as a complex transfer: 10^(dB/20)·e^(jφ) (definition), interpolated on log frequency.
describe('measuredSeatTransfer', () => {
  const measuredHz = Array.from(logFrequencyGridHz({ startHz: 10, stopHz: 250, pointsPerOctave: 48 }));

  it('round trip: a modal transfer written as magnitude and phase comes back as the same complex numbers', () => {
    // An invented room and positions; the modal sum is not minimum phase, which is why the phase must be measured.
    const truth = modalTransfer({ room: { lengthM: 5.9, widthM: 4.1, heightM: 2.6 }, sourceM: { x: 0.3, y: 0.3, z: 0.3 }, receiverM: { x: 2.2, y: 3.9, z: 1.1 }, frequencyHz: measuredHz, rt60S: 0.4, temperatureC: 20 });
    const magnitudeDb = Array.from(truth.re, (re, i) => 20 * Math.log10(Math.hypot(re, truth.im[i] as number)));
    const phaseDeg = Array.from(truth.re, (re, i) => (Math.atan2(truth.im[i] as number, re) * 180) / Math.PI);
    // Every other measured point: the target lies on the measured grid, so no interpolation error.
    const targetHz = measuredHz.filter((f, i) => i % 2 === 0 && f >= 15 && f <= 200);
    const t = measuredSeatTransfer({ frequencyHz: measuredHz, magnitudeDb, phaseDeg, targetHz });
    expect(t.re).toHaveLength(targetHz.length);
    targetHz.forEach((f, j) => {
      const i = measuredHz.indexOf(f);
      const size = Math.hypot(truth.re[i] as number, truth.im[i] as number);
      assertInDelta(t.re[j] as number, truth.re[i] as number, 1e-9 * size, `re at ${f} Hz`);
      assertInDelta(t.im[j] as number, truth.im[i] as number, 1e-9 * size, `im at ${f} Hz`);
      // And back: magnitude and phase as given.
      assertInDelta(20 * Math.log10(Math.hypot(t.re[j] as number, t.im[j] as number)), magnitudeDb[i] as number, 1e-9, `dB at ${f} Hz`);
      assertInDelta(angleDiffDeg((Math.atan2(t.im[j] as number, t.re[j] as number) * 180) / Math.PI, phaseDeg[i] as number), 0, 1e-7, `phase at ${f} Hz`);
    });
  });

  it('between points: magnitude and unwrapped phase are linear in log frequency', () => {
    // 0 dB and 20 dB at 10 and 100 Hz → 10 dB at 31.62 Hz; phase −170° → −190° (unwrapped) → −180° there.
    const t = measuredSeatTransfer({ frequencyHz: [10, 100], magnitudeDb: [0, 20], phaseDeg: [-170, 170], targetHz: [Math.sqrt(1000)] });
    assertInDelta(t.re[0] as number, -Math.sqrt(10), 1e-9, 're');
    assertInDelta(t.im[0] as number, 0, 1e-9, 'im');
  });

  it('refuses a curve without phase (null, undefined or empty), naming phaseDeg', () => {
    const base = { frequencyHz: [20, 200], magnitudeDb: [0, 0], targetHz: [50] };
    for (const phaseDeg of [null, undefined, []]) {
      expect(() => measuredSeatTransfer({ ...base, phaseDeg })).toThrow(RangeError);
      expect(() => measuredSeatTransfer({ ...base, phaseDeg })).toThrow(/phaseDeg/);
    }
  });

  it('refuses a curve that does not cover the grid, saying how many points are outside', () => {
    const base = { frequencyHz: [20, 200], magnitudeDb: [0, 0], phaseDeg: [0, -90] };
    expect(() => measuredSeatTransfer({ ...base, targetHz: [15, 50, 100] })).toThrow(/1 of the 3/);
    expect(() => measuredSeatTransfer({ ...base, targetHz: [15, 50, 250] })).toThrow(/2 of the 3/);
    expect(() => measuredSeatTransfer({ ...base, targetHz: [20, 200] })).not.toThrow();
  });
});
