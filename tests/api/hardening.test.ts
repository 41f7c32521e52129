import { describe, expect, it } from 'vitest';
import { Client, signedInClient } from '../helpers/http';
import { baseUrl } from '../helpers/env';

const PAGES = ['/', '/sign-in', '/sign-up', '/systems/new', '/docs/api', '/library', '/api/v1/workspaces', '/api/health'];

describe('web hardening', () => {
  for (const path of PAGES) {
    it(`${path} carries the security headers`, async () => {
      const res = await fetch(`${baseUrl()}${path}`, { redirect: 'manual' });
      const csp = res.headers.get('content-security-policy') ?? '';
      expect(csp).toContain("frame-ancestors 'none'");
      expect(csp).toContain("default-src 'self'");
      if (process.env.SEAMLINE_EXPECT_PRODUCTION !== '0') expect(csp).not.toContain('unsafe-eval');
      expect(res.headers.get('x-content-type-options')).toBe('nosniff');
      expect(res.headers.get('referrer-policy')).toBe('strict-origin-when-cross-origin');
      expect(res.headers.get('x-powered-by')).toBeNull();
    });
  }

  it('the session cookie is HttpOnly and SameSite', async () => {
    const csrf = await fetch(`${baseUrl()}/api/auth/csrf`);
    const cookie = csrf.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
    const { csrfToken } = (await csrf.json()) as { csrfToken: string };
    const res = await fetch(`${baseUrl()}/api/auth/callback/credentials`, {
      method: 'POST',
      redirect: 'manual',
      headers: { 'Content-Type': 'application/x-www-form-urlencoded', Cookie: cookie },
      body: new URLSearchParams({ csrfToken, email: 'demo@seamline.test', password: 'seamline-demo', json: 'true' }),
    });
    const session = res.headers.getSetCookie().find((c) => c.includes('session-token'));
    expect(session).toBeDefined();
    expect(session).toMatch(/HttpOnly/i);
    expect(session).toMatch(/SameSite=(Lax|Strict)/i);
  });

  it('error answers carry no stack trace and no SQL', async () => {
    const c = await signedInClient('demo@seamline.test');
    const answers = await Promise.all([
      c.get('/api/v1/systems/not-a-uuid'),
      c.get('/api/v1/systems/00000000-0000-4000-8000-000000000000'),
      c.post('/api/v1/blend', '{"temperatureC": 20, "grid": ', { 'Content-Type': 'application/json' }),
      c.post('/api/v1/blend', { temperatureC: 'hot' }),
      new Client().get('/api/v1/workspaces'),
    ]);
    for (const a of answers) {
      expect(a.status).toBeGreaterThanOrEqual(400);
      expect(a.status).toBeLessThan(500);
      expect(a.body.error.code).toBeTypeOf('string');
      expect(a.text).not.toMatch(/\bat \S+ \(|node_modules|SELECT |INSERT |UPDATE "|Sequelize/);
    }
  });
});
