/**
 * Which positions lie outside the room: the one rule behind the editor's error marks, the panels that refuse to
 * compute from such a position, and the "inside the room" refinement of the System schema and the compute routes.
 * A position on a wall is inside; the origin is the front-left floor corner (x across, y into the room, z up).
 */
import type { SystemDocument } from '@/lib/validations/system';

export interface RoomBox {
  widthM: number;
  lengthM: number;
  heightM: number;
}

export interface Position {
  xM: number;
  yM: number;
  zM: number;
}

/** One coordinate of one item beyond a wall: `path` as zod names it (`speakers.0.xM`), `message` for a person. */
export interface OutsidePosition {
  path: string;
  message: string;
}

/** A position to check, with what a person calls it ("L", "Sub 1", "MLP") and its path in the request or document. */
export interface NamedPosition {
  label: string;
  position: Position;
  path: readonly (string | number)[];
}

const TOLERANCE_M = 1e-9;

/** Metres as a person reads them: at most two decimals, no trailing zeros (40, 6.4, 1.25). */
const metres = (v: number) => `${Number(v.toFixed(2))} m`;

/** Every coordinate of `p` beyond a wall of `room`, with its key and a message naming the item, the coordinate and the wall. */
export function coordinatesOutsideRoom(room: RoomBox, p: Position, label: string): { key: 'xM' | 'yM' | 'zM'; message: string }[] {
  const out: { key: 'xM' | 'yM' | 'zM'; message: string }[] = [];
  if (p.xM < -TOLERANCE_M) out.push({ key: 'xM', message: `${label} is ${metres(p.xM)} across, beyond the left wall (x = 0)` });
  else if (p.xM > room.widthM + TOLERANCE_M) out.push({ key: 'xM', message: `${label} is ${metres(p.xM)} across in a ${metres(room.widthM)} wide room` });
  if (p.yM < -TOLERANCE_M) out.push({ key: 'yM', message: `${label} is ${metres(p.yM)} into the room, beyond the front wall (y = 0)` });
  else if (p.yM > room.lengthM + TOLERANCE_M) out.push({ key: 'yM', message: `${label} is ${metres(p.yM)} into a ${metres(room.lengthM)} long room` });
  if (p.zM < -TOLERANCE_M) out.push({ key: 'zM', message: `${label} is ${metres(p.zM)} up, below the floor (z = 0)` });
  else if (p.zM > room.heightM + TOLERANCE_M) out.push({ key: 'zM', message: `${label} is ${metres(p.zM)} up in a ${metres(room.heightM)} high room` });
  return out;
}

/** Each coordinate of `items` beyond a wall of `room`, with its path segments (for a zod issue) and its message. */
export function namedPositionsOutsideRoom(room: RoomBox, items: readonly NamedPosition[]): { path: (string | number)[]; message: string }[] {
  return items.flatMap((item) => coordinatesOutsideRoom(room, item.position, item.label).map((c) => ({ path: [...item.path, c.key], message: c.message })));
}

/** The minimal part of a zod refinement context this needs (zod's `ctx` in superRefine). */
interface IssueSink {
  addIssue(issue: { code: 'custom'; path: (string | number)[]; message: string }): void;
}

/** The "inside the room" refinement, written once: adds an issue at `…xM`/`yM`/`zM` for every coordinate beyond a wall. */
export function refineInsideRoom(ctx: IssueSink, room: RoomBox, items: readonly NamedPosition[]): void {
  for (const issue of namedPositionsOutsideRoom(room, items)) ctx.addIssue({ code: 'custom', path: issue.path, message: issue.message });
}

type DocPositions = Pick<SystemDocument, 'room' | 'seats' | 'speakers' | 'subs' | 'mlpSeatId'>;

/** The seats, speakers and subs of a System as named positions with their document paths. */
export function documentPositions(doc: DocPositions): NamedPosition[] {
  return [
    ...doc.seats.map((s, i) => ({ label: s.id === doc.mlpSeatId && !/\bMLP\b/i.test(s.name) ? `${s.name} (MLP)` : s.name, position: s, path: ['seats', i] })),
    ...doc.speakers.map((s, i) => ({ label: s.channel, position: s, path: ['speakers', i] })),
    ...doc.subs.map((s, i) => ({ label: s.name, position: s, path: ['subs', i] })),
  ];
}

/**
 * Every seat, speaker and sub coordinate of the System that lies outside its room, as `{ path, message }` with zod-style
 * paths (`speakers.0.xM`) and messages such as "L is 40 m across in a 4.9 m wide room". Empty when all are inside.
 * Changing the room never moves anything; this is how the editor finds what no longer fits.
 */
export function positionsOutsideRoom(doc: DocPositions): OutsidePosition[] {
  return namedPositionsOutsideRoom(doc.room, documentPositions(doc)).map((i) => ({ path: i.path.join('.'), message: i.message }));
}

/** The outside positions under `prefix` ("speakers", "subs", "seats.2"). */
export function outsideUnder(outside: readonly OutsidePosition[], prefix: string): OutsidePosition[] {
  return outside.filter((o) => o.path === prefix || o.path.startsWith(`${prefix}.`));
}

/**
 * The outside positions that distances and angles from the MLP would be computed from: the MLP seat, every speaker and
 * every sub (Blend, Timing, Layout and Headroom all measure from the MLP).
 */
export function outsideForMlpGeometry(doc: Pick<SystemDocument, 'seats' | 'mlpSeatId'>, outside: readonly OutsidePosition[]): OutsidePosition[] {
  const mlpIndex = Math.max(0, doc.seats.findIndex((s) => s.id === doc.mlpSeatId));
  return outside.filter((o) => o.path.startsWith('speakers.') || o.path.startsWith('subs.') || o.path.startsWith(`seats.${mlpIndex}.`));
}
