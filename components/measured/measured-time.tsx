'use client';

import { useMemo } from 'react';
import { TimeViewPlot } from '@/components/time/time-view-plot';
import type { PredictAnswer } from '@/lib/system-model/measured';
import { measuredTimeView } from '@/lib/system-model/time-view';

/**
 * The predicted blend at the seat in time: the impulse and step of each measured path with the System's filters,
 * processor EQ, gains, delays and polarity applied, and of their sum — from the complex responses the prediction
 * computed (POST /api/v1/measured/predict), so a trainer can show the sub's late arrival as well as its phase.
 */
export function MeasuredTime({ prediction }: { prediction: PredictAnswer }) {
  const view = useMemo(() => {
    const f = prediction.frequencyHz;
    // A path whose file had no phase has only an estimate: its arrival is unknown, and the view says so.
    const curves = [
      ...prediction.paths.map((p, k) => ({ name: `${p.name}, as the System plays it`, role: k === 0 ? 'mains' : 'sub', frequencyHz: f, magnitudeDb: p.magnitudeDb, phaseDeg: p.phaseEstimated ? null : p.phaseDeg, arrivalMs: null })),
      { name: 'Predicted sum', role: 'measured', frequencyHz: f, magnitudeDb: prediction.predictedSum.magnitudeDb, phaseDeg: prediction.phaseEstimated ? null : prediction.predictedSum.phaseDeg, arrivalMs: null },
    ];
    try {
      return measuredTimeView(curves);
    } catch (error) {
      if (error instanceof RangeError) return null;
      throw error;
    }
  }, [prediction]);
  if (!view) return null;
  return (
    <section className="flex flex-col gap-2 rounded-lg border border-line bg-white p-4" data-testid="measured-time">
      <h3 className="text-base font-semibold">The predicted blend in time (measured)</h3>
      <p className="text-xs text-ink-soft">
        Each measured path with this System&apos;s settings applied, and their sum, as impulse and step responses; each trace scaled to its own peak. {view.originText}
      </p>
      <TimeViewPlot view={view} title="Measured paths and their predicted sum" testId="measured-time-plot" />
      <ul className="list-disc pl-5 text-xs text-ink-soft">
        {view.sentences.map((s) => (
          <li key={s}>{s}</li>
        ))}
      </ul>
    </section>
  );
}
