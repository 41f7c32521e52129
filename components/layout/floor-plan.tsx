'use client';

import { useId, type Ref } from 'react';
import { arc } from 'd3-shape';
import { chartColors, useContainerWidth } from '@/components/charts';
import type { LayoutAnswer } from '@/lib/hooks/use-layout';
import type { OutsidePosition } from '@/lib/system-model/room-bounds';
import { formatLength } from '@/lib/units';
import type { SystemDocument } from '@/lib/validations/system';

const STATUS = { pass: chartColors.mains, warn: chartColors.warn, unlisted: chartColors.target } as const;
const DEG = Math.PI / 180;

export interface FloorPlanProps {
  doc: SystemDocument;
  layout: LayoutAnswer | undefined;
  /** Highlighted item, e.g. "speaker:l", "sub:sub1", "seat:mlp". */
  selected: string | null;
  onSelect: (key: string) => void;
  units: 'metric' | 'imperial';
  /** Positions beyond a wall (positionsOutsideRoom): drawn on the wall they crossed, in red, with the message. */
  outside?: readonly OutsidePosition[];
  ref?: Ref<SVGSVGElement>;
}

/**
 * The room from above, front wall at the top: seats (MLP ringed), speakers coloured by pass/warn, subs, a line from the
 * MLP to each speaker, each template channel's recommended azimuth range as a faint wedge, and the front pair's
 * included angle as an arc.
 */
