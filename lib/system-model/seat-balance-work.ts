/** How much work one Seat balance request may do: evaluations scaled to the problem's size. */

/**
 * What a search may cost, in evaluated sub × seat × band-point products (about 7 ns each on this 2-core machine): the
 * settings search at most about 2 s, a placement search about 8 s. Bigger problems get fewer evaluations; a placement
 * search that would get too few is refused (see `seatBalanceWork`).
 */
export const SEAT_BALANCE_WORK = { searchUnits: 3e8, placementUnits: 1.2e9, minQuickEvaluations: 300 } as const;

/** Evaluations for one settings search of `subs` × `seats` on `bandPoints` points: the default budget, capped by work. */
export function searchEvaluations(subs: number, seats: number, bandPoints: number): number {
  return Math.max(500, Math.min(6000 + 6000 * subs, Math.floor(SEAT_BALANCE_WORK.searchUnits / (subs * seats * bandPoints))));
}

/** Evaluations per combination of a placement search (quick pass, finalists), or null when the work is too much. */
export function placementEvaluations(count: number, seats: number, bandPoints: number, combinations: number): { quick: number; final: number } | null {
  const units = count * seats * bandPoints;
  const quick = Math.min(2000, Math.floor((0.7 * SEAT_BALANCE_WORK.placementUnits) / (combinations * units)));
  if (quick < SEAT_BALANCE_WORK.minQuickEvaluations) return null;
  return { quick, final: Math.max(500, Math.min(Math.round(searchEvaluations(count, seats, bandPoints) / 2), Math.floor((0.3 * SEAT_BALANCE_WORK.placementUnits) / (5 * units)))) };
}
