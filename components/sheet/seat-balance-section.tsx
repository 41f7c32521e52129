import type { SeatBalanceSummary } from '@/lib/system-model/seat-balance';
import { SETTING_DECIMALS, SPREAD_DECIMALS, type SettingsSheet } from '@/lib/system-model/settings-sheet';

const signed = (x: number, digits: number) => `${x > 0 ? '+' : x < 0 ? '−' : ''}${Math.abs(x).toFixed(digits)}`;
const P = SPREAD_DECIMALS;
const D = SETTING_DECIMALS;

function Spread({ title, meaning, m, testId }: { title: string; meaning: string; m: SeatBalanceSummary; testId: string }) {
  return (
    <div>
      <dt className="font-sans text-xs text-ink-faint">
        {title} <span className="block">{meaning}</span>
      </dt>
      <dd className="text-lg" data-testid={`${testId}-mean`}>
        {m.meanSpreadDb.toFixed(P.meanSpreadDb)} dB
      </dd>
      <dd className="text-xs text-ink-faint">
        largest {m.maxSpreadDb.toFixed(P.maxSpreadDb)} dB at {m.maxSpreadHz.toFixed(P.maxSpreadHz)} Hz · mean level {signed(m.meanLevelDb, P.meanLevelDb)} dB
      </dd>
    </div>
  );
}

/** The Settings sheet's Seat balance block: each sub's own delay, gain and polarity, and the seat-to-seat spread. */
export function SeatBalanceSection({ sheet }: { sheet: SettingsSheet }) {
  const sb = sheet.seatBalance;
  if (!sb) return null;
  return (
    <section aria-labelledby="sheet-seat-balance" className="sheet-block">
      <h2 id="sheet-seat-balance" className="mb-2 text-base font-semibold">
        Seat balance
      </h2>
      <div className="relative overflow-x-auto">
        <table className="sheet-table w-full max-w-xl text-left text-sm">
          <caption className="mb-1 text-left text-xs text-ink-faint">Each sub&apos;s own settings, the ones Seat balance sets (the Subwoofers table above adds distance alignment to the delay)</caption>
          <thead>
            <tr className="border-b border-ink text-xs uppercase tracking-wide text-ink-faint">
              <th scope="col" className="py-1.5 pr-3">Sub</th>
              <th scope="col" className="py-1.5 pr-3 text-right">Own delay</th>
              <th scope="col" className="py-1.5 pr-3 text-right">Gain</th>
              <th scope="col" className="py-1.5">Polarity</th>
            </tr>
          </thead>
          <tbody className="num [&_td]:whitespace-nowrap">
            {sheet.subs.map((s) => (
              <tr key={s.id} className="border-b border-line">
                <th scope="row" className="py-1.5 pr-3 font-sans font-semibold">
                  {s.name}
                </th>
                <td className="py-1.5 pr-3 text-right" data-testid={`sheet-sb-delay-${s.id}`}>
                  {s.ownDelayMs.toFixed(D.delayMs)} ms
                </td>
                <td className="py-1.5 pr-3 text-right" data-testid={`sheet-sb-gain-${s.id}`}>
                  {signed(s.gainDb, D.trimDb)} dB
                </td>
                <td className="py-1.5 font-sans" data-testid={`sheet-sb-polarity-${s.id}`}>
                  {s.polarity}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <dl className="num mt-2 grid grid-cols-1 gap-x-6 gap-y-2 text-sm sm:grid-cols-2">
        <Spread title="Seat-to-seat spread, all subs neutral" meaning="every sub’s own delay 0 ms, 0 dB, normal polarity (distance alignment kept)" m={sb.neutral} testId="sheet-sb-neutral" />
        <Spread title="Seat-to-seat spread, with these settings" meaning="the System's delays, gains and polarity" m={sb.system} testId="sheet-sb-system" />
      </dl>
      <p className="mt-1.5 text-xs text-ink-faint">
        Mean over {sb.band.startHz}–{sb.band.stopHz} Hz of the loudest minus the quietest seat, predicted by the room model (Modes); mean level relative to all subs neutral.
      </p>
    </section>
  );
}
