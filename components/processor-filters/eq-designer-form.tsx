'use client';

import { useId } from 'react';
import type { MeasurementScope } from '@/components/seat-balance/measured-pairs';
import { EQ_DESIGNER_FIELDS, type EqDesignerDraft, type EqDesignerField, type EqDesignSource } from './eq-designer-draft';

/** One number field of the draft: the text as typed, its label and unit, and its message when it is wrong. */
function DraftField({ field, draft, onDraft, errors, hint }: { field: EqDesignerField; draft: EqDesignerDraft; onDraft: (d: EqDesignerDraft) => void; errors: Partial<Record<EqDesignerField, string>>; hint?: string }) {
  const id = useId();
  const spec = EQ_DESIGNER_FIELDS[field];
  const error = errors[field];
  return (
    <div className="flex min-w-0 flex-col gap-1">
      <label htmlFor={id} className="text-xs font-medium text-ink-soft">
        {spec.label}
        {spec.unit ? <span className="ml-1 font-normal text-ink-faint">({spec.unit})</span> : null}
      </label>
      <input
        id={id}
        type="text"
        inputMode="decimal"
        autoComplete="off"
        spellCheck={false}
        value={draft[field]}
        title={`${spec.min} to ${spec.max}${spec.unit ? ` ${spec.unit}` : ''}`}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-msg` : hint ? `${id}-hint` : undefined}
        onChange={(e) => onDraft({ ...draft, [field]: e.target.value })}
        data-testid={`eqd-${field}`}
        className={`num w-24 rounded-md border bg-white px-2 py-1.5 text-sm ${error ? 'border-fail' : 'border-line'}`}
      />
      {error ? (
        <p id={`${id}-msg`} role="alert" className="text-xs text-fail">
          {error}
        </p>
      ) : hint ? (
        <p id={`${id}-hint`} className="text-xs text-ink-faint">
          {hint}
        </p>
      ) : null}
    </div>
  );
}

function Choice<T extends string>({ name, value, current, onPick, disabled = false, children, testId }: { name: string; value: T; current: T; onPick: (v: T) => void; disabled?: boolean; children: string; testId: string }) {
  return (
    <label className={`inline-flex items-center gap-1.5 ${disabled ? 'text-ink-faint' : ''}`}>
      <input type="radio" name={name} value={value} checked={current === value} disabled={disabled} onChange={() => onPick(value)} className="accent-mains" data-testid={testId} /> {children}
    </label>
  );
}

interface EqDesignerFormProps {
  draft: EqDesignerDraft;
  onDraft: (d: EqDesignerDraft) => void;
  errors: Partial<Record<EqDesignerField, string>>;
  /** The source used: the model when measurements cannot be used (`measuredUnavailable` says why). */
  source: EqDesignSource;
  measuredUnavailable: string | null;
  scope: MeasurementScope;
  onScope: (s: MeasurementScope) => void;
  mlpName: string;
  seatCount: number;
}

/** The designer's choices: the source, where, the target, the band and the limits. Every number is kept as typed. */
export function EqDesignerForm({ draft, onDraft, errors, source, measuredUnavailable, scope, onScope, mlpName, seatCount }: EqDesignerFormProps) {
  const id = useId();
  const set = (patch: Partial<EqDesignerDraft>) => onDraft({ ...draft, ...patch });
  return (
    <form className="flex min-w-0 flex-col gap-4" aria-label="EQ designer options" onSubmit={(e) => e.preventDefault()}>
      <fieldset className="flex flex-col gap-1 text-sm">
        <legend className="mb-1 text-sm font-medium">Design from</legend>
        <div className="flex flex-wrap gap-x-4 gap-y-1">
          <Choice name={`${id}-source`} value="model" current={source} onPick={(v) => set({ source: v })} testId="eqd-source-model">
            Model (the room model of Modes)
          </Choice>
          <Choice name={`${id}-source`} value="measured" current={source} onPick={(v) => set({ source: v })} disabled={measuredUnavailable !== null} testId="eqd-source-measured">
            Stored measurements
          </Choice>
        </div>
        {measuredUnavailable ? <p className="text-xs text-ink-soft">{measuredUnavailable}</p> : null}
        {source === 'measured' ? (
          <label className="mt-1 flex flex-col gap-1 text-xs font-medium text-ink-soft">
            Files from
            <select value={scope} onChange={(e) => onScope(e.target.value as MeasurementScope)} className="max-w-full rounded-md border border-line bg-white px-2 py-1.5 text-sm text-ink" data-testid="eqd-scope">
              <option value="system">Uploaded for this System</option>
              <option value="workspace">Anywhere in its workspace (this System’s first)</option>
            </select>
          </label>
        ) : null}
      </fieldset>

      <fieldset className="flex flex-col gap-1 text-sm">
        <legend className="mb-1 text-sm font-medium">Where</legend>
        <div className="flex flex-wrap gap-x-4 gap-y-1">
          <Choice name={`${id}-at`} value="mlp" current={draft.at} onPick={(v) => set({ at: v })} testId="eqd-at-mlp">
            {`The main listening position (${mlpName})`}
          </Choice>
          <Choice name={`${id}-at`} value="average" current={draft.at} onPick={(v) => set({ at: v })} disabled={seatCount < 2} testId="eqd-at-average">
            {`The seats’ average (${seatCount} seat${seatCount === 1 ? '' : 's'})`}
          </Choice>
        </div>
      </fieldset>

      <fieldset className="flex flex-col gap-2 text-sm">
        <legend className="mb-1 text-sm font-medium">Target</legend>
        <div className="flex flex-wrap gap-x-4 gap-y-1">
          <Choice name={`${id}-target`} value="flat" current={draft.target} onPick={(v) => set({ target: v })} testId="eqd-target-flat">
            Flat
          </Choice>
          <Choice name={`${id}-target`} value="house" current={draft.target} onPick={(v) => set({ target: v })} testId="eqd-target-house">
            A house curve (more bass below a frequency)
          </Choice>
        </div>
        {draft.target === 'house' ? (
          <div className="flex flex-wrap items-start gap-3">
            <DraftField field="riseDb" draft={draft} onDraft={onDraft} errors={errors} />
            <DraftField field="belowHz" draft={draft} onDraft={onDraft} errors={errors} hint="Half the rise at this frequency, all of it well below." />
          </div>
        ) : null}
      </fieldset>

      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 text-sm font-medium">Band and filters</legend>
        <div className="flex flex-wrap items-start gap-3">
          <DraftField field="startHz" draft={draft} onDraft={onDraft} errors={errors} />
          <DraftField field="stopHz" draft={draft} onDraft={onDraft} errors={errors} />
          <DraftField field="maxFilters" draft={draft} onDraft={onDraft} errors={errors} />
        </div>
        <div className="flex flex-wrap items-start gap-3">
          <DraftField field="maxBoostDb" draft={draft} onDraft={onDraft} errors={errors} />
          <DraftField field="maxCutDb" draft={draft} onDraft={onDraft} errors={errors} />
          <DraftField field="qMin" draft={draft} onDraft={onDraft} errors={errors} />
          <DraftField field="qMax" draft={draft} onDraft={onDraft} errors={errors} />
        </div>
        <p className="text-xs text-warn" data-testid="eqd-boost-caution">
          Cuts come first; a boost is held to the largest boost and never aimed into a deep null. Boosting the sub’s low end costs amplifier and driver headroom: every +3 dB asks twice the
          amplifier power. Check the Headroom tab after EQ.
        </p>
      </fieldset>

      {source === 'model' ? (
        <label className="inline-flex items-start gap-2 text-sm">
          <input type="checkbox" checked={draft.withPresentEq} onChange={(e) => set({ withPresentEq: e.target.checked })} className="mt-0.5 accent-mains" data-testid="eqd-with-present-eq" />
          <span>
            Include the EQ the subs run now <span className="text-ink-soft">(a check of it: the residual with that EQ; such a run is not applied)</span>
          </span>
        </label>
      ) : null}
    </form>
  );
}
