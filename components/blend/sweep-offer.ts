import { candidateRangeHz } from '@/lib/system-model/crossover-sweep';
import { SWEEP_LIMITS, sweepPairingsThatFit, sweepRowsProblem } from '@/lib/validations/compute-blend';

/** The Crossover sweep's range when it opens: 40–150 Hz in 5 Hz steps (23 candidate points). */
export const SWEEP_DEFAULT_RANGE = { fromHz: 40, toHz: 150, stepHz: 5 } as const;

export interface SweepOffer {
  candidatesHz: number[];
  /** Slope pairings the user may tick with this range: as many as fit the API's row cap, at most its pairing cap. */
  maxPairings: number;
  /** Why fewer than the pairing cap are offered, or null. */
  limitNote: string | null;
  /** Why the sweep cannot run as set (the API would refuse it, with the same words), or null. */
  problem: string | null;
}

/**
 * What the Crossover sweep offers for a range and a number of ticked pairings, from the limits the API's schema
 * applies (SWEEP_LIMITS, sweepRowsProblem), so the page never offers a sweep the API refuses.
 */
export function sweepOffer(fromHz: number, toHz: number, stepHz: number, pairingCount: number): SweepOffer {
  const candidatesHz = candidateRangeHz(fromHz, toHz, stepHz);
  const n = candidatesHz.length;
  const maxPairings = n > SWEEP_LIMITS.maxCandidates ? SWEEP_LIMITS.maxPairings : sweepPairingsThatFit(n);
  const limitNote =
    maxPairings < SWEEP_LIMITS.maxPairings && n <= SWEEP_LIMITS.maxCandidates
      ? `With ${n} candidate points, ${maxPairings} slope pairing${maxPairings === 1 ? '' : 's'} fill the ${SWEEP_LIMITS.maxRows}-row limit of one sweep; widen the step or narrow the range to try up to ${SWEEP_LIMITS.maxPairings}.`
      : null;
  const problem =
    toHz < fromHz
      ? 'The last candidate must not be below the first.'
      : n > SWEEP_LIMITS.maxCandidates
        ? `At most ${SWEEP_LIMITS.maxCandidates} candidate points; widen the step.`
        : pairingCount === 0
          ? 'Pick at least one slope pairing.'
          : sweepRowsProblem(n, pairingCount);
  return { candidatesHz, maxPairings, limitNote, problem };
}
