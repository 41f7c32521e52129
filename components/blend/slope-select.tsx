'use client';

import { useId } from 'react';
import type { Slope } from '@/lib/validations/system';

const ORDERS: Record<Slope['family'], number[]> = {
  butterworth: [1, 2, 3, 4, 5, 6, 7, 8],
  'linkwitz-riley': [2, 4, 8],
};

/** "LR4", "BW2": the trade's short name of a slope. */
export function slopeShortName(s: { family: Slope['family']; order: number }): string {
  return `${s.family === 'butterworth' ? 'BW' : 'LR'}${s.order}`;
}

/** Family and order of one crossover filter; switching family keeps the order when it is allowed, else picks the nearest. */
export function SlopeSelect({ label, value, onChange, error, disabled, testId }: { label: string; value: Slope; onChange: (s: Slope) => void; error?: string; disabled?: boolean; testId?: string }) {
  const id = useId();
  const setFamily = (family: Slope['family']) => {
    const allowed = ORDERS[family];
    const order = allowed.includes(value.order) ? value.order : allowed.reduce((best, o) => (Math.abs(o - value.order) < Math.abs(best - value.order) ? o : best), allowed[0] as number);
    onChange({ family, order });
  };
  return (
    <fieldset className="flex flex-col gap-1" data-testid={testId}>
      <legend className="text-xs font-medium text-ink-soft">{label}</legend>
      <div className="flex flex-wrap items-center gap-2">
        <label htmlFor={`${id}-family`} className="sr-only">
          {label} family
        </label>
        <select id={`${id}-family`} value={value.family} disabled={disabled} onChange={(e) => setFamily(e.target.value as Slope['family'])} className="rounded-md border border-line bg-white px-2 py-1.5 text-sm">
          <option value="butterworth">Butterworth</option>
          <option value="linkwitz-riley">Linkwitz–Riley</option>
        </select>
        <label htmlFor={`${id}-order`} className="sr-only">
          {label} order
        </label>
        <select
          id={`${id}-order`}
          value={value.order}
          disabled={disabled}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-msg` : undefined}
          onChange={(e) => onChange({ family: value.family, order: Number(e.target.value) })}
          className={`num rounded-md border bg-white px-2 py-1.5 text-sm ${error ? 'border-fail' : 'border-line'}`}
        >
          {ORDERS[value.family].map((o) => (
            <option key={o} value={o}>
              order {o} · {o * 6} dB/oct
            </option>
          ))}
        </select>
      </div>
      {error ? (
        <p id={`${id}-msg`} role="alert" className="text-xs text-fail">
          {error}
        </p>
      ) : null}
    </fieldset>
  );
}
