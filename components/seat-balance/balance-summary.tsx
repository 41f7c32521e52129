import { formatHzReadout, formatNumber, formatSigned } from '@/components/charts';
import type { SeatBalanceAnswer, SeatBalanceSummary } from '@/lib/system-model/seat-balance';

const CARDS = [
  { key: 'before', title: 'Before', meaning: 'every sub’s own delay 0 ms, 0 dB, normal polarity (distance alignment kept)' },
  { key: 'present', title: 'Present', meaning: 'the System’s settings now' },
  { key: 'after', title: 'Recommended', meaning: 'the search’s settings' },
] as const;

/** "Delays 0–20 ms, gains −12 to +6 dB, inversion allowed; the output floor in words." */
function limitsText(limits: SeatBalanceAnswer['limits']): string {
  return `Delays 0 to ${formatNumber(limits.maxDelayMs, 1)} ms, gains ${formatSigned(limits.minGainDb, 'dB')} to ${formatSigned(limits.maxGainDb, 'dB')}, polarity inversion ${limits.allowInvert ? 'allowed' : 'not allowed'}; the seats’ mean level may fall at most ${formatNumber(limits.maxOutputLossDb, 1)} dB below all subs in phase.`;
}

function Card({ title, meaning, s, testId, strong }: { title: string; meaning: string; s: SeatBalanceSummary; testId: string; strong?: boolean }) {
  return (
    <div className={`flex flex-col gap-1 rounded-md border bg-white px-3 py-2 ${strong ? 'border-mains' : 'border-line'}`} data-testid={testId}>
      <p className="text-sm font-semibold">
        {title} <span className="block text-xs font-normal text-ink-soft">{meaning}</span>
      </p>
      <dl className="num grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-sm">
        <dt className="font-sans text-xs text-ink-soft">Mean spread</dt>
        <dd className="text-lg font-semibold" data-testid={`${testId}-mean`}>
          {formatNumber(s.meanSpreadDb, 2)} dB
        </dd>
        <dt className="font-sans text-xs text-ink-soft">Largest spread</dt>
        <dd>
          {formatNumber(s.maxSpreadDb, 1)} dB <span className="text-ink-soft">at {formatHzReadout(s.maxSpreadHz)}</span>
        </dd>
        <dt className="font-sans text-xs text-ink-soft">Mean level</dt>
        <dd>
          {formatSigned(s.meanLevelDb, 'dB', 2)} <span className="font-sans text-xs text-ink-soft">vs all subs in phase</span>
        </dd>
      </dl>
    </div>
  );
}

/** The measures before, now and recommended, what was minimised, the limits, and how long the search took. */
export function BalanceSummary({ answer, elapsedMs }: { answer: SeatBalanceAnswer; elapsedMs: number }) {
  const band = `${formatHzReadout(answer.band.startHz)} to ${formatHzReadout(answer.band.stopHz)}`;
  const measured = answer.source === 'measured';
  return (
    <section aria-labelledby="sb-summary" className="flex flex-col gap-3">
      <h3 id="sb-summary" className="text-base font-semibold">
        Seat-to-seat spread, {band}, {measured ? 'measured at the seats' : 'model'}
      </h3>
      <div className="grid gap-3 sm:grid-cols-3">
        {CARDS.map((c) => {
          const s = answer[c.key];
          const meaning = measured && c.key === 'before' ? 'the files as measured: every sub at 0 ms, 0 dB, normal polarity in the processor' : c.meaning;
          return s ? <Card key={c.key} title={c.title} meaning={meaning} s={s} testId={`sb-${c.key}`} strong={c.key === 'after'} /> : null;
        })}
      </div>
      <p className="text-sm" data-testid="sb-objective">
        What is made small: the mean seat-to-seat spread from {band} — at each frequency the loudest seat minus the quietest, averaged over the band. {limitsText(answer.limits)}
      </p>
      <p className="num text-xs text-ink-soft" data-testid="sb-run-stats" data-elapsed-ms={Math.round(elapsedMs)} data-evaluated={answer.evaluated}>
        Took {formatNumber(elapsedMs / 1000, 1)} s {measured ? 'on the server' : 'in this browser'}; {answer.evaluated.toLocaleString('en-US')} candidate settings evaluated.
      </p>
    </section>
  );
}
