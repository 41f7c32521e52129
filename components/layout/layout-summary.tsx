import type { UnitSystem } from '@/components/system/system-context';
import type { LayoutAnswer } from '@/lib/hooks/use-layout';
import { formatLength } from '@/lib/units';
import { LayoutBadge } from './layout-badge';

type Units = UnitSystem;

/** The front pair's included angle, the angle checks, the farthest source and the template at a glance. */
export function LayoutSummary({ data, units }: { data: LayoutAnswer; units: Units }) {
  const fp = data.frontPair;
  const warns = data.speakers.filter((s) => s.status === 'warn').length;
  return (
    <section aria-label="Layout summary" className="grid grid-cols-2 gap-3 md:grid-cols-4">
      <div className="rounded-md border border-line bg-white px-3 py-2">
        <p className="text-xs text-ink-soft">Front pair included angle</p>
        <p className="num text-lg font-semibold" data-testid="included-angle">
          {fp ? `${fp.includedAngleDeg.toFixed(1)}°` : '—'} {fp ? <LayoutBadge status={fp.status} /> : null}
        </p>
        <p className="text-xs text-ink-soft">{fp ? `recommended ${fp.recommended.min}°–${fp.recommended.max}° (equilateral triangle: 60°)` : 'needs L and R'}</p>
      </div>
      <div className="rounded-md border border-line bg-white px-3 py-2">
        <p className="text-xs text-ink-soft">Angle checks</p>
        <p className="num text-lg font-semibold">
          {data.speakers.length - warns} pass · {warns} warn
        </p>
        <p className="text-xs text-ink-soft">{data.missingChannels.length ? `missing for ${data.template.id}: ${data.missingChannels.join(', ')}` : `every ${data.template.id} channel present`}</p>
      </div>
      <div className="rounded-md border border-line bg-white px-3 py-2">
        <p className="text-xs text-ink-soft">Farthest from the MLP</p>
        <p className="num text-lg font-semibold">{formatLength(data.farthest.distanceM, units)}</p>
        <p className="text-xs text-ink-soft">{data.farthest.name} (the others are aligned to its arrival)</p>
      </div>
      <div className="rounded-md border border-line bg-white px-3 py-2">
        <p className="text-xs text-ink-soft">Template</p>
        <p className="num text-lg font-semibold">{data.template.id}</p>
        <p className="text-xs text-ink-soft">
          {data.template.channels.length} speakers{data.template.subwooferCount ? ' + LFE' : ''}
        </p>
      </div>
    </section>
  );
}