export function FloorPlan({ doc, layout, selected, onSelect, units, outside = [], ref }: FloorPlanProps) {
  const uid = `fp${useId().replace(/[^a-zA-Z0-9_-]/g, '')}`;
  const { ref: boxRef, widthPx } = useContainerWidth<HTMLDivElement>(640);
  const { widthM, lengthM } = doc.room;
  const pad = { top: 28, right: 16, bottom: 28, left: 16 };
  const maxH = 620;
  const pxPerM = Math.max(10, Math.min((widthPx - pad.left - pad.right) / widthM, (maxH - pad.top - pad.bottom) / lengthM));
  const planW = widthM * pxPerM;
  const planH = lengthM * pxPerM;
  const svgW = Math.max(widthPx, planW + pad.left + pad.right);
  const svgH = planH + pad.top + pad.bottom;
  const ox = (svgW - planW) / 2;
  // Drawing only: a position beyond a wall is shown on that wall (the document keeps the real value).
  const sx = (x: number) => ox + Math.min(Math.max(x, 0), widthM) * pxPerM;
  const sy = (y: number) => pad.top + Math.min(Math.max(y, 0), lengthM) * pxPerM;
  const problems = (prefix: string) => outside.filter((o) => o.path.startsWith(`${prefix}.`));
  const outsideMark = (prefix: string, r: number) => {
    const list = problems(prefix);
    return list.length ? (
      <>
        <circle r={r} fill="none" stroke={chartColors.fail} strokeWidth={2} strokeDasharray="3 2" data-outside="true" />
        <title>{list.map((o) => o.message).join('; ')}</title>
      </>
    ) : null;
  };
  const mlpIndex = doc.seats.findIndex((s) => s.id === doc.mlpSeatId);
  const mlp = doc.seats.find((s) => s.id === doc.mlpSeatId) ?? doc.seats[0];
  const status = new Map((layout?.speakers ?? []).map((s) => [s.channel, s]));
  const wedgeR = Math.min(planW, planH) * 0.28;
  const wedge = arc<{ a0: number; a1: number; r0: number; r1: number }>()
    .innerRadius((d) => d.r0)
    .outerRadius((d) => d.r1)
    .startAngle((d) => d.a0)
    .endAngle((d) => d.a1);
  // d3 arc angles run clockwise from 12 o'clock (toward the front wall); azimuth runs counter-clockwise (positive left).
  const toArc = (azimuthDeg: number) => -azimuthDeg * DEG;
  const left = doc.speakers.find((s) => s.channel === 'L');
  const right = doc.speakers.find((s) => s.channel === 'R');
  const lAz = status.get('L')?.azimuthDeg;
  const rAz = status.get('R')?.azimuthDeg;
  const font = 11;
  return (
    <div ref={boxRef} className="w-full relative overflow-x-auto" data-testid="floor-plan">
      <svg ref={ref} xmlns="http://www.w3.org/2000/svg" width={svgW} height={svgH} viewBox={`0 0 ${svgW} ${svgH}`} role="img" aria-labelledby={`${uid}-t`} aria-describedby={`${uid}-d`} style={{ fontFamily: 'var(--font-sans, system-ui, sans-serif)', fontSize: font }}>
        <title id={`${uid}-t`}>Floor plan of the room with seats, speakers and subs</title>
        <desc id={`${uid}-d`}>
          {`Room ${widthM} m wide and ${lengthM} m long, front wall at the top. ${doc.speakers.length} speakers, ${doc.subs.length} subs, ${doc.seats.length} seats. Speakers within their recommended range are teal, outside it amber. Faint wedges show each channel's recommended azimuth range from the MLP.`}
        </desc>
        <rect x={sx(0)} y={sy(0)} width={planW} height={planH} fill={chartColors.surface} stroke={chartColors.ink} strokeWidth={1.5} />
        <text x={sx(widthM / 2)} y={sy(0) - 8} textAnchor="middle" fill={chartColors.inkMuted}>
          Front wall
        </text>
        {mlp ? (
          <g transform={`translate(${sx(mlp.xM)},${sy(mlp.yM)})`} data-part="recommended">
            {(layout?.template.channels ?? []).map((c) => {
              const sign = c.side === 'right' ? -1 : 1;
              const a = [toArc(sign * c.azimuthDeg.min), toArc(sign * c.azimuthDeg.max)].sort((p, q) => p - q) as [number, number];
              const width = Math.max(a[1] - a[0], 1.5 * DEG);
              const mid = (a[0] + a[1]) / 2;
              return <path key={c.label} d={wedge({ a0: mid - width / 2, a1: mid + width / 2, r0: 0, r1: wedgeR }) ?? ''} fill={chartColors.mains} fillOpacity={0.07} stroke={chartColors.mains} strokeOpacity={0.25} strokeWidth={0.75} />;
            })}
            {left && right && lAz !== undefined && rAz !== undefined ? (
              <>
                <path d={wedge({ a0: toArc(lAz), a1: toArc(rAz), r0: wedgeR * 0.55, r1: wedgeR * 0.55 + 2 }) ?? ''} fill={chartColors.ink} />
                <text x={0} y={-wedgeR * 0.55 - 6} textAnchor="middle" fill={chartColors.ink} style={{ fontFamily: 'var(--font-mono, monospace)' }}>
                  {layout?.frontPair ? `${layout.frontPair.includedAngleDeg.toFixed(1)}°` : ''}
                </text>
              </>
            ) : null}
          </g>
        ) : null}
        {mlp && !problems(`seats.${Math.max(0, mlpIndex)}`).length
          ? doc.speakers.map((s, i) => problems(`speakers.${i}`).length ? null : (
              <line key={`ray-${s.id}`} x1={sx(mlp.xM)} y1={sy(mlp.yM)} x2={sx(s.xM)} y2={sy(s.yM)} stroke={STATUS[status.get(s.channel)?.status ?? 'unlisted']} strokeOpacity={0.45} strokeWidth={1} strokeDasharray="3 3" />
            ))
          : null}
        {doc.seats.map((s, i) => {
          const isMlp = s.id === doc.mlpSeatId;
          const key = `seat:${s.id}`;
          return (
            <g key={key} transform={`translate(${sx(s.xM)},${sy(s.yM)})`} onClick={() => onSelect(key)} style={{ cursor: 'pointer' }} data-seat={s.id}>
              {isMlp ? <circle r={10} fill="none" stroke={chartColors.ink} strokeWidth={1.5} /> : null}
              <circle r={6} fill={selected === key ? chartColors.mains : problems(`seats.${i}`).length ? chartColors.fail : chartColors.ink} />
              {outsideMark(`seats.${i}`, 14)}
              {isMlp ? (
                <text y={22} textAnchor="middle" fill={chartColors.ink} fontWeight={600}>
                  MLP
                </text>
              ) : null}
            </g>
          );
        })}
        {doc.subs.map((s, i) => {
          const key = `sub:${s.id}`;
          const size = 16;
          return (
            <g key={key} transform={`translate(${sx(s.xM)},${sy(s.yM)})`} onClick={() => onSelect(key)} style={{ cursor: 'pointer' }}>
              <rect x={-size / 2} y={-size / 2} width={size} height={size} rx={3} fill={problems(`subs.${i}`).length ? chartColors.fail : chartColors.sub} stroke={selected === key ? chartColors.ink : 'none'} strokeWidth={2} />
              {outsideMark(`subs.${i}`, 14)}
              <text y={4} textAnchor="middle" fill={chartColors.surface} fontSize={9} fontWeight={700}>
                {doc.subs.length > 1 ? `S${i + 1}` : 'S'}
              </text>
            </g>
          );
        })}
        {doc.speakers.map((s, i) => {
          const key = `speaker:${s.id}`;
          const st = status.get(s.channel);
          const color = problems(`speakers.${i}`).length ? chartColors.fail : STATUS[st?.status ?? 'unlisted'];
          const isHeight = s.channel.startsWith('T');
          const w = Math.max(22, s.channel.length * 7 + 8);
          return (
            <g key={key} transform={`translate(${sx(s.xM)},${sy(s.yM)})`} onClick={() => onSelect(key)} style={{ cursor: 'pointer' }} data-speaker={s.channel}>
              <rect x={-w / 2} y={-9} width={w} height={18} rx={isHeight ? 9 : 2} fill={isHeight ? chartColors.surface : color} stroke={selected === key ? chartColors.ink : color} strokeWidth={selected === key ? 2.5 : 1.5} strokeDasharray={isHeight ? '3 2' : undefined} />
              <text y={4} textAnchor="middle" fill={isHeight ? color : chartColors.surface} fontWeight={700} fontSize={10}>
                {s.channel}
              </text>
              {outsideMark(`speakers.${i}`, w / 2 + 6)}
            </g>
          );
        })}
        <g transform={`translate(${sx(0)},${svgH - 8})`} fill={chartColors.inkMuted}>
          <text>{`${formatLength(widthM, units)} × ${formatLength(lengthM, units)} · rounded dashed = height speaker`}</text>
        </g>
      </svg>
    </div>
  );
}
