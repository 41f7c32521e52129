/**
 * Layout, a pair entered as it is measured: the front pair by spacing (or included angle) and distance from the MLP,
 * a surround pair by its angle from straight ahead and distance (`planPairPlacement`, the mathematics in
 * dsp/layout/pair-placement), and the plan written back (`applyPairPlacementToDocument`), which changes only the
 * x and y of the speakers it names: heights, aims, distance settings and everything else stay as they are.
 */
import { includedAngleDeg, pairPlacement, speakerAngles, type PointM } from '@/dsp';
import { formatLength } from '@/lib/units';
import type { Speaker, SystemDocument } from '@/lib/validations/system';
import { mlpSeat, toPointM } from './geometry';
import { coordinatesOutsideRoom } from './room-bounds';
import { roundTo } from './rounding';

type Channel = Speaker['channel'];

/** The pairs that can be entered this way: left channel, right channel, and how the angle is given. */
export const PLACEABLE_PAIRS = [
  { id: 'front', left: 'L', right: 'R', name: 'Front pair (L, R)' },
  { id: 'side', left: 'SL', right: 'SR', name: 'Surround pair (SL, SR)' },
  { id: 'back', left: 'SBL', right: 'SBR', name: 'Back surround pair (SBL, SBR)' },
  { id: 'wide', left: 'FWL', right: 'FWR', name: 'Front wide pair (FWL, FWR)' },
] as const satisfies readonly { id: string; left: Channel; right: Channel; name: string }[];

export type PairId = (typeof PLACEABLE_PAIRS)[number]['id'];

/** What was measured: the distance from the MLP to each speaker and one of spacing, included angle or azimuth. */
export type PairEntry = {
  pair: PairId;
  distanceM: number;
  /** Also put C on the centre line at the same distance (front pair only, when the System has a C). */
  placeCentre?: boolean;
} & ({ spacingM: number } | { includedAngleDeg: number } | { azimuthDeg: number });

/** Which input a problem belongs to, and the message a person reads. */
export interface PairProblem {
  field: 'pair' | 'distance' | 'spacing' | 'angle' | 'room';
  message: string;
}

export interface PairPlan {
  /** The speakers moved and where to: x and y change, z is kept. */
  moves: { channel: Channel; id: string; xM: number; yM: number; zM: number }[];
  /** Floor-plan angle (what the angle checks use), deg. */
  includedAngleDeg: number;
  /** Angle seen from the listener's ears, in space, deg (2·asin(s / 2d) of the numbers measured). */
  earAngleDeg: number;
  spacingM: number;
}

const WALLS: Record<'xM' | 'yM', [string, string]> = { xM: ['left wall', 'right wall'], yM: ['front wall', 'back wall'] };

/** How far beyond which wall a point lies (x and y; heights are kept), in words, e.g. "L would be 0.3 m beyond the left wall". */
function wallProblems(doc: SystemDocument, channel: string, p: PointM, units: 'metric' | 'imperial'): PairProblem[] {
  const size = { xM: doc.room.widthM, yM: doc.room.lengthM };
  return (['xM', 'yM'] as const).flatMap((key) => {
    const v = key === 'xM' ? p.x : p.y;
    const beyond = v < 0 ? -v : v - size[key];
    if (beyond <= 1e-9) return [];
    const wall = WALLS[key][v < 0 ? 0 : 1];
    return [{ field: 'room' as const, message: `${channel} would be ${formatLength(beyond, units)} beyond the ${wall}: shorten the spacing or the distance, or move the MLP.` }];
  });
}

/** A RangeError of dsp's pairPlacement as the input it is about and a message in the entry's own terms. */
function problemFromRangeError(error: RangeError, entry: PairEntry, units: 'metric' | 'imperial', left: string, right: string): PairProblem {
  const m = error.message;
  const d = formatLength(entry.distanceM, units);
  if (/^spacingM.*twice/.test(m)) return { field: 'spacing', message: `The spacing (${formatLength((entry as { spacingM: number }).spacingM, units)}) is more than twice the distance (${d}): two speakers that far apart cannot both be that close to the MLP.` };
  if (/^spacingM/.test(m)) return { field: 'spacing', message: 'The spacing must be more than 0.' };
  const height = /between the listener and (leftZM|rightZM|centreZM)/.exec(m);
  if (height) return { field: 'distance', message: `The distance (${d}) is shorter than the height difference between the MLP and ${height[1] === 'leftZM' ? left : height[1] === 'rightZM' ? right : 'C'}.` };
  if (/^includedAngleDeg/.test(m)) return { field: 'angle', message: 'The included angle must be more than 0° and at most 180°.' };
  if (/^azimuthDeg/.test(m)) return { field: 'angle', message: 'The angle from straight ahead must be more than 0° and less than 180°.' };
  if (/^distanceM/.test(m)) return { field: 'distance', message: 'The distance must be more than 0.' };
  return { field: 'pair', message: m };
}

