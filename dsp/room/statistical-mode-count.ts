import { speedOfSoundMps } from '../air/speed-of-sound';
import { assertPositive } from '../internal/guards';
import type { RoomDimensions } from './room-types';

/** Options of {@link statisticalModeCount}. */
export interface StatisticalModeCountOptions extends RoomDimensions {
  readonly frequencyHz: number;
  readonly temperatureC: number;
}

/**
 * Expected number of modes below f: N ≈ (4π/3)·V·(f/c)³ + (π/4)·S·(f/c)² + (L/8)·(f/c), S the wall area,
 * L the total edge length (Kuttruff, "Room Acoustics", ch. 3).
 * @example statisticalModeCount({ lengthM: 6.4, widthM: 4.9, heightM: 2.7, frequencyHz: 200, temperatureC: 20 }) // 107.3…
 */
export function statisticalModeCount({ lengthM, widthM, heightM, frequencyHz, temperatureC }: StatisticalModeCountOptions): number {
  assertPositive('lengthM', lengthM);
  assertPositive('widthM', widthM);
  assertPositive('heightM', heightM);
  assertPositive('frequencyHz', frequencyHz);
  const k = frequencyHz / speedOfSoundMps(temperatureC);
  const volume = lengthM * widthM * heightM;
  const area = 2 * (lengthM * widthM + lengthM * heightM + widthM * heightM);
  const edges = 4 * (lengthM + widthM + heightM);
  return ((4 * Math.PI) / 3) * volume * k ** 3 + (Math.PI / 4) * area * k ** 2 + (edges / 8) * k;
}
