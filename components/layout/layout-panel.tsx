'use client';

import { useRef, useState } from 'react';
import { ChartExportButtons } from '@/components/charts';
import { OutsideRoomNotice } from '@/components/system/outside-room-notice';
import { useSystem } from '@/components/system/system-context';
import { Notice } from '@/components/ui/notice';
import { useLayout } from '@/lib/hooks/use-layout';
import { AngleTable } from './angle-table';
import { FloorPlan } from './floor-plan';
import { ItemEditor } from './item-editor';
import { LayoutSummary } from './layout-summary';
import { PairEntry } from './pair-entry';
import { PositionTable } from './position-table';
import { TemplateBar } from './template-bar';

/** Layout: floor plan, template, angles from the MLP with pass/warn, toe-in, distances, delays and trims. */
export function LayoutPanel() {
  const { doc, update, units, setUnits, readOnly } = useSystem();
  // While anything is outside the room, no angle, distance or delay is shown (useLayout asks for none).
  const { data, error, pending, outside } = useLayout(doc);
  const [selected, setSelected] = useState<string | null>(() => (doc.speakers[0] ? `speaker:${doc.speakers[0].id}` : null));
  const planRef = useRef<SVGSVGElement>(null);
  const mlpOutside = outside.some((o) => o.path.startsWith(`seats.${doc.seats.findIndex((s) => s.id === doc.mlpSeatId)}.`));
  return (
    <div className="flex flex-col gap-6" data-testid="layout-panel">
      <TemplateBar doc={doc} units={units} setUnits={setUnits} readOnly={readOnly} update={update} mlpOutside={mlpOutside} />
      <PairEntry mlpOutside={mlpOutside} />
      {error ? <Notice kind="error">{error.message}</Notice> : null}
      <OutsideRoomNotice outside={outside} title="Outside the room: no angles, distances or delays until it is fixed">
        <p className="mt-1">Move each one inside (Edit, below), or make the room larger on Modes. Changing the room never moves anything.</p>
      </OutsideRoomNotice>
      {doc.speakers.length === 0 ? <Notice>No speakers yet: choose a template and apply it to place them.</Notice> : null}
      {data ? <LayoutSummary data={data} units={units} /> : null}
      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_22rem]">
        <section aria-labelledby="layout-plan" className="flex min-w-0 flex-col gap-2" aria-busy={pending}>
          <div className="flex flex-wrap items-center justify-between gap-2">
            <h3 id="layout-plan" className="text-base font-semibold">
              Floor plan
            </h3>
            <ChartExportButtons svgRef={planRef} filename="layout-floor-plan" subject="floor plan" />
          </div>
          <FloorPlan ref={planRef} doc={doc} layout={data} selected={selected} onSelect={setSelected} units={units} outside={outside} />
          <p className="text-xs text-ink-soft">Click a speaker, sub or seat to edit it. Faint wedges: each channel’s recommended azimuth range from the MLP; the black arc is the front pair’s included angle.</p>
        </section>
        <ItemEditor selected={selected} onSelect={setSelected} outside={outside} />
      </div>
      {outside.length ? <PositionTable outside={outside} units={units} selected={selected} onSelect={setSelected} /> : null}
      {data ? <AngleTable data={data} units={units} selected={selected} onSelect={setSelected} /> : null}
      {data ? (
        <ul className="list-disc pl-5 text-xs text-ink-soft">
          <li>Toe-in is the turn from square to the speaker’s own wall (front channels: the front wall; side surrounds: the side wall; back surrounds: the back wall) to point at its aim; hover a figure for the direction and tilt.</li>
          <li>Ranges: ITU-R BS.775-3 for 5.1 (front pair ±22°–30° is common home-theater practice); larger layouts after ITU-R BS.2051-3, from memory (hover a Recommended cell for its source).</li>
          <li>Mounting speakers on walls or ceilings: use hardware rated for the load, fix into structure, and follow local building codes; have a licensed professional do electrical or structural work.</li>
        </ul>
      ) : null}
    </div>
  );
}
