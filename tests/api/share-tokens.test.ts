import { randomBytes } from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import { juniperLaneDocument } from '@/lib/demo/systems';
import { Client, signedInClient, uniqueEmail } from '../helpers/http';

/**
 * Share links (issue 8): tokens are not guessable or enumerable. 200 created tokens (System and
 * Lesson links) are unique, at least 43 base64url characters (256 bits), share no prefix beyond
 * chance and follow no sequence; a few hundred random, neighbouring and sequential tokens all
 * answer 404 on the share page and on the copy route.
 */

const CREATED = 200;
const MARK = `tok${Date.now().toString(36)}`;
const BASE64URL_43 = /^[A-Za-z0-9_-]{43,}$/;

function bitsOf(token: string): number[] {
  const bytes = Buffer.from(token, 'base64url');
  return Array.from({ length: bytes.length * 8 }, (_, i) => (bytes[i >> 3]! >> (7 - (i & 7))) & 1);
}

const commonPrefix = (a: string, b: string) => {
  let i = 0;
  while (i < a.length && a[i] === b[i]) i++;
  return i;
};

/** Runs `call` over `items` with a few in flight; returns the answers in order. */
async function pooled<T, R>(items: T[], inFlight: number, call: (item: T) => Promise<R>): Promise<R[]> {
  const out: R[] = new Array(items.length);
  let next = 0;
  await Promise.all(
    Array.from({ length: inFlight }, async () => {
      while (next < items.length) {
        const i = next++;
        out[i] = await call(items[i]!);
      }
    }),
  );
  return out;
}

