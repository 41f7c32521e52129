import { describe, expect, it } from 'vitest';
import { extensionRequestSchema } from '@/lib/validations/measured-extension';
import { measurementListQuerySchema } from '@/lib/validations/measurement';

// The request body of POST /api/v1/measured/extension and the list query's filters: what passes, and every refusal naming its field path.
const HZ = Array.from({ length: 12 }, (_, i) => 20 * 2 ** (i / 2));
const curve = (extra: Record<string, unknown> = {}) => ({ frequencyHz: HZ, magnitudeDb: HZ.map(() => 0), ...extra });
const paths = (body: unknown): string[] => {
  const r = extensionRequestSchema.safeParse(body);
  return r.success ? [] : r.error.issues.map((i) => i.path.join('.'));
};

describe('extensionRequestSchema', () => {
  it('takes inline curves (a phase column and a name too), stored ids, a band and a crossover; band and crossover are optional', () => {
    expect(paths({ curves: [curve()] })).toEqual([]);
    expect(paths({ curves: [curve({ name: 'Row 1 centre', phaseDeg: HZ.map(() => 0) }), { measurementId: '3c9a7e21-5b4d-4f60-8e1a-9d2c7b6a5f40', name: 'Row 2' }], band: { startHz: 100, stopHz: 1000 }, crossoverHz: 80 })).toEqual([]);
    expect(extensionRequestSchema.parse({ curves: [curve()] }).band).toBeUndefined();
    expect(paths({ curves: Array.from({ length: 40 }, () => curve()) })).toEqual([]);
  });

  it.each([
    ['no curves', { curves: [] }, 'curves'],
    ['41 curves', { curves: Array.from({ length: 41 }, () => curve()) }, 'curves'],
    ['frequencies that do not increase', { curves: [curve({ frequencyHz: [...HZ].reverse() })] }, 'curves.0.frequencyHz.1'],
    ['a magnitude array of another length', { curves: [curve({ magnitudeDb: [0, 0, 0, 0, 0, 0, 0, 0, 0] })] }, 'curves.0.magnitudeDb'],
    ['a magnitude beyond 300 dB', { curves: [curve({ magnitudeDb: HZ.map((_, i) => (i === 3 ? 400 : 0)) })] }, 'curves.0.magnitudeDb.3'],
    ['a magnitude that is not a number', { curves: [curve({ magnitudeDb: HZ.map((_, i) => (i === 2 ? 'NaN' : 0)) })] }, 'curves.0.magnitudeDb.2'],
    ['fewer than 8 points', { curves: [{ frequencyHz: [20, 40, 80], magnitudeDb: [0, 0, 0] }] }, 'curves.0.frequencyHz'],
    ['an empty name', { curves: [curve({ name: ' ' })] }, 'curves.0.name'],
    ['an unknown key in a curve', { curves: [curve({ gainDb: 0 })] }, 'curves.0'],
    ['a measurementId that is not an id', { curves: [{ measurementId: 'seat-1' }] }, 'curves.0.measurementId'],
    ['a band under an octave', { curves: [curve()], band: { startHz: 200, stopHz: 300 } }, 'band.stopHz'],
    ['a band below 10 Hz', { curves: [curve()], band: { startHz: 5, stopHz: 300 } }, 'band.startHz'],
    ['a crossover above 300 Hz', { curves: [curve()], crossoverHz: 500 }, 'crossoverHz'],
    ['an unknown key', { curves: [curve()], smoothing: 3 }, ''],
  ])('refuses %s, naming %s', (_label, request, where) => {
    const found = paths(request);
    // A union names the branch's path when one branch fits best, else the curve itself.
    expect(found.some((p) => p === where || (where.startsWith('curves.0') && p === 'curves.0')), `${JSON.stringify(found)} should name ${where}`).toBe(true);
  });
});

describe('measurementListQuerySchema: seat and role filters', () => {
  it('takes a seat and a role (trimmed), both optional', () => {
    expect(measurementListQuerySchema.parse({ seat: ' Row 1 centre (MLP) ', role: 'mains' })).toEqual({ seat: 'Row 1 centre (MLP)', role: 'mains' });
    expect(measurementListQuerySchema.parse({})).toEqual({});
  });
  it.each([
    ['an empty seat', { seat: '' }, 'seat'],
    ['a seat over 60 characters', { seat: 'x'.repeat(61) }, 'seat'],
    ['a role with a slash', { role: 'mains/sub' }, 'role'],
  ])('refuses %s', (_label, query, where) => {
    const r = measurementListQuerySchema.safeParse(query);
    expect(r.success).toBe(false);
    expect(r.error!.issues.map((i) => i.path.join('.'))).toContain(where);
  });
});
