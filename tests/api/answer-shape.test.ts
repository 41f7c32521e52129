import { describe, expect, it } from 'vitest';
import { ANSWER_SHAPES } from '@/lib/openapi/answer-shapes';
import { API_OPERATIONS } from '@/lib/openapi/operations';
import { Client } from '../helpers/http';

/**
 * `?fields=` and `?precision=` on every compute route, against the same route's default answer (the oracle: the full
 * answer the route gives without them, so nothing here trusts the shaping code). Each route is driven by its first
 * documented example that the app executes with 200.
 */
type Json = Record<string, unknown>;
const client = new Client();

const routes = Object.entries(ANSWER_SHAPES).map(([key, shape]) => {
  const op = API_OPERATIONS.find((o) => o.method === 'POST' && o.query === shape.query);
  const example = op?.examples.find((e) => e.executed && e.status === 200 && e.body !== undefined);
  return { key, shape, path: op?.path, body: example?.body };
});

async function post(path: string, query: string, body: unknown) {
  return client.request('POST', `${path}${query}`, body);
}

/** Every number of `shaped` within half a unit of the `decimals`-th place of the same number in `full`, and on that place. */
function expectRounded(shaped: unknown, full: unknown, decimals: number, at: string): void {
  if (typeof full === 'number') {
    expect(typeof shaped, at).toBe('number');
    const s = shaped as number;
    if (!Number.isFinite(full)) return void expect(s, at).toBe(full);
    const unit = 10 ** -decimals;
    expect(Math.abs(s - full), at).toBeLessThanOrEqual(unit / 2 + Math.abs(full) * 1e-12);
    expect(Math.abs(s / unit - Math.round(s / unit)), `${at} has more than ${decimals} decimals`).toBeLessThan(1e-6);
    return;
  }
  if (Array.isArray(full)) {
    expect(Array.isArray(shaped) && shaped.length, at).toBe(full.length);
    full.forEach((v, i) => expectRounded((shaped as unknown[])[i], v, decimals, `${at}[${i}]`));
    return;
  }
  if (full && typeof full === 'object') {
    expect(Object.keys(shaped as Json), at).toEqual(Object.keys(full));
    for (const [k, v] of Object.entries(full)) expectRounded((shaped as Json)[k], v, decimals, `${at}.${k}`);
    return;
  }
  expect(shaped, at).toEqual(full);
}

describe('every compute route takes ?fields= and ?precision=', () => {
  it('has an executed example for each shaped route (so each is tested below)', () => {
    expect(routes.length).toBe(13);
    for (const r of routes) expect(r.path && r.body !== undefined, r.key).toBe(true);
  });

  for (const r of routes) {
    describe(`POST ${r.path ?? r.key}`, () => {
      it('without them answers the full default; with fields, exactly the named parts, equal to the default ones', async () => {
        const full = await post(r.path!, '', r.body);
        expect(full.status).toBe(200);
        const keys = Object.keys(full.body as Json);
        expect(keys).toEqual(r.shape.fieldNames.filter((n) => !n.includes('.')).filter((k) => k in (full.body as Json)));
        const chosen = [keys[0]!, keys[keys.length - 1]!];
        const some = await post(r.path!, `?fields=${chosen.join(',')}`, r.body);
        expect(some.status).toBe(200);
        expect(Object.keys(some.body as Json).sort()).toEqual([...new Set(chosen)].sort());
        for (const k of chosen) expect((some.body as Json)[k]).toEqual((full.body as Json)[k]);
        expect(some.text.length).toBeLessThan(full.text.length);
      });

      it('a part of an object, or of each item of a list, keeps only that part', async () => {
        const full = (await post(r.path!, '', r.body)).body as Json;
        const name = [...r.shape.fieldNames].reverse().find((n) => {
          const [key] = n.split('.');
          const v = full[key!];
          return n.includes('.') && v !== null && typeof v === 'object' && (!Array.isArray(v) || (v.length > 0 && typeof v[0] === 'object'));
        });
        if (!name) return void expect(r.shape.fieldNames.some((n) => n.includes('.'))).toBe(false);
        const [key, part] = name.split('.') as [string, string];
        const shaped = await post(r.path!, `?fields=${name}`, r.body);
        expect(shaped.status).toBe(200);
        const only = (o: Json) => (part in o ? { [part]: o[part] } : {});
        const v = full[key];
        expect((shaped.body as Json)[key]).toEqual(Array.isArray(v) ? v.map((item) => only(item as Json)) : only(v as Json));
        expect(Object.keys(shaped.body as Json)).toEqual([key]);
      });

      it('precision caps the decimal places of every number (filter coefficients excepted)', async () => {
        const full = (await post(r.path!, '', r.body)).body as Json;
        for (const decimals of [0, 2]) {
          const shaped = await post(r.path!, `?precision=${decimals}`, r.body);
          expect(shaped.status).toBe(200);
          for (const [k, v] of Object.entries(full)) {
            if (k === 'sections' && (r.key === 'processorFilters' || r.key === 'eqDesign')) expect((shaped.body as Json)[k], k).toEqual(v);
            else expectRounded((shaped.body as Json)[k], v, decimals, k);
          }
        }
      });
    });
  }
});

describe('bad shaping is a 400 naming the parameter, and nothing is computed', () => {
  const blend = routes.find((r) => r.key === 'blend')!;
  const cases: [string, string, string][] = [
    ['an unknown part', '?fields=frequencyHz,summ', 'fields'],
    ['an unknown part of a part', '?fields=sum.level', 'fields'],
    ['an empty list', '?fields=,,', 'fields'],
    ['precision above 6', '?precision=7', 'precision'],
    ['a negative precision', '?precision=-1', 'precision'],
    ['a fractional precision', '?precision=1.5', 'precision'],
    ['precision as words', '?precision=two', 'precision'],
    ['a misspelt parameter', '?field=sum', '(query)'],
  ];
  for (const [what, query, path] of cases) {
    it(`${what} (${query})`, async () => {
      const res = await post(blend.path!, query, blend.body);
      expect(res.status).toBe(400);
      const error = (res.body as { error: { message: string; issues: { path: string; message: string }[] } }).error;
      expect(error.issues.map((i) => i.path)).toContain(path);
      expect(error.message.startsWith(`${path}: `)).toBe(true);
    });
  }

  it('names the part that is wrong and lists the known ones', async () => {
    const res = await post(blend.path!, '?fields=summ', blend.body);
    const message = (res.body as { error: { message: string } }).error.message;
    expect(message).toContain("'summ' is not a part of this answer");
    expect(message).toContain('sum.magnitudeDb');
  });
});
