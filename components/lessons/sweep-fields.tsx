'use client';

import { FILTER_CHOICES, filterChoiceLabel, SWEEP_PARAMETERS, type Sweep, type SweepParameter } from '@/lib/validations/lesson';
import { SWEEP_LABELS, SWEEP_UNITS } from '@/lib/system-model/lesson-sweep';
import { parseLengthText, parseNumberText } from '@/lib/number-input';

/** A sweep being edited: numbers as typed (strings), so a half-typed value is not lost. */
export type SweepDraft = { parameter: SweepParameter; from: string; to: string; durationS: string } | null;

export function sweepToDraft(sweep: Sweep | null): SweepDraft {
  if (!sweep) return null;
  return { parameter: sweep.parameter, from: String(sweep.from), to: String(sweep.to), durationS: String(sweep.durationS) };
}

/** The draft as the API's sweep object (numbers parsed; validated by the caller with sweepSchema). */
export function draftToSweep(d: SweepDraft): unknown {
  if (!d) return null;
  const discrete = d.parameter === 'subPolarity' || d.parameter === 'filter';
  // Either decimal mark (80,5 is 80.5), and a distance in any unit (10' 2", 310 cm); unreadable text is NaN, which the schema refuses.
  const read = (s: string) => (d.parameter === 'subDistanceM' ? parseLengthText(s, { units: 'metric', decimalMark: '.' }) : parseNumberText(s, { decimalMark: '.' }));
  const n = (s: string) => ((r) => (r.ok ? r.value : NaN))(read(s));
  return { parameter: d.parameter, from: discrete ? d.from : n(d.from), to: discrete ? d.to : n(d.to), durationS: n(d.durationS) };
}

const DEFAULTS: Record<SweepParameter, { from: string; to: string }> = {
  subDelayMs: { from: '0', to: '6' },
  subPolarity: { from: 'normal', to: 'inverted' },
  crossoverHz: { from: '60', to: '120' },
  filter: { from: 'butterworth-2', to: 'linkwitz-riley-4' },
  subDistanceM: { from: '2.5', to: '3.5' },
  mainsGainDb: { from: '-6', to: '6' },
};

const inputClass = 'w-full rounded-md border border-line bg-white px-2.5 py-1.5 text-sm';

/** Editor of a Step's optional sweep: which parameter, from, to, and how long. */
export function SweepFields({ value, onChange, error }: { value: SweepDraft; onChange: (d: SweepDraft) => void; error?: string }) {
  const parameter = value?.parameter;
  const discrete = parameter === 'subPolarity' || parameter === 'filter';
  const choices = parameter === 'subPolarity' ? ['normal', 'inverted'] : parameter === 'filter' ? [...FILTER_CHOICES] : [];
  const label = (c: string) => (parameter === 'filter' ? filterChoiceLabel(c as (typeof FILTER_CHOICES)[number]) : c);
  return (
    <fieldset className="flex flex-col gap-2 rounded-md border border-line p-3">
      <legend className="px-1 text-sm font-medium">Sweep</legend>
      <label className="flex flex-col gap-1 text-sm">
        <span>Animate</span>
        <select
          className={inputClass}
          value={parameter ?? ''}
          onChange={(e) => {
            const p = e.target.value as SweepParameter | '';
            onChange(p ? { parameter: p, ...DEFAULTS[p], durationS: value?.durationS ?? '6' } : null);
          }}
          data-testid="sweep-parameter"
        >
          <option value="">No sweep</option>
          {SWEEP_PARAMETERS.map((p) => (
            <option key={p} value={p}>
              {SWEEP_LABELS[p]}
              {SWEEP_UNITS[p] ? ` (${SWEEP_UNITS[p]})` : ''}
            </option>
          ))}
        </select>
      </label>
      {value ? (
        <div className="grid grid-cols-3 gap-2">
          {(['from', 'to'] as const).map((k) => (
            <label key={k} className="flex flex-col gap-1 text-sm">
              <span>
                {k === 'from' ? 'From' : 'To'}
                {SWEEP_UNITS[value.parameter] ? <span className="text-ink-faint"> ({SWEEP_UNITS[value.parameter]})</span> : null}
              </span>
              {discrete ? (
                <select className={inputClass} value={value[k]} onChange={(e) => onChange({ ...value, [k]: e.target.value })}>
                  {choices.map((c) => (
                    <option key={c} value={c}>
                      {label(c)}
                    </option>
                  ))}
                </select>
              ) : (
                <input className={`${inputClass} num`} inputMode="decimal" value={value[k]} onChange={(e) => onChange({ ...value, [k]: e.target.value })} />
              )}
            </label>
          ))}
          <label className="flex flex-col gap-1 text-sm">
            <span>
              Duration <span className="text-ink-faint">(s)</span>
            </span>
            <input className={`${inputClass} num`} inputMode="decimal" value={value.durationS} onChange={(e) => onChange({ ...value, durationS: e.target.value })} />
          </label>
        </div>
      ) : null}
      {error ? (
        <p role="alert" className="text-sm text-fail">
          {error}
        </p>
      ) : null}
    </fieldset>
  );
}
