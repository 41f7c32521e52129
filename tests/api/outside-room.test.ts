/**
 * Positions outside the room are refused where a room and positions arrive together — POST /api/v1/layout,
 * POST /api/v1/room-response and a saved System — with 400, the field's path and a message that names the item, the
 * coordinate and the wall (the API's one error shape, README). And signing in only ever returns to this site.
 */
import { describe, expect, it } from 'vitest';
import { POST as layoutPost } from '@/app/api/v1/layout/route';
import { POST as roomResponsePost } from '@/app/api/v1/room-response/route';
import { newSystemDocument } from '@/lib/demo/systems';
import { applyRoomToDocument } from '@/lib/system-model/room-modes';
import { baseUrl } from '../helpers/env';
import { Client, signedInClient } from '../helpers/http';

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- answers are checked field by field
type Json = any;

async function call(handler: typeof layoutPost, path: string, body: unknown): Promise<{ status: number; body: Json }> {
  const res = await handler(new Request(`http://x${path}`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) }), undefined as never);
  return { status: res.status, body: await res.json() };
}

const room = { lengthM: 6.4, widthM: 4.9, heightM: 2.7 };
const listener = { xM: 2.45, yM: 3.7, zM: 1.1 };
const L = { channel: 'L', xM: 1.2, yM: 1.5349, zM: 1.1 };
const R = { channel: 'R', xM: 3.7, yM: 1.5349, zM: 1.1 };

/** The API's one error shape with exactly these issues. */
function expectRefused(res: { status: number; body: Json }, issues: { path: string; message: string }[]) {
  expect(res.status).toBe(400);
  expect(res.body.error.code).toBe('invalid');
  expect(typeof res.body.error.message).toBe('string');
  expect(res.body.error.issues).toEqual(issues);
}

describe('POST /api/v1/layout — nothing is computed from a position outside the given room', () => {
  it('L at x = 40 m in a 4.9 m wide room: 400 at speakers.0.xM, not an included angle of 0.3°', async () => {
    const res = await call(layoutPost, '/api/v1/layout', { template: '2.0', temperatureC: 20, room, listener, speakers: [{ ...L, xM: 40 }, R] });
    expectRefused(res, [{ path: 'speakers.0.xM', message: 'L is 40 m across in a 4.9 m wide room' }]);
    expect(res.body.frontPair).toBeUndefined();
  });

  it('the listener, a seat and a sub beyond the back wall and the ceiling, each by its path', async () => {
    const res = await call(layoutPost, '/api/v1/layout', {
      template: '2.0',
      temperatureC: 20,
      room,
      listener: { ...listener, yM: 7 },
      seats: [{ id: 'back', name: 'Back row', xM: 2, yM: 6.9, zM: 1.1 }],
      speakers: [L, R],
      subs: [{ name: 'Sub', xM: 0.3, yM: 0.3, zM: 2.9 }],
    });
    expectRefused(res, [
      { path: 'listener.yM', message: 'The listening position is 7 m into a 6.4 m long room' },
      { path: 'seats.0.yM', message: 'Back row is 6.9 m into a 6.4 m long room' },
      { path: 'subs.0.zM', message: 'Sub is 2.9 m up in a 2.7 m high room' },
    ]);
  });

  it('the same positions inside the room answer 200 with the included angle', async () => {
    const res = await call(layoutPost, '/api/v1/layout', { template: '2.0', temperatureC: 20, room, listener, speakers: [L, R] });
    expect(res.status).toBe(200);
    expect(res.body.frontPair.includedAngleDeg).toBeGreaterThan(50);
  });
});

describe('POST /api/v1/room-response — seats and subs outside the room', () => {
  it('the MLP left at y = 3.7 m after the room was made 1.5 m long is refused by its path', async () => {
    const res = await call(roomResponsePost, '/api/v1/room-response', {
      room: { ...room, lengthM: 1.5, rt60S: 0.4, temperatureC: 20 },
      seats: [{ name: 'Row 1 centre (MLP)', ...listener }],
      subs: [{ name: 'Sub', xM: 0.3, yM: 0.3, zM: 0.3 }, { name: 'Sub 2', xM: 5, yM: 0.3, zM: 0.3 }],
    });
    expectRefused(res, [
      { path: 'seats.0.yM', message: 'Row 1 centre (MLP) is 3.7 m into a 1.5 m long room' },
      { path: 'subs.1.xM', message: 'Sub 2 is 5 m across in a 4.9 m wide room' },
    ]);
  });
});

describe('a System with a position outside its room cannot be saved (HTTP, running app)', () => {
  it('POST /api/v1/systems: 400 with document.… paths and the messages; nothing is created', async () => {
    const c = await signedInClient('demo@seamline.test');
    const doc = applyRoomToDocument(newSystemDocument(), { lengthM: 1.5 }).doc;
    const res = await c.post('/api/v1/systems', { name: 'Outside the room (invented, never saved)', document: doc });
    expect(res.status).toBe(400);
    const issues = res.body.error.issues as { path: string; message: string }[];
    expect(issues).toContainEqual({ path: 'document.seats.1.yM', message: 'Row 1 centre (MLP) is 3.7 m into a 1.5 m long room' });
    expect(issues.every((i) => /^document\.(seats|speakers|subs)\.\d+\.yM$/.test(i.path))).toBe(true);
  });
});

describe('signing in returns only to this site', () => {
  async function signInWith(callbackUrl: string): Promise<string> {
    const c = new Client();
    const csrf = await c.get('/api/auth/csrf');
    const form = new URLSearchParams({ csrfToken: csrf.body.csrfToken, email: 'demo@seamline.test', password: 'seamline-demo', json: 'true', callbackUrl });
    const res = await c.request('POST', '/api/auth/callback/credentials', form, { 'Content-Type': 'application/x-www-form-urlencoded' });
    return res.headers.get('location') ?? (res.body?.url as string);
  }

  it('a same-site path with a whole System in it comes back unchanged', async () => {
    const path = `/systems/new?panel=modes&s=N4Ig-$+x&name=${encodeURIComponent('Attic cinema (invented)')}&resume=1`;
    const url = new URL(await signInWith(path));
    expect(url.origin).toBe(new URL(baseUrl()).origin);
    expect(`${url.pathname}${url.search}`).toBe(path);
  });

  it.each(['https://evil.example/steal', '//evil.example/steal', '/\\evil.example/steal'])('%s goes to this site instead', async (callbackUrl) => {
    const url = new URL(await signInWith(callbackUrl));
    expect(url.origin).toBe(new URL(baseUrl()).origin);
    expect(url.hostname).not.toContain('evil');
  });
});
