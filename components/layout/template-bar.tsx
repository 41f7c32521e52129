'use client';

import { useState } from 'react';
import type { UnitSystem } from '@/components/system/system-context';
import { Button } from '@/components/ui/button';
import { NumberField } from '@/components/ui/number-field';
import { applyLayoutToDocument } from '@/lib/system-model/layout';
import { formatLength } from '@/lib/units';
import { LAYOUT_NAMES, type LayoutName, type SystemDocument } from '@/lib/validations/system';

type Units = UnitSystem;

/** What applying a template changes, e.g. `["add L, R", "move C"]` with the verbs `['add', 'move', 'remove']`. */
function changeParts(change: { added: string[]; moved: string[]; removed: string[] }, verbs: readonly [string, string, string]): string[] {
  return [change.added, change.moved, change.removed].map((names, i) => (names.length ? `${verbs[i]} ${names.join(', ')}` : '')).filter(Boolean);
}

/** The layout template with a preview of what applying it changes, the MLP, and the units. */
export function TemplateBar({ doc, units, setUnits, readOnly, update, mlpOutside }: { doc: SystemDocument; units: Units; setUnits: (u: Units) => void; readOnly: boolean; update: (fn: (d: SystemDocument) => SystemDocument) => void; mlpOutside: boolean }) {
  const [template, setTemplate] = useState<LayoutName>(doc.layout);
  const [radiusM, setRadiusM] = useState(2.5);
  const [keep, setKeep] = useState(true);
  const [message, setMessage] = useState<string | null>(null);
  const preview = applyLayoutToDocument(doc, template, { radiusM, keepExisting: keep });
  const apply = () => {
    update((d) => applyLayoutToDocument(d, template, { radiusM, keepExisting: keep }).doc);
    const parts = changeParts(preview, ['added', 'moved', 'removed']);
    setMessage(`${template} applied${parts.length ? `: ${parts.join('; ')}` : ' (no speaker changed)'}.`);
  };
  return (
    <section aria-labelledby="layout-template" className="flex flex-col gap-3">
      <h3 id="layout-template" className="text-base font-semibold">
        Template and listening position
      </h3>
      <div className="flex flex-wrap items-end gap-4">
        <label className="flex flex-col gap-1 text-xs font-medium text-ink-soft">
          Layout template
          <select data-testid="layout-template" value={template} disabled={readOnly} onChange={(e) => setTemplate(e.target.value as LayoutName)} className="rounded-md border border-line bg-white px-2 py-1.5 text-sm text-ink">
            {LAYOUT_NAMES.map((n) => (
              <option key={n} value={n}>
                {n}
              </option>
            ))}
          </select>
        </label>
        <NumberField label="Place at distance from MLP" value={radiusM} onChange={setRadiusM} length units={units} unit="m" min={0.5} max={20} step={0.1} className="w-44" disabled={readOnly} />
        <label className="inline-flex items-center gap-1.5 pb-2 text-sm">
          <input type="checkbox" checked={keep} onChange={(e) => setKeep(e.target.checked)} className="accent-mains" disabled={readOnly} />
          Keep speakers already placed
        </label>
        <Button variant="secondary" onClick={apply} disabled={readOnly || mlpOutside} data-testid="apply-template">
          {template === doc.layout ? `Re-apply ${template}` : `Apply ${template}`}
        </Button>
        <label className="flex flex-col gap-1 text-xs font-medium text-ink-soft">
          Main listening position (MLP)
          <select data-testid="mlp-select" value={doc.mlpSeatId} disabled={readOnly} onChange={(e) => update((d) => ({ ...d, mlpSeatId: e.target.value }))} className="rounded-md border border-line bg-white px-2 py-1.5 text-sm text-ink">
            {doc.seats.map((s) => (
              <option key={s.id} value={s.id}>
                {s.name}
              </option>
            ))}
          </select>
        </label>
        <div role="group" aria-label="Units" className="flex overflow-hidden rounded-md border border-line">
          {(['metric', 'imperial'] as const).map((u) => (
            <button key={u} type="button" aria-pressed={units === u} onClick={() => setUnits(u)} className={`px-3 py-1.5 text-sm ${units === u ? 'bg-ink text-white' : 'bg-white text-ink hover:bg-wash'}`}>
              {u === 'metric' ? 'Metres' : 'Feet / inches'}
            </button>
          ))}
        </div>
      </div>
      <p className="text-xs text-ink-soft">
        {template !== doc.layout || preview.added.length || preview.removed.length || preview.moved.length
          ? `Applying ${template} will ${changeParts(preview, ['add', 'move', 'remove']).join('; ') || 'only change the template'}; new speakers go to the template’s nominal angles at ${formatLength(radiusM, units)} from the MLP, pulled inside the walls. Subs stay as they are.`
          : `The System matches ${template}.`}
      </p>
      {mlpOutside ? <p className="text-xs text-fail">The MLP is outside the room: speakers are placed around it, so move it inside (or make the room larger) before applying a template.</p> : null}
      {message ? (
        <p role="status" className="text-xs text-ok">
          {message}
        </p>
      ) : null}
    </section>
  );
}
