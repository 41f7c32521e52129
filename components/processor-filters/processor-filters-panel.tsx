'use client';

import { useMemo } from 'react';
import { useSystem } from '@/components/system/system-context';
import { Notice } from '@/components/ui/notice';
import { COEFFICIENT_SIGN_NOTE, groupOutputs, LFE_NOTE, processorFiltersFromDocument } from '@/lib/system-model/processor-filters';
import { ProcessorFilterDownloads } from './downloads';
import { EqDesigner } from './eq-designer';
import { OutputCard } from './output-card';
import { SampleRatePicker } from './sample-rate-picker';
import { OutputEqEditor } from './output-eq-editor';

/**
 * Processor filters: every filter of the finished System as the digital biquads a processor runs at its sample rate —
 * each main channel's high-pass, each sub's low-pass and EQ, the LFE low-pass — with the convention, copy buttons and
 * downloads, the digital filters against their analog prototypes, each sub's EQ to edit and the EQ designer for the subs.
 */
export function ProcessorFiltersPanel() {
  const { doc } = useSystem();
  const pf = useMemo(() => processorFiltersFromDocument(doc), [doc]);
  const groups = useMemo(() => groupOutputs(pf.outputs), [pf]);
  return (
    <div className="flex min-w-0 flex-col gap-6" data-testid="processor-filters-panel">
      <section aria-labelledby="pf-convention" className="flex flex-col gap-1 rounded-lg border border-line bg-white p-3 sm:p-4">
        <h3 id="pf-convention" className="text-base font-semibold">
          The convention of every section
        </h3>
        <p className="num text-base wrap-anywhere" data-testid="pf-convention">
          {pf.convention}
        </p>
        <p className="text-sm text-ink-soft">{COEFFICIENT_SIGN_NOTE} A first-order section has b2 = a2 = 0. Sections run in the order listed.</p>
      </section>

      <SampleRatePicker />

      <section aria-labelledby="pf-eq" className="flex flex-col gap-3">
        <h3 id="pf-eq" className="text-base font-semibold">
          Each sub’s EQ
        </h3>
        <Notice kind="warn" title="Boosting costs headroom">
          <p>
            Boosting a sub’s low end costs amplifier and driver headroom: every +3 dB asks twice the amplifier power, and the cone travels further. Cut peaks rather than fill nulls (a
            null at a seat does not fill however much power goes in). After changing EQ, check the Headroom tab, then raise levels gradually and keep them safe for the speakers and for
            everyone’s hearing.
          </p>
        </Notice>
        {doc.subs.length ? (
          <div className="grid min-w-0 gap-3 lg:grid-cols-2">
            {doc.subs.map((s, k) => (
              <OutputEqEditor key={s.id} subIndex={k} />
            ))}
          </div>
        ) : (
          <p className="text-sm text-ink-soft">This System has no subs.</p>
        )}
        <EqDesigner />
      </section>

      <section aria-labelledby="pf-outputs" className="flex min-w-0 flex-col gap-3">
        <div className="flex flex-wrap items-center justify-between gap-2">
          <h3 id="pf-outputs" className="text-base font-semibold">
            Every output at {pf.sampleRateHz / 1000} kHz
          </h3>
          <ProcessorFilterDownloads pf={pf} />
        </div>
        {groups.length ? (
          groups.map((g) => <OutputCard key={g.key} group={g} frequencyHz={pf.frequencyHz} />)
        ) : (
          <p className="text-sm text-ink-soft">Add speakers or subs to see their filters.</p>
        )}
        {groups.some((g) => g.kind === 'lfe') ? <p className="text-xs text-ink-soft">{LFE_NOTE}</p> : null}
        <p className="text-xs text-ink-soft">
          Crossovers: the Butterworth and Linkwitz–Riley analog filters through the bilinear transform, pre-warped so each corner lands exactly (Oppenheim and Schafer, “Discrete-Time
          Signal Processing”). EQ: R. Bristow-Johnson’s Audio EQ Cookbook (W3C note, 2021). Deviation: over the grid up to min(20 kHz, 0.45 × the sample rate), where the analog level is
          above −40 dB.
        </p>
      </section>
    </div>
  );
}
