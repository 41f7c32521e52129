'use client';

import { useId, useState, type KeyboardEvent } from 'react';
import { formatNumberText, parseLengthText, parseNumberText } from '@/lib/number-input';
import { feetToMetres, metresToFeet } from '@/lib/units';
import { useDecimalMark } from './use-decimal-mark';

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
  /** A length in metres: shown in feet when units === 'imperial'; typed in any unit (10' 2", 122 in, 310 cm, 3.1 m). */
  length?: boolean;
  units?: 'metric' | 'imperial';
  digits?: number;
  error?: string;
  hint?: string;
  disabled?: boolean;
  className?: string;
  testId?: string;
}

/** What was typed, the value it gave once converted, and the units then shown: shown again as typed while both hold. */
type Typed = { text: string; value: number; units: 'metric' | 'imperial' };

/**
 * A labelled numeric field with its unit and an optional slider; keyboard operable (arrow keys step the number,
 * Escape drops an edit). Text is read by lib/number-input: either decimal mark (`80,5` is 80.5), and for lengths
 * feet and inches or metric units as people write them. The value typed is converted to SI once and kept; what is
 * shown is never written back, so switching units does not change the stored value. Unreadable or out-of-range
 * input shows a message and changes nothing.
 */
export function NumberField({ label, value, onChange, unit, min, max, step = 1, slider, length, units = 'metric', digits, error, hint, disabled, className = '', testId }: NumberFieldProps) {
  const id = useId();
  const decimalMark = useDecimalMark();
  const imperial = Boolean(length) && units === 'imperial';
  const toShown = (v: number) => (imperial ? metresToFeet(v) : v);
  const fromShown = (v: number) => (imperial ? feetToMetres(v) : v);
  const shownUnit = imperial ? 'ft' : unit;
  const shownMin = min === undefined ? undefined : toShown(min);
  const shownMax = max === undefined ? undefined : toShown(max);
  const shownStep = imperial ? Math.max(0.1, Math.round(metresToFeet(step) * 10) / 10) : step;
  const shownDigits = digits ?? (shownStep >= 1 ? 0 : shownStep >= 0.1 ? 1 : 2);
  const fmt = (v: number) => formatNumberText(toShown(v), shownDigits, decimalMark);
  const limit = (v: number) => `${formatNumberText(v, 2, decimalMark)}${shownUnit ? ` ${shownUnit}` : ''}`;
  // What the person is typing; null shows the value (as last typed, while it and the units are unchanged).
  const [draft, setDraft] = useState<string | null>(null);
  const [typed, setTyped] = useState<Typed | null>(null);
  const [localError, setLocalError] = useState<string | null>(null);
  const text = draft ?? (typed && typed.value === value && typed.units === units ? typed.text : fmt(value));

  /** The text read into SI (units typed are honoured; a bare number is in the shown unit). */
  const parse = (raw: string) => (length ? parseLengthText(raw, { units: imperial ? 'imperial' : 'metric', decimalMark }) : parseNumberText(raw, { decimalMark, unit }));
  /** The SI value of `raw`, or the message that says why it is refused. */
  const read = (raw: string): { ok: true; value: number } | { ok: false; message: string } => {
    const r = parse(raw);
    if (!r.ok) return { ok: false, message: `${label}: ${r.message}` };
    if (min !== undefined && r.value < min - 1e-9) return { ok: false, message: `${label} must be at least ${limit(shownMin!)}` };
    if (max !== undefined && r.value > max + 1e-9) return { ok: false, message: `${label} must be at most ${limit(shownMax!)}` };
    return r;
  };

  const edit = (raw: string) => {
    setDraft(raw);
    const r = read(raw);
    if (!r.ok) {
      // Half-typed text ("10 f" on the way to "10 ft") is not flagged until the field is left; a number out of range is.
      setLocalError(parse(raw).ok ? r.message : null);
      return;
    }
    setLocalError(null);
    setTyped({ text: raw.trim(), value: r.value, units });
    onChange(r.value);
  };

  const leave = () => {
    if (draft === null) return;
    const r = read(draft);
    if (r.ok) setDraft(null);
    else setLocalError(r.message); // an invalid entry stays, with its message
  };

  const stepBy = (direction: 1 | -1) => {
    const r = draft === null ? null : read(draft);
    const base = toShown(r?.ok ? r.value : value);
    let next = Number((base + direction * shownStep).toFixed(Math.max(shownDigits, 6)));
    if (shownMin !== undefined) next = Math.max(next, shownMin);
    if (shownMax !== undefined) next = Math.min(next, shownMax);
    setDraft(null);
    setTyped(null);
    setLocalError(null);
    onChange(fromShown(next));
  };

  const onKeyDown = (e: KeyboardEvent<HTMLInputElement>) => {
    if (e.altKey || e.ctrlKey || e.metaKey) return;
    if (e.key === 'ArrowUp' || e.key === 'ArrowDown') {
      e.preventDefault();
      stepBy(e.key === 'ArrowUp' ? 1 : -1);
    } else if (e.key === 'Escape' && draft !== null) {
      setDraft(null);
      setLocalError(null);
    } else if (e.key === 'Enter') leave();
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
          type="text"
          role="spinbutton"
          inputMode={length ? 'text' : 'decimal'}
          autoComplete="off"
          title={length ? `Any unit: 10' 2", 10 ft 2 in, 122 in, 10.17 ft, 3.1 m, 310 cm (a bare number is in ${imperial ? 'feet' : 'metres'})` : undefined}
          spellCheck={false}
          value={text}
          aria-valuenow={Number(toShown(value).toFixed(6))}
          aria-valuetext={`${text}${shownUnit && !length ? ` ${shownUnit}` : ''}`}
          aria-valuemin={shownMin}
          aria-valuemax={shownMax}
          disabled={disabled}
          aria-invalid={message ? true : undefined}
          aria-describedby={message ? `${id}-msg` : hint ? `${id}-hint` : undefined}
          onBlur={leave}
          onKeyDown={onKeyDown}
          onChange={(e) => edit(e.target.value)}
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
              setTyped(null);
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
