import { expect } from 'vitest';

// Calling a compute route handler in-process (no server), reading its refusals, and the whole-system request the
// Timing and Crossover sweep tests start from.

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- answers are read loosely; the assertions check the shapes
export type Json = Record<string, any>;

type RouteHandler = (request: Request, context: never) => Promise<Response>;
type RoutePost = (body: unknown, headers?: Record<string, string>) => Promise<{ status: number; body: Json }>;

/** A caller of a route's POST handler: JSON bodies as objects, strings as they are, and the answer's status and JSON. */
export function postTo(handler: RouteHandler, path: string): RoutePost {
  return async (body, headers = { 'content-type': 'application/json' }) => {
    const res = await handler(new Request(`http://x${path}`, { method: 'POST', headers, body: typeof body === 'string' ? body : JSON.stringify(body) }), undefined as never);
    return { status: res.status, body: (await res.json()) as Json };
  };
}

/** The field paths an error answer names (none for any other answer). */
export function issuePaths(b: Json): string[] {
  return (b.error?.issues ?? []).map((i: { path: string }) => i.path);
}

/** For `it.each` over [label, field path, request]: the request is refused with 400 and the field is named. */
export function refusedNaming(post: RoutePost) {
  return async (_label: string, where: string, request: unknown): Promise<void> => {
    const { status, body } = await post(request);
    expect(status).toBe(400);
    expect(issuePaths(body)).toContain(where);
  };
}

export const LR4 = { family: 'linkwitz-riley', order: 4 };
export const BW2 = { family: 'butterworth', order: 2 };

/** The whole system as it is: one main and one sub, both `distanceM` away, LR4 / LR4 at 80 Hz, no delays; `extra` adds or replaces fields. */
export const wholeSystem = (distanceM: number, extra: Json = {}) => ({
  temperatureC: 20,
  crossoverHz: 80,
  mainsHighpass: LR4,
  subLowpass: LR4,
  mains: { name: 'L', distanceM },
  subs: [{ name: 'Sub', distanceM }],
  ...extra,
});
