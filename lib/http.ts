import { NextResponse } from 'next/server';
import type { z } from 'zod';
import { consumeApiLimit } from './api-limits';
import { getCaller } from './auth';
import { errorBody, fromZod, invalid, tooLarge, toAppError, unsupportedMedia } from './errors';

/** Largest request bodies the JSON routes read, in bytes; a larger body is answered 413 before it is parsed. */
export const BODY_LIMIT_BYTES = {
  /** Compute requests, System documents and Lesson Steps: the default of `parseJson`. */
  standard: 256 * 1024,
  /** Small forms: names, e-mail addresses, roles, revisions. */
  form: 16 * 1024,
  /** A Speaker profile. */
  profile: 32 * 1024,
  /** A Lesson's new Step order (up to 200 ids). */
  stepOrder: 32 * 1024,
  /** POST /api/v1/measured/predict: two measured curves inline, up to 20 000 points each. */
  measuredCurves: 2 * 1024 * 1024,
} as const;

/**
 * A JSON answer. The web `Response.json` (the same serialisation, the same `content-type: application/json`):
 * `NextResponse.json` builds that Response and then wraps its body stream in a second one with a cookie jar,
 * about 0.1 ms more per answer, and nothing here sets cookies.
 */
export function json(data: unknown, status = 200, headers: Record<string, string> = {}) {
  return Response.json(data, { status, headers: { 'Cache-Control': 'no-store', ...headers } });
}

export function errorResponse(error: unknown) {
  const e = toAppError(error);
  const headers: Record<string, string> = { 'Cache-Control': 'no-store' };
  if (e.status === 429 && typeof e.extra.retryAfterS === 'number') headers['Retry-After'] = String(Math.ceil(e.extra.retryAfterS));
  if (e.status === 503) headers['Retry-After'] = '5';
  return NextResponse.json(errorBody(e), { status: e.status, headers });
}

/**
 * Reads at most `limitBytes` of the body, throwing `tooLargeError()` (by default the API's 413) as soon as the declared
 * or the received size passes the limit, without buffering the rest.
 */
export async function readBodyBytes(request: Request, limitBytes: number, tooLargeError: () => Error = () => tooLarge(limitBytes)): Promise<Uint8Array> {
  const declared = Number(request.headers.get('content-length') ?? NaN);
  if (Number.isFinite(declared) && declared > limitBytes) throw tooLargeError();
  if (!request.body) return new Uint8Array();
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > limitBytes) {
      await reader.cancel().catch(() => {});
      throw tooLargeError();
    }
    chunks.push(value);
  }
  const out = new Uint8Array(size);
  let at = 0;
  for (const c of chunks) {
    out.set(c, at);
    at += c.byteLength;
  }
  return out;
}

/** Reads at most `limitBytes` of the body as text, answering 413 beyond (without buffering it all). */
export async function readBodyText(request: Request, limitBytes: number = BODY_LIMIT_BYTES.standard): Promise<string> {
  return new TextDecoder('utf-8', { fatal: false }).decode(await readBodyBytes(request, limitBytes));
}

/** Parses a JSON body against a zod schema: 415 for other media types, 413 when too large, 400 otherwise. */
export async function parseJson<S extends z.ZodType>(request: Request, schema: S, limitBytes: number = BODY_LIMIT_BYTES.standard): Promise<z.infer<S>> {
  const type = request.headers.get('content-type') ?? '';
  if (!/^application\/(.+\+)?json\b/i.test(type)) throw unsupportedMedia('application/json');
  const text = await readBodyText(request, limitBytes);
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch {
    throw invalid('The body is not valid JSON.', [{ path: '(body)', message: 'not valid JSON' }]);
  }
  const parsed = schema.safeParse(raw);
  if (!parsed.success) throw fromZod(parsed.error);
  return parsed.data;
}

/** Parses URL search parameters against a zod schema (400 with the parameter named). */
export function parseQuery<S extends z.ZodType>(request: Request, schema: S): z.infer<S> {
  const params = Object.fromEntries(new URL(request.url).searchParams.entries());
  const parsed = schema.safeParse(params);
  if (!parsed.success) throw fromZod(parsed.error, '(query)');
  return parsed.data;
}

type Handler<C> = (request: Request, context: C) => Promise<Response>;

/**
 * Wraps a route handler so every thrown error becomes the one JSON error answer (`lib/errors.ts`, the API page
 * /docs/api), after counting the request against its caller's limit (`lib/api-limits.ts`: 429 over it) and, when it
 * carries `Authorization`, checking the token (401 when refused) even on routes that need no caller.
 */
export function route<C = unknown>(handler: Handler<C>): Handler<C> {
  return async (request, context) => {
    try {
      await consumeApiLimit(request);
      if (request.headers.has('authorization')) await getCaller();
      return await handler(request, context);
    } catch (error) {
      return errorResponse(error);
    }
  };
}
