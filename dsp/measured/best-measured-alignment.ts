import { assertPositive } from '../internal/guards';
import { alignmentGrid } from '../timing/alignment-grid';
import { alignmentFromScanInput, delaySearchLimits } from '../timing/align-sub-to-mains';
import type { AlignmentResult } from '../timing/timing-types';
import { applyPathToMeasured } from './apply-path-to-measured';
import type { MeasuredPathInput } from './measured-types';
import { resampleCurve } from './resample-curve';

/** Options of {@link bestMeasuredAlignment}. */
export interface BestMeasuredAlignmentOptions {
  readonly frequencyHz: Float64Array | readonly number[];
  readonly mains: MeasuredPathInput;
  readonly sub: MeasuredPathInput;
  readonly crossoverHz: number;
  readonly temperatureC: number;
  readonly maxDelayMs?: number;
  readonly stepMs?: number;
}

/**
 * Best extra delay and sub polarity found on measured data (the paths' settings applied, then the same flatness
 * search as Timing on the measured curves resampled to fc/2…4fc at 48 points per octave). The measured range must
 * cover fc/2…4fc; outside it the end values are held.
 * @example bestMeasuredAlignment({ frequencyHz, mains, sub, crossoverHz: 80, temperatureC: 20 }).delayMs
 */
export function bestMeasuredAlignment(options: BestMeasuredAlignmentOptions): AlignmentResult {
  assertPositive('crossoverHz', options.crossoverHz);
  const { maxDelayS, stepS } = delaySearchLimits(options.maxDelayMs, options.stepMs);
  const grid = alignmentGrid(options.crossoverHz);
  const onGrid = (m: MeasuredPathInput, name: string) => {
    const processed = applyPathToMeasured({
      frequencyHz: options.frequencyHz,
      magnitudeDb: m.magnitudeDb,
      ...(m.phaseDeg ? { phaseDeg: m.phaseDeg } : {}),
      path: m.path,
      temperatureC: options.temperatureC,
    });
    try {
      const r = resampleCurve({ frequencyHz: processed.frequencyHz, magnitudeDb: processed.magnitudeDb, phaseDeg: processed.phaseDeg, targetHz: grid.frequencyHz });
      const re = new Float64Array(grid.frequencyHz.length);
      const im = new Float64Array(grid.frequencyHz.length);
      for (let i = 0; i < re.length; i++) {
        const mag = Math.pow(10, (r.magnitudeDb[i] as number) / 20);
        const ph = ((r.phaseDeg?.[i] ?? 0) * Math.PI) / 180;
        re[i] = mag * Math.cos(ph);
        im[i] = mag * Math.sin(ph);
      }
      return { re, im };
    } catch (error) {
      if (error instanceof RangeError) throw new RangeError(`${name}: ${error.message}`);
      throw error;
    }
  };
  const a = onGrid(options.mains, 'mains');
  const b = onGrid(options.sub, 'sub');
  return alignmentFromScanInput(
    { omega: grid.omega, aRe: a.re, aIm: a.im, bRe: b.re, bIm: b.im, bandCount: grid.bandCount, refIndex: grid.refIndex, crossoverIndex: grid.crossoverIndex },
    options.sub.path.invert,
    maxDelayS,
    stepS,
  );
}
