import { speedOfSoundMps } from '../air/speed-of-sound';
import { assertPositive } from '../internal/guards';
import type { ModeKind, RoomDimensions, RoomMode } from './room-types';

/** Options of {@link roomModes}. */
export interface RoomModesOptions extends RoomDimensions {
  readonly maxHz: number;
  readonly temperatureC: number;
}

/** Result of {@link roomModes}. */
export interface RoomModesResult {
  readonly speedOfSoundMps: number;
  /** Sorted by frequency (ties by indices), (0,0,0) excluded. */
  readonly modes: RoomMode[];
}

/** Most modes one call may return. */
export const MAX_ROOM_MODES = 200_000;

/**
 * Every mode of a rigid rectangular room up to maxHz: f = (c/2)·√((nL/L)² + (nW/W)² + (nH/H)²)
 * (Rayleigh, "The Theory of Sound", 1896). indices = [nL, nW, nH].
 * @example roomModes({ lengthM: 6.4, widthM: 4.9, heightM: 2.7, maxHz: 30, temperatureC: 20 }).modes[0].frequencyHz // 26.81…
 */
export function roomModes({ lengthM, widthM, heightM, maxHz, temperatureC }: RoomModesOptions): RoomModesResult {
  assertPositive('lengthM', lengthM);
  assertPositive('widthM', widthM);
  assertPositive('heightM', heightM);
  assertPositive('maxHz', maxHz);
  const c = speedOfSoundMps(temperatureC);
  const half = c / 2;
  const maxL = Math.floor((2 * maxHz * lengthM) / c + 1e-9);
  const maxW = Math.floor((2 * maxHz * widthM) / c + 1e-9);
  const maxH = Math.floor((2 * maxHz * heightM) / c + 1e-9);
  if ((maxL + 1) * (maxW + 1) * (maxH + 1) > MAX_ROOM_MODES * 4) {
    throw new RangeError(`maxHz gives too many modes for this room (limit ${MAX_ROOM_MODES})`);
  }
  const limit = maxHz * (1 + 1e-12);
  const modes: RoomMode[] = [];
  for (let nl = 0; nl <= maxL; nl++) {
    const a = nl / lengthM;
    for (let nw = 0; nw <= maxW; nw++) {
      const b = nw / widthM;
      for (let nh = 0; nh <= maxH; nh++) {
        if (nl === 0 && nw === 0 && nh === 0) continue;
        const h = nh / heightM;
        const frequencyHz = half * Math.sqrt(a * a + b * b + h * h);
        if (frequencyHz > limit) break;
        const nonZero = (nl > 0 ? 1 : 0) + (nw > 0 ? 1 : 0) + (nh > 0 ? 1 : 0);
        const kind: ModeKind = nonZero === 1 ? 'axial' : nonZero === 2 ? 'tangential' : 'oblique';
        modes.push({ frequencyHz, indices: [nl, nw, nh], kind });
      }
    }
  }
  if (modes.length > MAX_ROOM_MODES) throw new RangeError(`maxHz gives more than ${MAX_ROOM_MODES} modes`);
  modes.sort(
    (p, q) =>
      p.frequencyHz - q.frequencyHz || p.indices[0] - q.indices[0] || p.indices[1] - q.indices[1] || p.indices[2] - q.indices[2],
  );
  return { speedOfSoundMps: c, modes };
}
