import { assertFinite, assertIntegerInRange, assertPositive } from '../internal/guards';
import type { RoomDimensions } from './room-types';

/** Options of {@link modePressureMap}. */
export interface ModePressureMapOptions {
  readonly room: RoomDimensions;
  /** [nL, nW, nH] as in roomModes. */
  readonly indices: readonly [number, number, number];
  /** Ear height, m. */
  readonly zM: number;
  readonly columns: number;
  readonly rows: number;
}

/** A floor grid of one mode's relative pressure (−1..1), row-major: pressure[row·columns + column]. */
export interface ModePressureMap {
  readonly columns: number;
  readonly rows: number;
  /** Cell centres across the width (columns), m. */
  readonly xM: Float64Array;
  /** Cell centres along the length (rows), m. */
  readonly yM: Float64Array;
  readonly pressure: Float64Array;
}

/**
 * Relative pressure of one mode over the floor plan at height zM: cos(nLπy/L)·cos(nWπx/W)·cos(nHπz/H)
 * (Kuttruff, "Room Acoustics", ch. 3). Rows run along the length (y), columns across the width (x).
 * @example modePressureMap({ room, indices: [1, 0, 0], zM: 1.1, columns: 20, rows: 30 }).pressure[0] // ≈ 1 near the front wall
 */
export function modePressureMap({ room, indices, zM, columns, rows }: ModePressureMapOptions): ModePressureMap {
  assertPositive('room.lengthM', room.lengthM);
  assertPositive('room.widthM', room.widthM);
  assertPositive('room.heightM', room.heightM);
  assertFinite('zM', zM);
  assertIntegerInRange('columns', columns, 1, 2000);
  assertIntegerInRange('rows', rows, 1, 2000);
  const [nl, nw, nh] = indices;
  assertIntegerInRange('indices[0]', nl, 0, 10_000);
  assertIntegerInRange('indices[1]', nw, 0, 10_000);
  assertIntegerInRange('indices[2]', nh, 0, 10_000);
  const xM = new Float64Array(columns);
  const yM = new Float64Array(rows);
  const across = new Float64Array(columns);
  for (let c = 0; c < columns; c++) {
    xM[c] = ((c + 0.5) * room.widthM) / columns;
    across[c] = Math.cos((nw * Math.PI * (xM[c] as number)) / room.widthM);
  }
  const vertical = Math.cos((nh * Math.PI * zM) / room.heightM);
  const pressure = new Float64Array(columns * rows);
  for (let r = 0; r < rows; r++) {
    yM[r] = ((r + 0.5) * room.lengthM) / rows;
    const along = Math.cos((nl * Math.PI * (yM[r] as number)) / room.lengthM) * vertical;
    for (let c = 0; c < columns; c++) pressure[r * columns + c] = along * (across[c] as number);
  }
  return { columns, rows, xM, yM, pressure };
}