describe('share tokens are not guessable or enumerable', () => {
  let owner: Client;
  let workspaceId: string;
  const tokens: string[] = [];

  beforeAll(async () => {
    const email = uniqueEmail(MARK);
    expect((await new Client().post('/api/v1/auth/sign-up', { name: 'Token tester', email, password: 'a-long-password-1' })).status).toBe(201);
    owner = await signedInClient(email, 'a-long-password-1');
    workspaceId = (await owner.post('/api/v1/workspaces', { name: `Tokens ${MARK}` })).body.id;
    const system = await owner.post('/api/v1/systems', { name: `Shared ${MARK}`, document: juniperLaneDocument(), workspaceId });
    const lesson = await owner.post('/api/v1/lessons', { title: `Shared lesson ${MARK}`, workspaceId });
    const made = await pooled(Array.from({ length: CREATED }, (_, i) => i), 8, (i) =>
      owner.post(i % 2 ? `/api/v1/lessons/${lesson.body.id}/share-links` : `/api/v1/systems/${system.body.id}/share-links`),
    );
    for (const m of made) {
      expect(m.status).toBe(201);
      tokens.push(m.body.token);
    }
  }, 180_000);

  it(`${CREATED} created tokens are unique, base64url, at least 43 characters (256 bits)`, () => {
    expect(tokens).toHaveLength(CREATED);
    expect(new Set(tokens).size).toBe(CREATED);
    for (const t of tokens) {
      expect(t).toMatch(BASE64URL_43);
      expect(Buffer.from(t, 'base64url').length * 8).toBeGreaterThanOrEqual(256);
    }
  });

  it('show no shared prefix and no sequence', () => {
    // Two random 256-bit tokens share k leading characters with chance 64^-k: among 19,900 pairs
    // the longest shared prefix is about 2–3 characters, and 7 or more happens with chance < 1e-8.
    let longest = 0;
    for (let i = 0; i < tokens.length; i++) for (let j = i + 1; j < tokens.length; j++) longest = Math.max(longest, commonPrefix(tokens[i]!, tokens[j]!));
    expect(longest).toBeLessThanOrEqual(6);
    // Same for suffixes (a counter or timestamp at either end would show here).
    const reversed = tokens.map((t) => [...t].reverse().join(''));
    let longestSuffix = 0;
    for (let i = 0; i < reversed.length; i++) for (let j = i + 1; j < reversed.length; j++) longestSuffix = Math.max(longestSuffix, commonPrefix(reversed[i]!, reversed[j]!));
    expect(longestSuffix).toBeLessThanOrEqual(6);

    // Every one of the 256 bit positions is set in about half the tokens (binomial(200, ½):
    // σ ≈ 7.1, so 50…150 is a 7σ band): a fixed field, counter or timestamp would pin some bits.
    const bits = tokens.map(bitsOf);
    const width = Math.min(...bits.map((b) => b.length));
    expect(width).toBeGreaterThanOrEqual(256);
    const stuck: number[] = [];
    for (let p = 0; p < 256; p++) {
      const ones = bits.reduce((s, b) => s + b[p]!, 0);
      if (ones < 50 || ones > 150) stuck.push(p);
    }
    expect(stuck, 'bit positions far from half set').toEqual([]);

    // Consecutive tokens (in creation order) are not near each other: they differ in about half
    // their bits (mean 128, σ = 8 per pair); a sequence would differ in a few low bits.
    const distances = bits.slice(1).map((b, i) => b.slice(0, 256).reduce((s, bit, k) => s + (bit ^ bits[i]![k]!), 0));
    expect(Math.min(...distances)).toBeGreaterThan(64);
  });

  it('a few hundred random, neighbouring and sequential tokens all answer 404 on /s/{token} and on the copy route', async () => {
    const known = new Set(tokens);
    const real = tokens[0]!;
    const alphabet = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789-_';
    const shift = (c: string, by: number) => alphabet[(alphabet.indexOf(c) + by + 64) % 64]!;
    const guesses = new Set<string>();
    // Random 256-bit tokens.
    for (let i = 0; i < 150; i++) guesses.add(randomBytes(32).toString('base64url'));
    // Neighbours of a real token: one character changed, at every position.
    for (let p = 0; p < real.length; p++) guesses.add(real.slice(0, p) + shift(real[p]!, 1) + real.slice(p + 1));
    // The next and previous few of a real token read as a number, and of two more real tokens.
    for (const t of tokens.slice(0, 3)) for (const by of [-3, -2, -1, 1, 2, 3]) guesses.add(t.slice(0, -1) + shift(t[t.length - 1]!, by));
    // Sequential tokens from all-zero upward, and all-one downward.
    for (let i = 0; i < 40; i++) {
      guesses.add('A'.repeat(42) + alphabet[i]!);
      guesses.add('_'.repeat(42) + alphabet[63 - i]!);
    }
    // Counters written as base64url of a number, and a real token cut short, lengthened or re-cased.
    for (let n = 1; n <= 30; n++) guesses.add(Buffer.from(n.toString(16).padStart(64, '0'), 'hex').toString('base64url'));
    for (const len of [42, 40, 32, 22, 16]) guesses.add(real.slice(0, len));
    guesses.add(`${real}A`);
    guesses.add(real.toUpperCase());
    guesses.add(real.toLowerCase());
    for (const g of [...guesses]) if (known.has(g)) guesses.delete(g);
    const list = [...guesses];
    expect(list.length).toBeGreaterThanOrEqual(300);

    // The real token does open the page (the check below can tell a hit from a miss).
    const control = await new Client().get(`/s/${real}`);
    expect(control.status).toBe(200);
    expect(control.text).toContain(`Shared ${MARK}`);

    const page = await pooled(list, 8, async (t) => ({ t, status: (await new Client().get(`/s/${encodeURIComponent(t)}`)).status }));
    expect(page.filter((p) => p.status !== 404), 'guessed tokens that did not answer 404 on /s/{token}').toEqual([]);

    const before = (await owner.get(`/api/v1/systems?workspaceId=${workspaceId}`)).body.total;
    const copy = await pooled(list, 8, async (t) => {
      const res = await owner.post(`/api/v1/shared/${encodeURIComponent(t)}/copy`, { workspaceId });
      return { t, status: res.status, code: res.body?.error?.code };
    });
    expect(copy.filter((c) => c.status !== 404 || c.code !== 'not_found'), 'guessed tokens that did not answer 404 on the copy route').toEqual([]);
    const after = (await owner.get(`/api/v1/systems?workspaceId=${workspaceId}`)).body.total;
    expect(before).toBe(1);
    expect(after).toBe(before);
  }, 300_000);
});
