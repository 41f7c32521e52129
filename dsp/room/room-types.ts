/** Inside dimensions of a rectangular room, m. */
export interface RoomDimensions {
  readonly lengthM: number;
  readonly widthM: number;
  readonly heightM: number;
}

/** A point in the room, m: origin at the front-left floor corner, x across the width, y into the room along the length, z up. */
export interface PointM {
  readonly x: number;
  readonly y: number;
  readonly z: number;
}

/** Axial (one index non-zero), tangential (two) or oblique (three). */
export type ModeKind = 'axial' | 'tangential' | 'oblique';

/** One rectangular-room mode. indices = [n along the length, n across the width, n along the height]. */
export interface RoomMode {
  readonly frequencyHz: number;
  readonly indices: readonly [number, number, number];
  readonly kind: ModeKind;
}
