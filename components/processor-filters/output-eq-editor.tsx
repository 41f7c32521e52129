'use client';

import { EQ_LIMITS } from '@/dsp';
import { useSystem } from '@/components/system/system-context';
import { Button } from '@/components/ui/button';
import { NumberField } from '@/components/ui/number-field';
import type { PeakingFilterInput } from '@/lib/validations/eq-filter';
import type { SystemDocument } from '@/lib/validations/system';

/** The document's limits of a sub's EQ (lib/validations/system.ts subSchema, eq-filter.ts). */
const MAX_OUTPUT_FILTERS = 10;
const CENTER_HZ = { min: 5, max: 192000 } as const;
/** A new filter changes nothing until its gain is set. */
const NEW_FILTER: PeakingFilterInput = { kind: 'peaking', centerHz: 50, gainDb: 0, q: 4 };

function withEq(doc: SystemDocument, subIndex: number, eq: PeakingFilterInput[]): SystemDocument {
  return { ...doc, subs: doc.subs.map((s, k) => (k === subIndex ? { ...s, eq } : s)) };
}

/** One sub's processor EQ: peaking filters added, edited and removed in the document (at most 10). */
export function OutputEqEditor({ subIndex }: { subIndex: number }) {
  const { doc, update, readOnly } = useSystem();
  const sub = doc.subs[subIndex];
  if (!sub) return null;
  const { eq } = sub;
  const set = (next: PeakingFilterInput[]) => update((d) => withEq(d, subIndex, next));
  const edit = (i: number, patch: Partial<PeakingFilterInput>) => update((d) => withEq(d, subIndex, (d.subs[subIndex]?.eq ?? []).map((f, j) => (j === i ? { ...f, ...patch } : f))));
  return (
    <div className="flex min-w-0 flex-col gap-2 rounded-md border border-line bg-white p-3" data-testid={`pf-eq-${sub.id}`}>
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h4 className="text-sm font-semibold text-sub">{sub.name}</h4>
        {!readOnly ? (
          <Button variant="secondary" onClick={() => set([...eq, NEW_FILTER])} disabled={eq.length >= MAX_OUTPUT_FILTERS} data-testid={`pf-eq-add-${sub.id}`}>
            Add a peaking filter
          </Button>
        ) : null}
      </div>
      {eq.length ? (
        <ol className="flex flex-col gap-2">
          {eq.map((f, i) => (
            <li key={i} className="border-t border-line pt-2">
              <fieldset className="flex flex-wrap items-end gap-3">
                <legend className="mb-1 text-xs text-ink-soft">
                  <span className="sr-only">{sub.name} </span>EQ {i + 1}
                </legend>
                <NumberField label="Centre" unit="Hz" value={f.centerHz} onChange={(centerHz) => edit(i, { centerHz })} min={CENTER_HZ.min} max={CENTER_HZ.max} step={1} digits={1} disabled={readOnly} className="w-28" />
                <NumberField label="Gain" unit="dB" value={f.gainDb} onChange={(gainDb) => edit(i, { gainDb })} min={EQ_LIMITS.gainDb.min} max={EQ_LIMITS.gainDb.max} step={0.5} digits={1} disabled={readOnly} className="w-28" />
                <NumberField label="Q" value={f.q} onChange={(q) => edit(i, { q })} min={EQ_LIMITS.q.min} max={EQ_LIMITS.q.max} step={0.1} digits={2} disabled={readOnly} className="w-28" />
                {!readOnly ? (
                  <Button variant="ghost" onClick={() => set(eq.filter((_, j) => j !== i))} aria-label={`Remove ${sub.name} EQ ${i + 1}`}>
                    Remove
                  </Button>
                ) : null}
              </fieldset>
              {f.gainDb > 0 ? (
                <p className="mt-1 text-xs text-warn" data-testid={`pf-eq-boost-${sub.id}-${i}`}>
                  A {f.gainDb} dB boost needs {Math.pow(10, f.gainDb / 10).toFixed(1)}× the amplifier power, and more cone travel, at {f.centerHz} Hz: check the Headroom tab.
                </p>
              ) : null}
            </li>
          ))}
        </ol>
      ) : (
        <p className="text-xs text-ink-soft">No EQ on this sub.</p>
      )}
    </div>
  );
}
