'use client';

import { useId, useState } from 'react';

/** The message for a required text as it stands, or null when it is fine: empty (after trimming) or longer than `max`. */
export function requiredTextMessage(label: string, value: string, max?: number): string | null {
  if (value.trim() === '') return `${label} is required`;
  if (max !== undefined && value.trim().length > max) return `${label} must be at most ${max} characters`;
  return null;
}

/**
 * A required name or title checked as it is typed, not only on Save: once the field has been typed in or left, an
 * empty value gets an inline message tied to the input (aria-invalid, aria-describedby). Spread `inputProps` on the
 * input (it adds `required`, `aria-*` and onInput/onBlur, not onChange) and render `message` below it. `serverError`
 * (from Save) shows when there is no message of its own.
 */
export function useRequiredText({ id, label, value, max, serverError }: { id?: string; label: string; value: string; max?: number; serverError?: string | null }) {
  const [touched, setTouched] = useState(false);
  const own = touched ? requiredTextMessage(label, value, max) : null;
  const error = own ?? serverError ?? null;
  const fallbackId = useId();
  const messageId = `${id ?? fallbackId}-required`;
  return {
    error,
    inputProps: {
      required: true,
      'aria-required': true,
      'aria-invalid': error ? true : undefined,
      'aria-describedby': error ? messageId : undefined,
      onInput: () => setTouched(true),
      onBlur: () => setTouched(true),
    },
    message: error ? (
      <p id={messageId} role="alert" className="text-xs text-fail">
        {error}
      </p>
    ) : null,
  };
}
