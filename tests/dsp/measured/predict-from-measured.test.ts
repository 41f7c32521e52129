import { describe, expect, it } from 'vitest';
import { blendResponse, bestMeasuredAlignment, alignSubToMains, logFrequencyGridHz, predictMeasuredBlend, smoothFractionalOctave, type PathSpec } from '@/dsp';
import { computeMeasured } from '@/lib/system-model/measured';
import { predictRequestSchema } from '@/lib/validations/measurement';
import { assertInDelta } from '../../helpers/assert-in-delta';

/**
 * "Measurements" made from known filters: each speaker alone at the seat, i.e. its natural roll-off
 * and the air path, with no crossover (the model, model consistency). Applying the System's
 * crossover, gain, delay and polarity to them must give back the modelled blend.
 */
const temperatureC = 20;
const mainsModel: PathSpec = {
  name: 'mains',
  filter: { family: 'butterworth', order: 2, response: 'highpass', cornerHz: 80 },
  rolloff: { kind: 'sealed', cornerHz: 55, q: 0.7 },
  gainDb: -1.5,
  delayMs: 0.8,
  invert: false,
  distanceM: 3.55,
};
const subModel: PathSpec = {
  name: 'sub',
  filter: { family: 'linkwitz-riley', order: 4, response: 'lowpass', cornerHz: 80 },
  rolloff: { kind: 'lowpass', cornerHz: 180, q: 0.7 },
  gainDb: 2,
  delayMs: 3.2,
  invert: true,
  distanceM: 4.1,
};
/** The speaker alone at the seat: no crossover, no processor gain or delay, but its roll-off and distance. */
const alone = (p: PathSpec): PathSpec => ({ ...p, filter: { ...p.filter, response: 'none' }, gainDb: 0, delayMs: 0, invert: false });

function measure(grid: Float64Array, p: PathSpec) {
  const r = blendResponse({ temperatureC, frequencyHz: grid, paths: [alone(p)] }).paths[0]!;
  return { magnitudeDb: r.magnitudeDb, phaseDeg: r.phaseDeg };
}

describe('predicting the blend from measured curves (model consistency)', () => {
  const grid = logFrequencyGridHz({ startHz: 10, stopHz: 1000, pointsPerOctave: 48 });
  const model = blendResponse({ temperatureC, frequencyHz: grid, paths: [mainsModel, subModel] });

  it('two curves made from known roll-offs and distances, with the crossover applied, give back the model sum within 0.05 dB', () => {
    const predicted = predictMeasuredBlend({
      frequencyHz: grid,
      temperatureC,
      measured: [
        { ...measure(grid, mainsModel), path: mainsModel },
        { ...measure(grid, subModel), path: subModel },
      ],
    });
    expect(predicted.phaseEstimated).toBe(false);
    assertInDelta(predicted.sum.magnitudeDb, model.sum.magnitudeDb, 0.05, 'sum');
    assertInDelta(predicted.paths[1]!.magnitudeDb, model.paths[1]!.magnitudeDb, 0.05, 'sub path');
  });

  it('the same through the predict route compute: a 1/24-octave file resampled to the shared grid stays within 0.05 dB', () => {
    const coarse = logFrequencyGridHz({ startHz: 10, stopHz: 1000, pointsPerOctave: 24 });
    const curve = (p: PathSpec) => {
      const m = measure(coarse, p);
      return { frequencyHz: Array.from(coarse), magnitudeDb: Array.from(m.magnitudeDb), phaseDeg: Array.from(m.phaseDeg) };
    };
    const req = predictRequestSchema.parse({
      temperatureC,
      crossoverHz: 80,
      mainsHighpass: { family: 'butterworth', order: 2 },
      subLowpass: { family: 'linkwitz-riley', order: 4 },
      mains: { curve: curve(mainsModel), gainDb: mainsModel.gainDb, delayMs: mainsModel.delayMs, invert: false },
      sub: { curve: curve(subModel), gainDb: subModel.gainDb, delayMs: subModel.delayMs, invert: true },
    });
    const answer = computeMeasured(req, { mains: req.mains.curve as never, sub: req.sub.curve as never });
    const f = Float64Array.from(answer.frequencyHz);
    const reference = blendResponse({ temperatureC, frequencyHz: f, paths: [mainsModel, subModel] });
    assertInDelta(answer.predictedSum.magnitudeDb, reference.sum.magnitudeDb, 0.05, 'predicted sum');
    // The alignment found on the measured pair matches Timing's on the model (same scan, same data).
    const timing = alignSubToMains({ temperatureC, crossoverHz: 80, mains: mainsModel, sub: subModel });
    expect(answer.alignment).not.toBeNull();
    expect(answer.alignment!.invert).toBe(timing.invertSub);
    assertInDelta(answer.alignment!.subDelayMs - answer.alignment!.mainsDelayMs, subModel.delayMs - mainsModel.delayMs + timing.relativeDelayMs, 0.06, 'relative delay');
  });

  it('bestMeasuredAlignment on the measured pair agrees with Timing on the model', () => {
    const a = bestMeasuredAlignment({
      frequencyHz: grid,
      mains: { ...measure(grid, mainsModel), path: mainsModel },
      sub: { ...measure(grid, subModel), path: subModel },
      crossoverHz: 80,
      temperatureC,
    });
    const t = alignSubToMains({ temperatureC, crossoverHz: 80, mains: mainsModel, sub: subModel });
    expect(a.invertSub).toBe(t.invertSub);
    assertInDelta(a.relativeDelayMs, t.relativeDelayMs, 0.06, 'relativeDelayMs');
    assertInDelta(a.flatnessDb, t.flatnessDb, 0.05, 'flatnessDb');
  });
});

