import { formatNumber, formatSigned } from '@/components/charts';
import type { SeatBalanceAnswer } from '@/lib/system-model/seat-balance';

type Placements = NonNullable<SeatBalanceAnswer['placements']>;

/** The ranked combinations of candidate spots: where each sub stands, its settings, and the mean spread after. */
export function PlacementTable({ placements, presentSpreadDb }: { placements: Placements; presentSpreadDb: number | undefined }) {
  return (
    <div className="relative overflow-x-auto" role="region" aria-label="Ranked sub positions (scrolls sideways)" tabIndex={0}>
      <table className="w-full min-w-[32rem] border-collapse text-sm" data-testid="sb-placement-table">
        <caption className="pb-2 text-left text-sm text-ink-soft">
          Best combinations, ranked by the mean spread after balancing
          {presentSpreadDb !== undefined ? ` (the subs where they stand, with their present settings: ${formatNumber(presentSpreadDb, 2)} dB)` : ''}
        </caption>
        <thead>
          <tr className="border-b border-line text-left text-xs text-ink-soft">
            <th scope="col" className="px-2 py-1.5 font-medium">Rank</th>
            <th scope="col" className="px-2 py-1.5 font-medium">Positions and settings</th>
            <th scope="col" className="px-2 py-1.5 text-right font-medium">Mean spread after</th>
          </tr>
        </thead>
        <tbody className="num">
          {placements.ranked.map((r, i) => (
            <tr key={i} className="border-b border-line align-top">
              <th scope="row" className="px-2 py-1.5 text-left">{i + 1}</th>
              <td className="px-2 py-1.5">
                <ul className="flex flex-col gap-0.5">
                  {r.subs.map((s) => (
                    <li key={s.name}>
                      <span className="font-sans">{s.candidate}</span>{' '}
                      <span className="text-ink-soft">
                        {formatNumber(s.delayMs, 2)} ms, {formatSigned(s.gainDb, 'dB')}, {s.invert ? 'inverted' : 'normal'}
                      </span>
                    </li>
                  ))}
                </ul>
              </td>
              <td className="whitespace-nowrap px-2 py-1.5 text-right">
                {formatNumber(r.after.meanSpreadDb, 2)} dB
                <span className="block text-xs text-ink-faint">neutral {formatNumber(r.before.meanSpreadDb, 2)} dB</span>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
