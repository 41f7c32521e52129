import { describe, expect, it } from 'vitest';
import { SWEEP_DEFAULT_RANGE, sweepOffer } from '@/components/blend/sweep-offer';
import { crossoverSweepRequestFromDocument } from '@/lib/system-model/crossover-sweep';
import { crossoverSweepRequestSchema } from '@/lib/validations/compute-blend';
import type { Slope } from '@/lib/validations/system';
import { testSystem } from '../../system-model/test-system';

// Seven distinct pairings, so "one more" than any offer can be built.
const LR = (order: number): Slope => ({ family: 'linkwitz-riley', order });
const BW = (order: number): Slope => ({ family: 'butterworth', order });
const PAIRINGS = [LR(4), LR(2), LR(8), BW(2), BW(3), BW(4), BW(1)].map((s) => ({ mainsFilter: s, subFilter: s }));

/** The request the Crossover sweep builds for the test System with the first `count` pairings, checked by the API's schema. */
function parse(candidatesHz: number[], count: number) {
  const request = crossoverSweepRequestFromDocument(testSystem(), { pairings: PAIRINGS.slice(0, count), candidatesHz });
  return crossoverSweepRequestSchema.safeParse(request);
}

describe('the Crossover sweep offers only what the API accepts', () => {
  it('with the default range (40–150 Hz in 5 Hz steps: 23 points) it offers 5 pairings, and says why not 6', () => {
    const { fromHz, toHz, stepHz } = SWEEP_DEFAULT_RANGE;
    const offer = sweepOffer(fromHz, toHz, stepHz, 1);
    // Counting: (150 − 40) / 5 + 1 = 23 points; 23 × 5 = 115 ≤ 120 < 23 × 6 = 138 (hand computation).
    expect(offer.candidatesHz).toHaveLength(23);
    expect(offer.maxPairings).toBe(5);
    expect(offer.limitNote).toMatch(/23 candidate points, 5 slope pairings fill the 120-row limit/);
  });

  it('the largest offer is accepted by the API schema; one more is refused with a message that says how many fit', () => {
    const { fromHz, toHz, stepHz } = SWEEP_DEFAULT_RANGE;
    const offer = sweepOffer(fromHz, toHz, stepHz, 1);
    expect(parse(offer.candidatesHz, offer.maxPairings).success).toBe(true);
    expect(sweepOffer(fromHz, toHz, stepHz, offer.maxPairings).problem).toBeNull();

    const refused = parse(offer.candidatesHz, offer.maxPairings + 1);
    expect(refused.success).toBe(false);
    const message = refused.error?.issues.find((i) => i.path.join('.') === 'candidatesHz')?.message;
    expect(message).toBe('23 candidate points × 6 slope pairings gives 138 rows; at most 120 are allowed: with 23 candidate points at most 5 slope pairings fit (widen the step or narrow the range to try more)');
    // The page says the same words before sending it.
    expect(sweepOffer(fromHz, toHz, stepHz, offer.maxPairings + 1).problem).toBe(message);
  });

  it('a coarser range (40–150 Hz in 10 Hz steps: 12 points) offers the full 6 with no note; the API takes 6 and refuses 7 by its pairing cap', () => {
    const offer = sweepOffer(40, 150, 10, 1);
    expect(offer.candidatesHz).toHaveLength(12);
    expect(offer.maxPairings).toBe(6);
    expect(offer.limitNote).toBeNull();
    expect(parse(offer.candidatesHz, 6).success).toBe(true);
    const refused = parse(offer.candidatesHz, 7);
    expect(refused.error?.issues.map((i) => i.path.join('.'))).toContain('pairings');
  });

  it('a fine range (40–100 Hz in 1 Hz steps: 61 points) is refused by the page before any pairing count matters', () => {
    expect(sweepOffer(40, 100, 1, 1).problem).toBe('At most 60 candidate points; widen the step.');
    expect(parse(sweepOffer(40, 100, 1, 1).candidatesHz, 1).success).toBe(false);
  });
});