describe('smoothFractionalOctave', () => {
  const grid = logFrequencyGridHz({ startHz: 10, stopHz: 20000, pointsPerOctave: 96 });

  it('smoothing a flat curve leaves it flat at every fraction 1/1 … 1/48', () => {
    const flat = new Float64Array(grid.length).fill(-6.5);
    for (const fraction of [1, 2, 3, 6, 12, 24, 48]) {
      assertInDelta(smoothFractionalOctave({ frequencyHz: grid, magnitudeDb: flat, fraction }).magnitudeDb, flat, 1e-9, `1/${fraction}`);
    }
  });

  it('each point is the power average of the points within f·2^(±1/(2N)) (common practice)', () => {
    const ripple = Float64Array.from(grid, (f, i) => 6 * Math.sin(i / 3) + (f < 100 ? 4 : 0));
    const fraction = 3;
    const out = smoothFractionalOctave({ frequencyHz: grid, magnitudeDb: ripple, fraction }).magnitudeDb;
    const i = 400;
    const f0 = grid[i]!;
    let sum = 0;
    let n = 0;
    grid.forEach((f, j) => {
      if (f >= f0 / 2 ** (1 / 6) * (1 - 1e-12) && f <= f0 * 2 ** (1 / 6) * (1 + 1e-12)) {
        sum += 10 ** (ripple[j]! / 10);
        n++;
      }
    });
    assertInDelta(out[i]!, 10 * Math.log10(sum / n), 1e-9, 'point 400');
  });

  it('smoothing preserves the power average of a band (away from the ends)', () => {
    const ripple = Float64Array.from(grid, (_f, i) => 8 * Math.sin(i / 2.3) + 3 * Math.cos(i / 7.1));
    const powerAverageDb = (db: ArrayLike<number>, loHz: number, hiHz: number) => {
      let sum = 0;
      let n = 0;
      grid.forEach((f, j) => {
        if (f >= loHz && f <= hiHz) {
          sum += 10 ** ((db[j] as number) / 10);
          n++;
        }
      });
      return 10 * Math.log10(sum / n);
    };
    for (const fraction of [3, 6, 24]) {
      const out = smoothFractionalOctave({ frequencyHz: grid, magnitudeDb: ripple, fraction }).magnitudeDb;
      // An interior band of eight octaves: the windows' overhang at its edges is a small share.
      assertInDelta(powerAverageDb(out, 40, 10240), powerAverageDb(ripple, 40, 10240), 0.05, `1/${fraction}`);
    }
  });
});
