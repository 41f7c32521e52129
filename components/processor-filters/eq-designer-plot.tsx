'use client';

import { useRef } from 'react';
import { ChartExportButtons, FrequencyPlot, overlayColors, traceStyles, type FrequencyMarker } from '@/components/charts';
import type { EqDesignAnswer } from '@/lib/system-model/eq-design';

/** The EQ's own curve: a blue apart from the subs' amber, the target's slate and the corrected curve's ink. */
const EQ_STYLE = { color: overlayColors[2], width: 1.5 } as const;

/**
 * The design on one plot (log frequency): the curve the designer worked on (subs amber), the target (dashed slate), the
 * EQ (its own gain, 0 dB = no change) and the corrected curve (ink, thick); curves relative to the target's level. The
 * band's edges are marked, and each null left alone.
 */
export function EqDesignerPlot({ answer }: { answer: EqDesignAnswer }) {
  const ref = useRef<SVGSVGElement>(null);
  const f = answer.frequencyHz;
  const markers: FrequencyMarker[] = [
    { hz: answer.band.startHz, label: `Band from ${answer.band.startHz} Hz`, dashed: true },
    { hz: answer.band.stopHz, label: `Band to ${answer.band.stopHz} Hz`, dashed: true },
    // Unlabelled (nulls often sit close together): the note under the plot and the list above name them.
    ...answer.nulls.map((n) => ({ hz: n.frequencyHz, color: traceStyles.sub.color, dashed: true })),
  ];
  const values = [...answer.inputDb, ...answer.correctedDb, ...answer.targetDb, ...answer.eqDb].filter(Number.isFinite);
  const lo = Math.max(-40, Math.floor(Math.min(...values) / 5) * 5);
  const hi = Math.min(30, Math.ceil(Math.max(...values) / 5) * 5);
  return (
    <div className="flex min-w-0 flex-col gap-2">
      <FrequencyPlot
        ref={ref}
        title="EQ design: the input, the target, the EQ and the corrected curve"
        description={`Level of the subs ${answer.input}, relative to the target's level; the target; the designed EQ's gain; and the input with the EQ. The band is ${answer.band.startHz}–${answer.band.stopHz} Hz${answer.nulls.length ? `; nulls left alone at ${answer.nulls.map((n) => `${n.frequencyHz} Hz`).join(', ')}` : ''}.`}
        quantity="magnitude"
        frequencyHz={f}
        minHz={f[0] ?? 15}
        maxHz={f[f.length - 1] ?? 200}
        yDomain={[lo, Math.max(hi, lo + 10)]}
        traces={[
          { id: 'input', label: 'Input', values: answer.inputDb, ...traceStyles.sub },
          { id: 'target', label: 'Target', values: answer.targetDb, ...traceStyles.target },
          { id: 'eq', label: 'EQ', values: answer.eqDb, ...EQ_STYLE },
          { id: 'corrected', label: 'Corrected', values: answer.correctedDb, ...traceStyles.sum },
        ]}
        markers={markers}
        aspect={0.5}
        yAxisChars={4}
      />
      {answer.nulls.length ? <p className="text-xs text-ink-soft">Dashed amber lines: the nulls left alone (listed above).</p> : null}
      <ChartExportButtons
        svgRef={ref}
        filename="eq-design"
        subject="EQ design plot"
        csv={{
          frequencyHz: f,
          columns: [
            { name: 'input_db', values: answer.inputDb },
            { name: 'target_db', values: answer.targetDb },
            { name: 'eq_db', values: answer.eqDb },
            { name: 'corrected_db', values: answer.correctedDb },
          ],
        }}
      />
    </div>
  );
}
