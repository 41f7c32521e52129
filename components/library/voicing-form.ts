import type { EqFilterInput } from '@/lib/validations/eq-filter';

type Kind = EqFilterInput['kind'];
type ShelfWidth = 'slope' | 'q';

/** Limits the profile form offers (the schema's: 4 switches, 2–6 positions, 4 filters a position). */
export const VOICING_FORM_LIMITS = { switches: 4, minPositions: 2, maxPositions: 6, filters: 4 } as const;

/** The first `${prefix}${n}` (n = 1, 2…) not among the ids taken: ids stay short and never change when a name does. */
export function nextVoicingId(prefix: string, taken: readonly string[]): string {
  let n = 1;
  while (taken.includes(`${prefix}${n}`)) n++;
  return `${prefix}${n}`;
}

/** A new switch with two positions, the first flat (the position a speaker has until someone picks another). */
export function newVoicingSwitch(takenIds: readonly string[]) {
  return { id: nextVoicingId('switch', takenIds), name: '', positions: [{ id: 'pos1', name: 'Normal', filters: [] }, { id: 'pos2', name: '', filters: [newEqFilter()] }] };
}

export function newVoicingPosition(takenIds: readonly string[]) {
  return { id: nextVoicingId('pos', takenIds), name: '', filters: [] };
}

/** A plain first filter: a −2 dB low shelf at 150 Hz, slope 1 (something to edit, not a recommendation). */
export function newEqFilter(): EqFilterInput {
  return { kind: 'low-shelf', cornerHz: 150, gainDb: -2, slope: 1 };
}

/** The filter as another kind, keeping its frequency and gain (a peaking filter starts at Q 1, a shelf at slope 1). */
export function filterOfKind(filter: EqFilterInput, kind: Kind): EqFilterInput {
  const hz = filter.kind === 'peaking' ? filter.centerHz : filter.cornerHz;
  if (kind === 'peaking') return { kind, centerHz: hz, gainDb: filter.gainDb, q: filter.kind === 'peaking' ? filter.q : 1 };
  if (filter.kind === 'peaking') return { kind, cornerHz: hz, gainDb: filter.gainDb, slope: 1 };
  return { ...filter, kind };
}

/** How a shelf's width is given: the cookbook's slope S (the default) or a Q. */
export function shelfWidth(filter: EqFilterInput): ShelfWidth {
  return filter.kind !== 'peaking' && filter.q !== undefined ? 'q' : 'slope';
}

/** The shelf with its width given the other way (slope 1, or Q 0.71); a peaking filter as it is. */
export function filterWithWidth(filter: EqFilterInput, width: ShelfWidth): EqFilterInput {
  if (filter.kind === 'peaking') return filter;
  const { kind, cornerHz, gainDb } = filter;
  return width === 'q' ? { kind, cornerHz, gainDb, q: filter.q ?? 0.71 } : { kind, cornerHz, gainDb, slope: filter.slope ?? 1 };
}
