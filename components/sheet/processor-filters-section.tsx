import { COEFFICIENT_SIGN_NOTE, VOICING_NOTE } from '@/lib/system-model/processor-filters';
import type { SettingsSheet } from '@/lib/system-model/settings-sheet';

const COEFFICIENTS = ['b0', 'b1', 'b2', 'a1', 'a2'] as const;
const kHz = (hz: number) => `${hz / 1000} kHz`;

/**
 * The Settings sheet's Processor filters: the sample rate, the convention once, and every section of every output at
 * full precision (the same numbers as the editor's Processor filters tab: both come from processorFiltersFromDocument).
 */
export function ProcessorFiltersSection({ sheet }: { sheet: SettingsSheet }) {
  const pf = sheet.processorFilters;
  if (!pf.groups.length) return null;
  return (
    <section aria-labelledby="sheet-processor-filters" className="flex flex-col gap-2" data-testid="sheet-processor-filters">
      <h2 id="sheet-processor-filters" className="text-base font-semibold">
        Processor filters <span className="text-sm font-normal text-ink-faint">(digital biquads at {kHz(pf.sampleRateHz)})</span>
      </h2>
      <p className="text-sm">
        Sample rate <span className="num font-semibold" data-testid="sheet-pf-rate">{pf.sampleRateHz} Hz</span>. Every section in the convention{' '}
        <span className="num font-semibold wrap-anywhere sm:whitespace-nowrap">{pf.convention}</span>. {COEFFICIENT_SIGN_NOTE}
      </p>
      {pf.groups.map((g) => (
        <div key={g.key} className="sheet-block flex flex-col gap-1 border-t border-line pt-2">
          <h3 className="text-sm font-semibold">
            {g.kind === 'main' ? `Main channels ${g.labels.join(', ')}` : g.labels.join(', ')}
            <span className="font-normal text-ink-soft"> — {g.filters.map((f) => f.words).join('; ')}</span>
          </h3>
          {g.voicing.map((v) => (
            <p key={v.text} className="text-xs text-ink-soft" data-testid={`sheet-pf-voicing-${g.id}`}>
              {VOICING_NOTE}
              {v.labels ? ` (${v.labels.join(', ')})` : ''}: {v.text}
            </p>
          ))}
          {g.problem ? (
            <p className="text-sm text-fail">Not computed: {g.problem}</p>
          ) : (
            <div className="relative overflow-x-auto">
              <table className="sheet-table w-full text-left text-xs">
                <caption className="sr-only">Sections of {g.labels.join(', ')}, in the order the output runs them</caption>
                <thead>
                  <tr className="border-b border-ink uppercase tracking-wide text-ink-faint">
                    <th scope="col" className="py-1 pr-3">Section</th>
                    {COEFFICIENTS.map((c) => (
                      <th key={c} scope="col" className="py-1 pr-3 text-right normal-case">
                        {c}
                      </th>
                    ))}
                  </tr>
                </thead>
                <tbody className="num">
                  {g.sections.map((s) => (
                    <tr key={s.section} className="border-b border-line" data-testid={`sheet-pf-${g.id}-${s.section}`}>
                      <th scope="row" className="py-1 pr-3 font-sans font-normal whitespace-nowrap">
                        {s.section} · {g.filters[s.filter]?.role === 'eq' ? 'EQ' : 'crossover'}
                      </th>
                      {COEFFICIENTS.map((c) => (
                        <td key={c} className="py-1 pr-3 text-right whitespace-nowrap print:break-all print:whitespace-normal">
                          {String(s[c])}
                        </td>
                      ))}
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          )}
          {g.deviation ? <p className="text-xs text-ink-faint">The digital filters are {g.deviation}.</p> : null}
        </div>
      ))}
      {pf.lfeNote ? <p className="text-xs text-ink-faint">{pf.lfeNote}</p> : null}
      {pf.groups.some((g) => g.filters.some((f) => f.role === 'eq')) ? (
        <p className="text-xs text-ink-faint">EQ: a boost in a sub’s low end costs amplifier and driver headroom (+3 dB asks twice the power); check Headroom after any EQ change and raise levels gradually.</p>
      ) : null}
    </section>
  );
}
