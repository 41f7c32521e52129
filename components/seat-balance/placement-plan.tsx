'use client';

import { chartColors, useContainerWidth } from '@/components/charts';
import type { SeatBalanceAnswer } from '@/lib/system-model/seat-balance';

type Placements = NonNullable<SeatBalanceAnswer['placements']>;

interface PlacementPlanProps {
  room: { widthM: number; lengthM: number };
  seats: readonly { name: string; xM: number; yM: number }[];
  subs: readonly { name: string; xM: number; yM: number }[];
  placements: Placements;
  /** How many of the best combinations to number on the plan. */
  shown: number;
}

/**
 * The room from above (front wall at the top): the seats, the subs where they stand now, every candidate spot, and the
 * spots the best few combinations use, labelled with their ranks.
 */
export function PlacementPlan({ room, seats, subs, placements, shown }: PlacementPlanProps) {
  const { ref, widthPx } = useContainerWidth<HTMLDivElement>(360);
  const pad = 26;
  const pxPerM = Math.max(20, Math.min((Math.min(widthPx, 420) - 2 * pad) / room.widthM, 300 / room.lengthM));
  const w = room.widthM * pxPerM + 2 * pad;
  const h = room.lengthM * pxPerM + 2 * pad;
  const sx = (x: number) => pad + x * pxPerM;
  const sy = (y: number) => pad + y * pxPerM;
  const best = placements.ranked.slice(0, shown);
  const ranksAt = (name: string) => best.flatMap((r, i) => (r.subs.some((s) => s.candidate === name) ? [i + 1] : []));
  return (
    <div ref={ref} className="w-full" data-testid="sb-placement-plan">
      <svg width={w} height={h} viewBox={`0 0 ${w} ${h}`} role="img" aria-labelledby="sb-plan-title" className="max-w-full" style={{ fontFamily: 'var(--font-sans, system-ui, sans-serif)', fontSize: 11 }}>
        <title id="sb-plan-title">{`Floor plan: ${seats.length} seats, ${placements.candidates.length} candidate sub spots; the spots of the best ${best.length} combinations are numbered by rank.`}</title>
        <rect x={sx(0)} y={sy(0)} width={room.widthM * pxPerM} height={room.lengthM * pxPerM} fill={chartColors.surface} stroke={chartColors.ink} strokeWidth={1.5} />
        <text x={sx(room.widthM / 2)} y={sy(0) - 8} textAnchor="middle" fill={chartColors.inkMuted}>
          Front wall
        </text>
        {seats.map((s) => (
          <circle key={`seat-${s.name}`} cx={sx(s.xM)} cy={sy(s.yM)} r={5} fill={chartColors.ink}>
            <title>{s.name}</title>
          </circle>
        ))}
        {subs.map((s) => (
          <rect key={`sub-${s.name}`} x={sx(s.xM) - 5} y={sy(s.yM) - 5} width={10} height={10} fill="none" stroke={chartColors.sub} strokeWidth={2} strokeDasharray="2 2">
            <title>{`${s.name} (now)`}</title>
          </rect>
        ))}
        {placements.candidates.map((c) => {
          const ranks = ranksAt(c.name);
          const x = sx(c.xM);
          const y = sy(c.yM);
          // Labels sit toward the room's middle so they stay inside the plan.
          const dx = c.xM < room.widthM / 2 ? 10 : -10;
          const dy = c.yM < room.lengthM / 2 ? 16 : -10;
          return (
            <g key={c.name}>
              <rect x={x - 4} y={y - 4} width={8} height={8} fill={ranks.length ? chartColors.sub : chartColors.surface} stroke={ranks.length ? chartColors.sub : chartColors.target} strokeWidth={1.5}>
                <title>{`${c.name}${ranks.length ? `: in combination ${ranks.join(', ')}` : ''}`}</title>
              </rect>
              {ranks.length ? (
                <text x={x + dx} y={y + dy} textAnchor={dx > 0 ? 'start' : 'end'} fill={chartColors.ink} fontWeight={600} style={{ fontFamily: 'var(--font-mono, monospace)' }}>
                  {ranks.join(',')}
                </text>
              ) : null}
            </g>
          );
        })}
      </svg>
      <p className="mt-1 text-xs text-ink-soft">Dots: seats. Squares: candidate spots (filled: used by a numbered combination). Dashed: the subs where they stand now.</p>
    </div>
  );
}
