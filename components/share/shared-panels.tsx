'use client';

import { useEffect, useMemo, useRef, useState } from 'react';
import { BlendPanel } from '@/components/blend/blend-panel';
import { HeadroomPanel } from '@/components/headroom/headroom-panel';
import { LayoutPanel } from '@/components/layout/layout-panel';
import { MeasuredPanel } from '@/components/measured/measured-panel';
import { ModesPanel } from '@/components/modes/modes-panel';
import { SystemContext, type SystemEditorValue, type UnitSystem } from '@/components/system/system-context';
import { TimingPanel } from '@/components/timing/timing-panel';
import type { SharedMeasurement } from '@/lib/data/measurements';
import type { SystemDocument } from '@/lib/validations/system';
import { markReadOnly, READ_ONLY_LOOK } from './read-only-look';

const noChange = () => {};

interface Props {
  document: SystemDocument;
  /** The System's own measurements, given through the share link (read-only). */
  measurements: { items: SharedMeasurement[]; omitted: number };
}

/** Every panel of the editor (Blend, Timing, Modes, Layout, Headroom, Measured) over a shared System, read-only and looking it. */
export function SharedPanels({ document, measurements }: Props) {
  const [units, setUnits] = useState<UnitSystem>('metric');
  const value = useMemo<SystemEditorValue>(() => ({ doc: document, update: noChange, units, setUnits, readOnly: true }), [document, units]);
  const panels = [
    { id: 'blend', title: 'Blend', body: <BlendPanel /> },
    { id: 'timing', title: 'Timing', body: <TimingPanel /> },
    { id: 'modes', title: 'Modes', body: <ModesPanel /> },
    { id: 'layout', title: 'Layout', body: <LayoutPanel /> },
    { id: 'headroom', title: 'Headroom', body: <HeadroomPanel /> },
    { id: 'measured', title: 'Measured', body: <MeasuredPanel shared={measurements} /> },
  ];
  const rootRef = useRef<HTMLDivElement>(null);
  // Disabled settings read as values (READ_ONLY_LOOK) and are announced as read-only; panels render late, so keep marking.
  useEffect(() => {
    const root = rootRef.current;
    if (!root) return;
    markReadOnly(root);
    const observer = new MutationObserver(() => markReadOnly(root));
    observer.observe(root, { subtree: true, childList: true, attributes: true, attributeFilter: ['disabled'] });
    return () => observer.disconnect();
  }, []);
  return (
    <SystemContext.Provider value={value}>
      <div ref={rootRef} className={`flex flex-col gap-6 ${READ_ONLY_LOOK}`}>
        <div className="flex flex-wrap items-center gap-2 text-sm">
          <span className="text-ink-soft">Units</span>
          <div role="group" aria-label="Units" className="inline-flex overflow-hidden rounded-md border border-line bg-white">
            {(['metric', 'imperial'] as const).map((u) => (
              <button key={u} type="button" aria-pressed={units === u} onClick={() => setUnits(u)} className={`px-2.5 py-1 ${units === u ? 'bg-ink text-white' : 'hover:bg-wash'}`}>
                {u === 'metric' ? 'Metres' : 'Feet'}
              </button>
            ))}
          </div>
          <span className="text-xs text-ink-faint">Settings are shown as values; plots, legends and read-outs work as in the editor.</span>
        </div>
        <nav aria-label="Panels on this page" className="flex flex-wrap gap-x-3 gap-y-1 text-sm">
          {panels.map(({ id, title }) => (
            <a key={id} href={`#shared-${id}`} className="text-mains underline">
              {title}
            </a>
          ))}
        </nav>
        {panels.map(({ id, title, body }) => (
          <section key={id} aria-labelledby={`shared-${id}`} className="min-w-0 relative overflow-x-auto rounded-lg border border-line bg-white p-4" data-testid={`shared-${id}`}>
            <h2 id={`shared-${id}`} className="mb-3 scroll-mt-4 text-lg font-semibold">
              {title}
            </h2>
            {body}
          </section>
        ))}
      </div>
    </SystemContext.Provider>
  );
}
