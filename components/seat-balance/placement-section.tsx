import type { SeatBalanceAnswer } from '@/lib/system-model/seat-balance';
import { PlacementPlan } from './placement-plan';
import { PlacementTable } from './placement-table';

type Placements = NonNullable<SeatBalanceAnswer['placements']>;

interface PlacementSectionProps {
  placements: Placements;
  room: { widthM: number; lengthM: number };
  seats: readonly { name: string; xM: number; yM: number }[];
  subs: readonly { name: string; xM: number; yM: number }[];
  presentSpreadDb: number | undefined;
}

/** The ranked placements: how many combinations were ranked, the best few on a floor plan, and the table. */
export function PlacementSection({ placements, room, seats, subs, presentSpreadDb }: PlacementSectionProps) {
  const count = placements.ranked[0]?.subs.length ?? 0;
  return (
    <section aria-labelledby="sb-placement" className="flex flex-col gap-3" data-testid="sb-placement">
      <h3 id="sb-placement" className="text-base font-semibold">
        Positions for {count} {count === 1 ? 'sub' : 'subs'}
      </h3>
      <p className="text-sm" data-testid="sb-placement-count">
        {placements.capped
          ? `Too many combinations to rank them all: ${placements.rankedCombinations} of the ${placements.totalCombinations} were ranked (a fixed sample), so a better one may exist.`
          : `All ${placements.totalCombinations} combinations of ${placements.candidates.length} candidate spots were ranked, each with its own balanced settings.`}{' '}
        Moving subs is building work: listen and measure at the new spots before you commit. The settings beside each combination are for choosing; once the subs are moved on Layout, run Seat balance again: the processor’s distance alignment changes with them.
      </p>
      <div className="grid gap-4 lg:grid-cols-[minmax(0,22rem)_minmax(0,1fr)]">
        <PlacementPlan room={room} seats={seats} subs={subs} placements={placements} shown={3} />
        <PlacementTable placements={placements} presentSpreadDb={presentSpreadDb} />
      </div>
    </section>
  );
}
