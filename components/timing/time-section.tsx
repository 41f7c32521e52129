'use client';

import { useDeferredValue, useId, useMemo, useState } from 'react';
import { TimeViewPlot } from '@/components/time/time-view-plot';
import type { AdviceAnswer } from '@/lib/system-model/advice-answer';
import { systemModelFromRequest, type SystemRequest } from '@/lib/system-model/system-request';
import { modelWithSettings, timeViewOfModel } from '@/lib/system-model/time-view';
import type { TimingAnswer } from '@/lib/system-model/timing';
import { describeChanges } from './advice-card';

interface Choice {
  id: string;
  label: string;
  advice: AdviceAnswer | null;
}

/** The settings Timing would change to (the all-subs advice first, then each sub's), when it advises a change. */
function choicesOf(data: TimingAnswer | undefined): Choice[] {
  const out: Choice[] = [{ id: 'present', label: 'Present settings', advice: null }];
  if (!data) return out;
  if (data.group && !data.group.keep) out.push({ id: 'group', label: `Recommended: all ${data.subs.length} subs together`, advice: data.group });
  data.subs.forEach((s, k) => {
    if (!s.advice.keep) out.push({ id: `sub-${k}`, label: `Recommended: ${s.name}${data.subs.length > 1 ? ' alone' : ''}`, advice: s.advice });
  });
  return out;
}

/**
 * "In time": the impulse and step response of the main channel, each sub and the sum with the present settings, or with
 * a setting Timing recommends (the present sum drawn dashed beside it), from the very system Timing assessed: the model
 * of its request, with the advice's settings in it. When Timing runs on measurements (curves the server resolves from
 * stored ids) it says so and draws nothing rather than a model that is not what Timing assessed.
 */
export function TimeSection({ request, data }: { request: SystemRequest | null; data: TimingAnswer | undefined }) {
  const id = useId();
  const [chosen, setChosen] = useState('present');
  // Typing in a field stays quick: the time view follows a moment later.
  const deferredRequest = useDeferredValue(request);
  // A request on measurements names its curves (stored ids the server resolves), which the browser does not hold.
  const onMeasurements = Boolean(request && ('measured' in request.mains || request.subs.some((s) => 'measured' in s)));
  const model = useMemo(() => (deferredRequest && !onMeasurements ? systemModelFromRequest(deferredRequest) : null), [deferredRequest, onMeasurements]);
  const choices = useMemo(() => choicesOf(data), [data]);
  const choice = choices.find((c) => c.id === chosen) ?? choices[0]!;
  const advice = choice.advice;
  const present = useMemo(() => (model ? timeViewOfModel(model) : null), [model]);
  const advised = useMemo(() => {
    const a = choices.find((c) => c.id === chosen)?.advice;
    return a && model ? timeViewOfModel(modelWithSettings(model, a.set)) : null;
  }, [model, choices, chosen]);
  const presentSum = present?.traces.find((t) => t.role === 'sum');
  const compare = useMemo(() => (advised && presentSum ? { label: 'Sum with the present settings', impulsePerS: presentSum.impulsePerS, step: presentSum.step } : null), [advised, presentSum]);
  if (onMeasurements) {
    return (
      <p className="border-t border-line pt-4 text-sm text-ink-soft" data-testid="timing-in-time-measured">
        In time (impulse and step response): shown for the model only for now — run Timing on the model to see it.
      </p>
    );
  }
  if (!present) return null;
  const view = advised ?? present;

  return (
    <section aria-labelledby={`${id}-title`} className="flex flex-col gap-3 border-t border-line pt-4" data-testid="timing-in-time">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div className="flex flex-col gap-1">
          <h3 id={`${id}-title`} className="text-sm font-semibold">
            In time: impulse and step response
          </h3>
          <p className="text-xs text-ink-soft">The same paths and sum as above, seen in time: a sub that arrives late shows as a later, slower step.</p>
        </div>
        {choices.length > 1 ? (
          <fieldset className="flex min-w-0 flex-col gap-1 text-sm">
            <legend className="mb-1 text-xs font-medium text-ink-soft">Settings shown</legend>
            <div className="flex flex-wrap gap-x-4 gap-y-1">
              {choices.map((c) => (
                <label key={c.id} className="inline-flex items-center gap-1.5">
                  <input type="radio" name={`${id}-settings`} value={c.id} checked={choice.id === c.id} onChange={() => setChosen(c.id)} className="accent-mains" data-testid={`timing-time-${c.id}`} /> {c.label}
                </label>
              ))}
            </div>
          </fieldset>
        ) : data ? (
          <p className="text-xs text-ink-soft" data-testid="timing-time-kept">
            Timing recommends keeping the present settings, so they are what is shown.
          </p>
        ) : null}
      </div>
      {advice && data ? (
        <p className="text-sm font-medium" data-testid="timing-time-change">
          {describeChanges(advice, data)} — the dashed grey line is the sum as it is now.
        </p>
      ) : null}
      <TimeViewPlot view={view} title={choice.label} compare={compare} testId="timing-time" />
    </section>
  );
}