/**
 * Where the pair goes, or why it cannot: a speaker the System lacks, the MLP outside the room, a spacing more than
 * twice the distance, a distance shorter than a height difference, or a speaker that would land beyond a wall (named,
 * with the wall and by how much, in the editor's units).
 */
export function planPairPlacement(doc: SystemDocument, entry: PairEntry, units: 'metric' | 'imperial'): { ok: true; plan: PairPlan } | { ok: false; problems: PairProblem[] } {
  const pair = PLACEABLE_PAIRS.find((p) => p.id === entry.pair)!;
  const find = (channel: Channel) => doc.speakers.find((s) => s.channel === channel);
  const [left, right] = [find(pair.left), find(pair.right)];
  const missing = [left ? null : pair.left, right ? null : pair.right].filter(Boolean);
  if (!left || !right) return { ok: false, problems: [{ field: 'pair', message: `The System has no ${missing.join(' or ')}: apply a template that has ${missing.length > 1 ? 'them' : 'it'} first.` }] };
  const mlp = mlpSeat(doc);
  if (coordinatesOutsideRoom(doc.room, mlp, 'MLP').length) return { ok: false, problems: [{ field: 'pair', message: 'The MLP is outside the room: move it inside before placing speakers around it.' }] };
  const centre = entry.pair === 'front' && entry.placeCentre ? find('C') : undefined;
  let placed: ReturnType<typeof pairPlacement>;
  try {
    placed = pairPlacement({ listenerM: toPointM(mlp), distanceM: entry.distanceM, leftZM: left.zM, rightZM: right.zM, centreZM: centre?.zM, ...('spacingM' in entry ? { spacingM: entry.spacingM } : 'includedAngleDeg' in entry ? { includedAngleDeg: entry.includedAngleDeg } : { azimuthDeg: entry.azimuthDeg }) });
  } catch (error) {
    if (error instanceof RangeError) return { ok: false, problems: [problemFromRangeError(error, entry, units, pair.left, pair.right)] };
    throw error;
  }
  const targets: [Speaker, PointM][] = [
    [left, placed.leftM],
    [right, placed.rightM],
    ...(centre && placed.centreM ? [[centre, placed.centreM] as [Speaker, PointM]] : []),
  ];
  const problems = targets.flatMap(([s, p]) => wallProblems(doc, s.channel, p, units));
  if (problems.length) return { ok: false, problems };
  return {
    ok: true,
    plan: {
      moves: targets.map(([s, p]) => ({ channel: s.channel, id: s.id, xM: roundTo(p.x, 4), yM: roundTo(p.y, 4), zM: s.zM })),
      includedAngleDeg: placed.includedAngleDeg,
      earAngleDeg: placed.earAngleDeg,
      spacingM: placed.spacingM,
    },
  };
}

/** The document with the planned speakers at their new x and y; nothing else changes (heights, aims, distance settings, trims). */
export function applyPairPlacementToDocument(doc: SystemDocument, plan: PairPlan): SystemDocument {
  const byId = new Map(plan.moves.map((m) => [m.id, m]));
  return { ...doc, speakers: doc.speakers.map((s) => (byId.has(s.id) ? { ...s, xM: byId.get(s.id)!.xM, yM: byId.get(s.id)!.yM } : s)) };
}

/**
 * The pair as it stands, in the terms of the entry (to start the form from): the mean distance from the MLP to the
 * two speakers, their spacing across and in the floor plan, the included angle and the mean angle from straight ahead.
 * Null when the System lacks either speaker.
 */
export function currentPairMeasures(doc: SystemDocument, pairId: PairId): { distanceM: number; spacingM: number; includedAngleDeg: number; azimuthDeg: number } | null {
  const pair = PLACEABLE_PAIRS.find((p) => p.id === pairId)!;
  const left = doc.speakers.find((s) => s.channel === pair.left);
  const right = doc.speakers.find((s) => s.channel === pair.right);
  if (!left || !right) return null;
  const listenerM = toPointM(mlpSeat(doc));
  try {
    const [a, b] = [speakerAngles({ listenerM, speakerM: toPointM(left) }), speakerAngles({ listenerM, speakerM: toPointM(right) })];
    return {
      distanceM: (a.distanceM + b.distanceM) / 2,
      spacingM: Math.abs(right.xM - left.xM),
      includedAngleDeg: includedAngleDeg({ listenerM, aM: toPointM(left), bM: toPointM(right) }),
      azimuthDeg: (Math.abs(a.azimuthDeg) + Math.abs(b.azimuthDeg)) / 2,
    };
  } catch {
    return null; // a speaker on the MLP itself: nothing to start from
  }
}
