import { describe, expect, it } from 'vitest';
import type { z } from 'zod';
import { isUuid, num, uuidField } from '@/lib/validations/common';

/** The messages of the one failed check, or [] when the value passes. */
const messages = (schema: z.ZodType, value: unknown) => {
  const r = schema.safeParse(value);
  return r.success ? [] : r.error.issues.map((i) => i.message);
};

describe('num: the one number helper keeps each family of messages', () => {
  it('without a label (compute requests: the path names the field)', () => {
    const hz = num(10, 24000, 'Hz');
    expect(messages(hz, undefined)).toEqual(['is required']);
    expect(messages(hz, 'x')).toEqual(['must be a finite number']);
    expect(messages(hz, Infinity)).toEqual(['must be a finite number']);
    expect(messages(hz, 5)).toEqual(['must be at least 10 Hz']);
    expect(messages(hz, 30000)).toEqual(['must be at most 24000 Hz']);
    expect(messages(num(1, 8), 9)).toEqual(['must be at most 8']);
    expect(messages(hz, 10)).toEqual([]);
  });

  it('with a label and no unit (the System document)', () => {
    const corner = num(5, 500, '', 'cornerHz');
    expect(messages(corner, undefined)).toEqual(['cornerHz must be a number']);
    expect(messages(corner, '80')).toEqual(['cornerHz must be a number']);
    expect(messages(corner, 1)).toEqual(['cornerHz must be at least 5']);
    expect(messages(corner, 501)).toEqual(['cornerHz must be at most 500']);
  });

  it('with a label and a unit (Lesson sweeps)', () => {
    const from = num(0, 100, 'ms', 'from');
    expect(messages(from, null)).toEqual(['from must be a number (ms)']);
    expect(messages(from, -1)).toEqual(['from must be at least 0 ms']);
    expect(messages(from, 101)).toEqual(['from must be at most 100 ms']);
  });
});

describe('the one id check', () => {
  it('isUuid accepts the database’s UUIDs and nothing that merely looks like one', () => {
    expect(isUuid('6b0d6f8e-3c1a-4d2b-9f4e-2a7c5e1d9b30')).toBe(true);
    expect(isUuid('6B0D6F8E-3C1A-4D2B-9F4E-2A7C5E1D9B30')).toBe(true);
    expect(isUuid('-'.repeat(36))).toBe(false);
    expect(isUuid('6b0d6f8e3c1a4d2b9f4e2a7c5e1d9b30')).toBe(false);
    expect(isUuid('6b0d6f8e-3c1a-4d2b-9f4e-2a7c5e1d9b3')).toBe(false);
    expect(isUuid('not-a-uuid')).toBe(false);
  });

  it('uuidField answers with the field’s own message', () => {
    expect(messages(uuidField('workspaceId must be a workspace id'), 'nope')).toEqual(['workspaceId must be a workspace id']);
  });
});
