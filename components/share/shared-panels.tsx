'use client';

import { useMemo, useState } from 'react';
import { BlendPanel } from '@/components/blend/blend-panel';
import { SystemContext, type SystemEditorValue, type UnitSystem } from '@/components/system/system-context';
import { ModesPanel } from '@/components/modes/modes-panel';
import { TimingPanel } from '@/components/timing/timing-panel';
import type { SystemDocument } from '@/lib/validations/system';

const noChange = () => {};

const SHARED = [
  { id: 'blend', title: 'Blend', Panel: BlendPanel },
  { id: 'timing', title: 'Timing', Panel: TimingPanel },
  { id: 'modes', title: 'Modes', Panel: ModesPanel },
] as const;

/** The editor's Blend, Timing and Modes panels over a shared System, read-only. */
export function SharedPanels({ document }: { document: SystemDocument }) {
  const [units, setUnits] = useState<UnitSystem>('metric');
  const value = useMemo<SystemEditorValue>(() => ({ doc: document, update: noChange, units, setUnits, readOnly: true }), [document, units]);
  return (
    <SystemContext.Provider value={value}>
      <div className="flex flex-col gap-6">
        <div className="flex items-center gap-2 text-sm">
          <span className="text-ink-soft">Units</span>
          <div role="group" aria-label="Units" className="inline-flex overflow-hidden rounded-md border border-line bg-white">
            {(['metric', 'imperial'] as const).map((u) => (
              <button key={u} type="button" aria-pressed={units === u} onClick={() => setUnits(u)} className={`px-2.5 py-1 ${units === u ? 'bg-ink text-white' : 'hover:bg-wash'}`}>
                {u === 'metric' ? 'Metres' : 'Feet'}
              </button>
            ))}
          </div>
        </div>
        {SHARED.map(({ id, title, Panel }) => (
          <section key={id} aria-labelledby={`shared-${id}`} className="min-w-0 overflow-x-auto rounded-lg border border-line bg-white p-4" data-testid={`shared-${id}`}>
            <h2 id={`shared-${id}`} className="mb-3 text-lg font-semibold">
              {title}
            </h2>
            <Panel />
          </section>
        ))}
      </div>
    </SystemContext.Provider>
  );
}
