import { describe, expect, it } from 'vitest';
import { readApiLimits } from '@/lib/api-limits';
import { Client, uniqueEmail } from '../helpers/http';

/**
 * Limits per caller (issue 18): a personal access token is one caller wherever it calls from; anyone else is counted
 * by address. Over the budget: 429, the one error shape, and Retry-After (RFC 9110 §10.2.3: whole seconds). The
 * budgets are the server's, read from the same environment (npm test sets small ones and exempts its own address,
 * so these requests come from documentation addresses).
 */
const limits = readApiLimits();
/** An address of the documentation range 2001:db8::/32 (RFC 3849) no earlier run has used. */
const freshAddress = () => `2001:db8::${Math.floor(Math.random() * 0xffff).toString(16)}:${Math.floor(Math.random() * 0xffff).toString(16)}`;

const smallBlend = {
  temperatureC: 20,
  grid: { startHz: 20, stopHz: 200, pointsPerOctave: 3 },
  paths: [{ name: 'sub', filter: { family: 'butterworth', order: 2, response: 'lowpass', cornerHz: 80 }, gainDb: 0, delayMs: 0, invert: false, distanceM: 3 }],
};

/** Sends `count` requests, 20 at a time, and returns their statuses in order. */
async function burst(count: number, send: () => Promise<{ status: number }>): Promise<number[]> {
  const statuses: number[] = [];
  while (statuses.length < count) {
    const batch = await Promise.all(Array.from({ length: Math.min(20, count - statuses.length) }, () => send()));
    statuses.push(...batch.map((r) => r.status));
  }
  return statuses;
}

function expectLimited(res: { status: number; body: { error?: { code?: string; message?: string } }; headers: Headers }, perMinute: number) {
  expect(res.status).toBe(429);
  expect(res.body.error?.code).toBe('rate_limited');
  expect(res.body.error?.message).toContain(`at most ${perMinute} a minute`);
  const retryAfter = Number(res.headers.get('retry-after'));
  expect(Number.isInteger(retryAfter) && retryAfter >= 1 && retryAfter <= 60, `Retry-After ${res.headers.get('retry-after')}`).toBe(true);
}

describe('API limits per caller', () => {
  it(`an address gets ${limits.libraryPerMinute} Library requests a minute, then 429 with Retry-After; another address is not affected`, async () => {
    const address = freshAddress();
    const client = new Client({ 'X-Forwarded-For': address });
    const statuses = await burst(limits.libraryPerMinute, () => client.get('/api/v1/openapi.json'));
    expect(statuses.filter((s) => s !== 200)).toEqual([]);
    expectLimited(await client.get('/api/v1/openapi.json'), limits.libraryPerMinute);
    expect((await new Client({ 'X-Forwarded-For': freshAddress() }).get('/api/v1/openapi.json')).status).toBe(200);
  }, 120_000);

  it(`the compute routes have their own budget of ${limits.computePerMinute} a minute`, async () => {
    const client = new Client({ 'X-Forwarded-For': freshAddress() });
    const statuses = await burst(limits.computePerMinute, () => client.post('/api/v1/blend', smallBlend));
    expect(statuses.filter((s) => s !== 200)).toEqual([]);
    expectLimited(await client.post('/api/v1/blend', smallBlend), limits.computePerMinute);
    // The Library budget of the same address is untouched.
    expect((await client.get('/api/v1/openapi.json')).status).toBe(200);
  }, 120_000);

  it('a token is one caller wherever it calls from: its budget follows it to a new address', async () => {
    const email = uniqueEmail('limits');
    const owner = new Client();
    expect((await owner.post('/api/v1/auth/sign-up', { name: 'Limit tester', email, password: 'a-long-password-1' })).status).toBe(201);
    expect(await owner.signIn(email, 'a-long-password-1')).toBeNull();
    const workspace = (await owner.get('/api/v1/workspaces')).body.items[0].id as string;
    const made = await owner.post('/api/v1/tokens', { name: 'Limit test', workspaceId: workspace, scope: 'read' });
    expect(made.status).toBe(201);
    const auth = { Authorization: `Bearer ${made.body.token}` };
    const statuses = await burst(limits.libraryPerMinute, () => new Client({ ...auth, 'X-Forwarded-For': freshAddress() }).get('/api/v1/systems'));
    expect(statuses.filter((s) => s !== 200)).toEqual([]);
    expectLimited(await new Client({ ...auth, 'X-Forwarded-For': freshAddress() }).get('/api/v1/systems'), limits.libraryPerMinute);
    // The token's owner in the browser (another caller) still works.
    expect((await owner.get('/api/v1/systems')).status).toBe(200);
  }, 180_000);
});
