'use client';

import { useId, useState } from 'react';
import { feetToMetres, metresToFeet } from '@/lib/units';

export interface NumberFieldProps {
  label: string;
  /** Value in SI (metres for lengths). */
  value: number;
  onChange: (value: number) => void;
  unit?: string;
  min?: number;
  max?: number;
  step?: number;
  /** Show a range slider beside the number. */
  slider?: boolean;
  /** A length in metres: shown and typed in feet when units === 'imperial'. */
  length?: boolean;
  units?: 'metric' | 'imperial';
  digits?: number;
  error?: string;
  hint?: string;
  disabled?: boolean;
  className?: string;
  testId?: string;
}

/**
 * A labelled numeric field with its unit and an optional slider; keyboard operable (arrow keys
 * step the number and the slider). Lengths are stored in metres and shown in feet on request.
 * Out-of-range or non-numeric input shows a message and is not passed on.
 */
export function NumberField({ label, value, onChange, unit, min, max, step = 1, slider, length, units = 'metric', digits, error, hint, disabled, className = '', testId }: NumberFieldProps) {
  const id = useId();
  const imperial = Boolean(length) && units === 'imperial';
  const toShown = (v: number) => (imperial ? metresToFeet(v) : v);
  const fromShown = (v: number) => (imperial ? feetToMetres(v) : v);
  const shownUnit = imperial ? 'ft' : unit;
  const shownMin = min === undefined ? undefined : toShown(min);
  const shownMax = max === undefined ? undefined : toShown(max);
  const shownStep = imperial ? Math.max(0.1, Math.round(metresToFeet(step) * 10) / 10) : step;
  const fmt = (v: number) => {
    const d = digits ?? (shownStep >= 1 ? 0 : shownStep >= 0.1 ? 1 : 2);
    return String(Number(toShown(v).toFixed(d)));
  };
  // What the person is typing; null shows the value itself (so outside changes appear at once).
  const [draft, setDraft] = useState<string | null>(null);
  const [localError, setLocalError] = useState<string | null>(null);
  const text = draft ?? fmt(value);

  const commit = (raw: string) => {
    setDraft(raw);
    const n = Number(raw.replace(',', '.'));
    if (raw.trim() === '' || !Number.isFinite(n)) {
      setLocalError(`${label} must be a number`);
      return;
    }
    if (shownMin !== undefined && n < shownMin - 1e-9) {
      setLocalError(`${label} must be at least ${Number(shownMin.toFixed(2))}${shownUnit ? ` ${shownUnit}` : ''}`);
      return;
    }
    if (shownMax !== undefined && n > shownMax + 1e-9) {
      setLocalError(`${label} must be at most ${Number(shownMax.toFixed(2))}${shownUnit ? ` ${shownUnit}` : ''}`);
      return;
    }
    setLocalError(null);
    onChange(fromShown(n));
  };

  const message = localError ?? error;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={id} className="text-xs font-medium text-ink-soft">
        {label}
        {shownUnit ? <span className="ml-1 font-normal text-ink-faint">({shownUnit})</span> : null}
      </label>
      <div className="flex items-center gap-2">
        <input
          id={id}
          data-testid={testId}
          type="number"
          inputMode="decimal"
          value={text}
          min={shownMin}
          max={shownMax}
          step={shownStep}
          disabled={disabled}
          aria-invalid={message ? true : undefined}
          aria-describedby={message ? `${id}-msg` : hint ? `${id}-hint` : undefined}
          onBlur={() => {
            // A valid entry gives way to the formatted value; an invalid one stays with its message.
            if (!localError) setDraft(null);
          }}
          onChange={(e) => commit(e.target.value)}
          className={`num w-24 rounded-md border bg-white px-2 py-1.5 text-sm disabled:cursor-not-allowed disabled:border-dashed disabled:bg-muted disabled:text-ink-soft ${message ? 'border-fail' : 'border-line'}`}
        />
        {slider && min !== undefined && max !== undefined ? (
          <input
            type="range"
            aria-label={`${label} slider`}
            min={shownMin}
            max={shownMax}
            step={shownStep}
            value={toShown(value)}
            disabled={disabled}
            onChange={(e) => {
              const n = Number(e.target.value);
              setDraft(null);
              setLocalError(null);
              onChange(fromShown(n));
            }}
            className="min-w-0 flex-1 accent-mains disabled:opacity-50"
          />
        ) : null}
      </div>
      {message ? (
        <p id={`${id}-msg`} role="alert" className="text-xs text-fail">
          {message}
        </p>
      ) : hint ? (
        <p id={`${id}-hint`} className="text-xs text-ink-faint">
          {hint}
        </p>
      ) : null}
    </div>
  );
}
