'use client';

import { Notice } from '@/components/ui/notice';
import { outputLines, sectionLine } from '@/lib/system-model/processor-filter-exports';
import { deviationWords, groupVoicing, numberedSections, VOICING_NOTE, type OutputGroup } from '@/lib/system-model/processor-filters';
import { CopyButton } from './copy-button';
import { DigitalAnalogPlot } from './digital-analog-plot';

const COEFFICIENTS = ['b0', 'b1', 'b2', 'a1', 'a2'] as const;

/** The heading of a group of outputs that run the same filters. */
function groupTitle(g: OutputGroup): string {
  if (g.kind === 'main') return g.labels.length > 1 ? `Main channels ${g.labels.join(', ')}` : `Main channel ${g.labels[0]}`;
  if (g.kind === 'lfe') return 'LFE input';
  return g.labels.join(', ');
}

/**
 * One processor output (or several that run the same filters): the filters in words (and the speaker's own voicing
 * switches, which are not processor sections), the sections as a table at full
 * precision with a copy button each and one for the whole output, the deviation from the analog filters in words, and
 * the digital-against-analog plot.
 */
export function OutputCard({ group, frequencyHz }: { group: OutputGroup; frequencyHz: Float64Array }) {
  const o = group.first;
  const title = groupTitle(group);
  const sections = numberedSections(o);
  return (
    <article aria-labelledby={`pf-title-${o.id}`} className="flex min-w-0 flex-col gap-3 rounded-lg border border-line bg-white p-3 sm:p-4" data-testid={`pf-output-${o.id}`}>
      <header className="flex flex-col gap-1">
        <h4 id={`pf-title-${o.id}`} className={`text-base font-semibold wrap-anywhere ${group.kind === 'main' ? 'text-mains' : 'text-sub'}`}>
          {title}
        </h4>
        {group.outputs.length > 1 ? <p className="text-xs text-ink-soft">{group.outputs.length} outputs with the same filters: set each of them alike.</p> : null}
        <ol className="flex flex-col gap-0.5 text-sm">
          {o.filters.map((f, i) => (
            <li key={i}>
              <span className="mr-1.5 rounded bg-wash px-1.5 py-0.5 text-xs text-ink-soft">{f.role === 'eq' ? 'EQ' : 'crossover'}</span>
              {f.words}
            </li>
          ))}
        </ol>
        {groupVoicing(group).map((v) => (
          <p key={v.text} className="text-xs text-ink-soft wrap-anywhere" data-testid={`pf-voicing-${o.id}`}>
            {VOICING_NOTE}
            {v.labels ? ` (${v.labels.join(', ')})` : ''}: {v.text}
          </p>
        ))}
      </header>
      {o.problem ? (
        <Notice kind="error" title="Not computed at this sample rate">
          <p>{o.problem}</p>
        </Notice>
      ) : (
        <>
          <div className="relative min-w-0 overflow-x-auto rounded-md border border-line" tabIndex={0} role="region" aria-label={`Sections of ${title}`}>
            <table className="w-full text-sm" data-testid={`pf-sections-${o.id}`}>
              <caption className="sr-only">Second-order sections of {title} in the order the output runs them; coefficients at full precision</caption>
              <thead className="bg-paper text-left text-ink-soft">
                <tr>
                  <th scope="col" className="px-2 py-1.5 font-medium">Section</th>
                  {COEFFICIENTS.map((c) => (
                    <th key={c} scope="col" className="px-2 py-1.5 text-right font-medium">
                      {c}
                    </th>
                  ))}
                  <th scope="col" className="px-2 py-1.5 font-medium">
                    <span className="sr-only">Copy</span>
                  </th>
                </tr>
              </thead>
              <tbody>
                {sections.map((s) => (
                  <tr key={s.section} className="border-t border-line align-top" data-testid={`pf-section-${o.id}-${s.section}`}>
                    <th scope="row" className="whitespace-nowrap px-2 py-1.5 text-left font-normal">
                      {s.section}
                      <span className="block text-xs text-ink-soft">{o.filters[s.filter]?.role === 'eq' ? `EQ ${s.filter}` : 'crossover'}</span>
                    </th>
                    {COEFFICIENTS.map((c) => (
                      <td key={c} className="num whitespace-nowrap px-2 py-1.5 text-right text-xs" data-coefficient={c}>
                        {String(s[c])}
                      </td>
                    ))}
                    <td className="px-2 py-1.5">
                      <CopyButton text={sectionLine(s)} label={`Copy section ${s.section} of ${title}`} testId={`pf-copy-${o.id}-${s.section}`}>
                        Copy
                      </CopyButton>
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <div className="flex flex-wrap items-center gap-3">
            <CopyButton text={outputLines(o)} label={`Copy every section of ${title}`} testId={`pf-copy-${o.id}`}>
              Copy all sections
            </CopyButton>
            {o.result ? (
              <p className="text-sm text-ink-soft" data-testid={`pf-deviation-${o.id}`}>
                The digital filters are {deviationWords(o.result.deviation)}.
              </p>
            ) : null}
          </div>
          <DigitalAnalogPlot output={o} frequencyHz={frequencyHz} title={title} />
        </>
      )}
    </article>
  );
}
