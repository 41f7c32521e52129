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

/** Options of {@link modePressureAt}. */
export interface ModePressureAtOptions {
  readonly room: RoomDimensions;
  /** [nL, nW, nH] as in roomModes. */
  readonly indices: readonly [number, number, number];
  /** The point: x across the width, y along the length, z up, m. */
  readonly xM: number;
  readonly yM: number;
  readonly zM: number;
}

function assertRoomAndIndices(room: RoomDimensions, indices: readonly [number, number, number]): void {
  assertPositive('room.lengthM', room.lengthM);
  assertPositive('room.widthM', room.widthM);
  assertPositive('room.heightM', room.heightM);
  indices.forEach((n, i) => assertIntegerInRange(`indices[${i}]`, n, 0, 10_000));
}

/**
 * Relative pressure of one mode at one point, cos(nLπy/L)·cos(nWπx/W)·cos(nHπz/H) (Kuttruff, "Room Acoustics",
 * ch. 3): the value to read at a seat, evaluated at the seat itself rather than at the nearest map cell.
 * @example modePressureAt({ room, indices: [1, 0, 0], xM: 2, yM: room.lengthM / 2, zM: 1.2 }) // 0 (to rounding)
 */
export function modePressureAt({ room, indices, xM, yM, zM }: ModePressureAtOptions): number {
  assertRoomAndIndices(room, indices);
  assertFinite('xM', xM);
  assertFinite('yM', yM);
  assertFinite('zM', zM);
  const [nl, nw, nh] = indices;
  return Math.cos((nl * Math.PI * yM) / room.lengthM) * Math.cos((nw * Math.PI * xM) / room.widthM) * Math.cos((nh * Math.PI * zM) / room.heightM);
}

/**
 * cos(n·π·(cell + ½)/cells), the mode shape at a cell centre, exactly 0 when the centre lies on a node
 * (n·(2·cell + 1) ≡ cells mod 2·cells) rather than the 6e-17 the cosine of a rounded π/2 gives.
 */
function cellCentreCosine(n: number, cell: number, cells: number): number {
  const t = n * (2 * cell + 1);
  if (t % (2 * cells) === cells) return 0;
  return Math.cos((Math.PI * t) / (2 * cells));
}

/**
 * The number of cells, nearest to `wanted` within [2, max] and above it first, whose centres fall on every node
 * line of a mode of order n (nodes at (2k + 1)·L/(2n)): a multiple of n by an odd number. Returns `wanted` when
 * n is 0 (no nodes) or no such count fits (geometry).
 * @example nodeAlignedCellCount(1, 50, 100) // 51
 */
export function nodeAlignedCellCount(n: number, wanted: number, max: number): number {
  assertIntegerInRange('n', n, 0, 10_000);
  assertIntegerInRange('wanted', wanted, 1, max);
  if (n === 0) return wanted;
  const aligned = (count: number) => count >= 2 && count % n === 0 && (count / n) % 2 === 1;
  for (let count = wanted; count <= max; count++) if (aligned(count)) return count;
  for (let count = wanted - 1; count >= 2; count--) if (aligned(count)) return count;
  return wanted;
}

/**
 * Relative pressure of one mode over the floor plan at height zM, sampled at cell centres:
 * cos(nLπy/L)·cos(nWπx/W)·cos(nHπz/H) (Kuttruff, "Room Acoustics", ch. 3). Rows run along the length (y), columns
 * across the width (x). A centre on a node line reads exactly 0; choose the counts with nodeAlignedCellCount so
 * every node line has centres on it.
 * @example modePressureMap({ room, indices: [1, 0, 0], zM: 1.1, columns: 20, rows: 31 }).pressure[15 * 20] // 0 (the middle row)
 */
export function modePressureMap({ room, indices, zM, columns, rows }: ModePressureMapOptions): ModePressureMap {
  assertRoomAndIndices(room, indices);
  assertFinite('zM', zM);
  assertIntegerInRange('columns', columns, 1, 2000);
  assertIntegerInRange('rows', rows, 1, 2000);
  const [nl, nw, nh] = indices;
  const xM = new Float64Array(columns);
  const yM = new Float64Array(rows);
  const across = new Float64Array(columns);
  for (let c = 0; c < columns; c++) {
    xM[c] = ((c + 0.5) * room.widthM) / columns;
    across[c] = cellCentreCosine(nw, c, columns);
  }
  const vertical = Math.cos((nh * Math.PI * zM) / room.heightM);
  const pressure = new Float64Array(columns * rows);
  for (let r = 0; r < rows; r++) {
    yM[r] = ((r + 0.5) * room.lengthM) / rows;
    const along = cellCentreCosine(nl, r, rows) * vertical;
    for (let c = 0; c < columns; c++) pressure[r * columns + c] = along * (across[c] as number);
  }
  return { columns, rows, xM, yM, pressure };
}
