import { describe, expect, it } from 'vitest';
import { API_DOCS } from '@/lib/api-docs';
import { Client } from '../helpers/http';

/** Every key of `excerpt` must be present in `actual`, recursively (arrays: the first element's shape). */
function expectShape(actual: unknown, excerpt: unknown, path = ''): void {
  if (excerpt === null || typeof excerpt !== 'object') {
    expect(actual === undefined ? `missing ${path}` : typeof actual, path).toBe(typeof excerpt);
    return;
  }
  if (Array.isArray(excerpt)) {
    expect(Array.isArray(actual), `${path} should be an array`).toBe(true);
    if (excerpt.length && (actual as unknown[]).length) expectShape((actual as unknown[])[0], excerpt[0], `${path}[0]`);
    return;
  }
  expect(actual !== null && typeof actual === 'object', `${path} should be an object`).toBe(true);
  for (const [k, v] of Object.entries(excerpt)) expectShape((actual as Record<string, unknown>)[k], v, path ? `${path}.${k}` : k);
}

describe('the API page cannot drift from the code: every compute example runs', () => {
  const computeRoutes = API_DOCS.filter((r) => r.auth === 'none');

  it('documents the two fixed compute contracts (blend and room modes)', () => {
    const paths = computeRoutes.map((r) => `${r.method} ${r.path}`);
    expect(paths).toContain('POST /api/v1/blend');
    expect(paths).toContain('POST /api/v1/room-modes');
  });

  for (const r of computeRoutes) {
    for (const ex of r.examples) {
      it(`${r.method} ${r.path} — ${ex.title} answers ${ex.status} with the documented fields`, async () => {
        const res = await new Client().request(r.method, r.path, ex.request);
        expect(res.status).toBe(ex.status);
        expectShape(res.body, ex.responseExcerpt);
      });
    }
  }

  it('every documented route lists its fields with units where they have one', () => {
    for (const r of API_DOCS) {
      expect(r.summary.length, r.id).toBeGreaterThan(10);
      for (const f of r.fields) {
        const unitInName = /(Hz|Ms|Db|M|C|S|W|Ohm|Deg|Mps|M3)$/.test(f.name);
        if (unitInName) expect(f.unit, `${r.id}.${f.name} has a unit in its name, so it needs a unit`).toBeTruthy();
      }
    }
  });
});
