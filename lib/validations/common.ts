import { z } from 'zod';

/**
 * A number within [min, max] — the one number helper of every schema. The messages name the range and the unit
 * ("must be at least 1 Hz"). Without a `label` the issue's path names the field, and a wrong type reads "is required"
 * (missing) or "must be a finite number"; with a `label` every message starts with it ("cornerHz must be a number",
 * "from must be a number (ms)"), for forms that show the message without its path.
 */
export function num(min: number, max: number, unit = '', label = '') {
  const field = label ? `${label} ` : '';
  const inUnit = unit ? ` ${unit}` : '';
  const typeError = label
    ? `${label} must be a number${unit ? ` (${unit})` : ''}`
    : (issue: { input: unknown }) => (issue.input === undefined ? 'is required' : 'must be a finite number');
  return z
    .number({ error: typeError })
    .min(min, `${field}must be at least ${min}${inUnit}`)
    .max(max, `${field}must be at most ${max}${inUnit}`);
}

/**
 * The one id check: every stored row's id is a UUID the database made, so anything else cannot name a row.
 * `uuidField` is the zod field (with the field's own message); `isUuid` is the same test for a path parameter.
 */
export const uuidField = (message?: string) => z.string().uuid(message);

const anyUuid = uuidField();

export function isUuid(value: string): boolean {
  return anyUuid.safeParse(value).success;
}
