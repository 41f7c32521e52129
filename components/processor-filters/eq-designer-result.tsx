import { formatNumber, formatSigned } from '@/components/charts';
import type { EqDesignAnswer } from '@/lib/system-model/eq-design';

const residualWords = (l: { rmsDb: number; maxDb: number }) => `${formatNumber(l.rmsDb, 2)} dB RMS, ${formatNumber(l.maxDb, 2)} dB at most`;

/**
 * What a design found, in words and a table: the input used, the residual before and after (RMS and largest, dB), each
 * peaking filter (centre, gain, Q) and every null left alone with its reason. `check` marks a run that included the
 * EQ the subs run now.
 */
export function EqDesignerResult({ answer, check, elapsedMs }: { answer: EqDesignAnswer; check: boolean; elapsedMs: number }) {
  const r = answer.residual;
  const target = answer.target.kind === 'house' ? `a house curve, +${formatNumber(answer.target.riseDb, 1)} dB below ${formatNumber(answer.target.belowHz, 0)} Hz` : 'flat';
  return (
    <div className="flex min-w-0 flex-col gap-3">
      <p className="text-sm" data-testid="eqd-input">
        Input: <span className="font-medium">{answer.input}</span>; target {target}, {answer.band.startHz}–{answer.band.stopHz} Hz
        <span className="text-ink-faint"> ({elapsedMs < 1000 ? `${Math.max(1, Math.round(elapsedMs))} ms` : `${formatNumber(elapsedMs / 1000, 1)} s`})</span>.
      </p>
      <p className="text-sm" data-testid="eqd-residual">
        {check ? 'With the EQ the subs run now' : 'Deviation from the target'} in the band: <span className="num font-semibold" data-testid="eqd-residual-before">{residualWords(r.before)}</span>
        {answer.filters.length ? (
          <>
            {' '}
            before; <span className="num font-semibold" data-testid="eqd-residual-after">{residualWords(r.after)}</span> with {check ? 'the filters below added' : 'the EQ below'}.
          </>
        ) : (
          <>
            {' '}
            — <span data-testid="eqd-residual-after">no filter makes it better</span> within these limits.
          </>
        )}
      </p>
      {answer.filters.length ? (
        <div className="relative min-w-0 overflow-x-auto rounded-md border border-line" tabIndex={0} role="region" aria-label="Designed filters">
          <table className="w-full text-sm" data-testid="eqd-filters">
            <caption className="sr-only">The designed peaking filters, for every sub output</caption>
            <thead className="bg-paper text-left text-ink-soft">
              <tr>
                <th scope="col" className="px-2 py-1.5 font-medium">
                  Filter
                </th>
                <th scope="col" className="px-2 py-1.5 text-right font-medium">
                  Centre (Hz)
                </th>
                <th scope="col" className="px-2 py-1.5 text-right font-medium">
                  Gain (dB)
                </th>
                <th scope="col" className="px-2 py-1.5 text-right font-medium">
                  Q
                </th>
              </tr>
            </thead>
            <tbody className="num">
              {answer.filters.map((f, i) => (
                <tr key={i} className="border-t border-line" data-testid={`eqd-filter-${i + 1}`}>
                  <th scope="row" className="px-2 py-1.5 text-left font-sans font-normal">
                    Peaking {i + 1}
                  </th>
                  <td className="px-2 py-1.5 text-right">{formatNumber(f.centerHz, 1)}</td>
                  <td className={`px-2 py-1.5 text-right ${f.gainDb > 0 ? 'text-warn' : ''}`}>{formatSigned(f.gainDb, undefined, 1)}</td>
                  <td className="px-2 py-1.5 text-right">{formatNumber(f.q, 2)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : null}
      {answer.nulls.length ? (
        <div className="flex flex-col gap-1 text-sm" data-testid="eqd-nulls">
          <p className="font-medium">Nulls left alone</p>
          <ul className="flex list-disc flex-col gap-1 pl-5">
            {answer.nulls.map((n) => (
              <li key={n.frequencyHz}>
                <span className="num">
                  {formatNumber(n.frequencyHz, 1)} Hz ({formatNumber(n.lowHz, 1)}–{formatNumber(n.highHz, 1)} Hz), {formatNumber(n.depthDb, 1)} dB deep
                </span>
                : {n.reason}
              </li>
            ))}
          </ul>
        </div>
      ) : (
        <p className="text-xs text-ink-soft">No deep null in the band: nothing had to be left alone.</p>
      )}
    </div>
  );
}
