import { createHash } from 'node:crypto';
import { RateLimiterMemory, RateLimiterPostgres, RLWrapperBlackAndWhite, type RateLimiterLike } from 'rate-limiter-flexible';
import { db } from './db';
import { rateLimited } from './errors';
import { clientAddress } from './client-address';

/**
 * Request limits of the API, per caller: a personal access token is one caller (keyed by its hash, so even a
 * refused token is counted), anyone else is counted by client address. Counted in PostgreSQL (table `rate_limits`,
 * as failed sign-ins are) so the limits hold across app instances. Two budgets: the compute routes, and everything
 * else under /api/v1 (the Library). Over the limit: 429 with Retry-After (the error shape of /docs/api).
 */
export type LimitClass = 'compute' | 'library';

export interface ApiLimits {
  /** Requests a minute per caller on the compute routes. */
  computePerMinute: number;
  /** Requests a minute per caller on every other /api/v1 route. */
  libraryPerMinute: number;
  /** Client addresses never limited by address (a token is still limited); e.g. a monitoring host. */
  exemptAddresses: string[];
}

/** The defaults `.env.example` documents. */
export const DEFAULT_API_LIMITS: ApiLimits = { computePerMinute: 1200, libraryPerMinute: 600, exemptAddresses: [] };

function positive(raw: string | undefined, fallback: number, name: string): number {
  if (raw === undefined || raw === '') return fallback;
  const n = Number(raw);
  if (!Number.isInteger(n) || n < 1) throw new Error(`${name} must be a whole number of requests a minute (1 or more), got "${raw}"`);
  return n;
}

export function readApiLimits(env: NodeJS.ProcessEnv = process.env): ApiLimits {
  return {
    computePerMinute: positive(env.SEAMLINE_LIMIT_COMPUTE_PER_MIN, DEFAULT_API_LIMITS.computePerMinute, 'SEAMLINE_LIMIT_COMPUTE_PER_MIN'),
    libraryPerMinute: positive(env.SEAMLINE_LIMIT_LIBRARY_PER_MIN, DEFAULT_API_LIMITS.libraryPerMinute, 'SEAMLINE_LIMIT_LIBRARY_PER_MIN'),
    exemptAddresses: (env.SEAMLINE_LIMIT_EXEMPT ?? '')
      .split(',')
      .map((a) => a.trim())
      .filter(Boolean),
  };
}

/** The POST routes that compute (no stored data); everything else under /api/v1 counts as the Library. */
const COMPUTE_PATHS = new Set(
  ['blend', 'crossover-sweep', 'timing', 'room-modes', 'room-response', 'layout', 'headroom', 'seat-balance', 'processor-filters', 'eq-design', 'measured/predict', 'measured/extension', 'measured/compare'].map(
    (p) => `/api/v1/${p}`,
  ),
);

export function limitClassOf(pathname: string): LimitClass {
  return COMPUTE_PATHS.has(pathname.replace(/\/$/, '')) ? 'compute' : 'library';
}

interface Limiters {
  byToken: Record<LimitClass, RateLimiterLike>;
  byAddress: Record<LimitClass, RateLimiterLike>;
  limits: ApiLimits;
}

const globalForLimits = globalThis as unknown as { seamlineApiLimiters?: Limiters };

function limiters(): Limiters {
  if (!globalForLimits.seamlineApiLimiters) {
    const limits = readApiLimits();
    const common = { storeClient: db(), storeType: 'sequelize', tableName: 'rate_limits', tableCreated: true, duration: 60 };
    // While PostgreSQL is away the count goes on in this process's memory (the compute routes keep answering).
    const make = (prefix: string, points: number) =>
      new RateLimiterPostgres({ ...common, keyPrefix: prefix, points, inMemoryBlockOnConsumed: points, insuranceLimiter: new RateLimiterMemory({ keyPrefix: prefix, points, duration: 60 }) });
    const byAddress = (prefix: string, points: number) => new RLWrapperBlackAndWhite({ limiter: make(prefix, points), whiteList: limits.exemptAddresses });
    globalForLimits.seamlineApiLimiters = {
      limits,
      byToken: { compute: make('api-token-compute', limits.computePerMinute), library: make('api-token-library', limits.libraryPerMinute) },
      byAddress: { compute: byAddress('api-addr-compute', limits.computePerMinute), library: byAddress('api-addr-library', limits.libraryPerMinute) },
    };
  }
  return globalForLimits.seamlineApiLimiters;
}

/** The client's address as the trusted proxies report it (lib/client-address.ts; the same rule as the sign-in limits). */
export function clientAddressOf(headers: Headers): string {
  return clientAddress(headers.get('x-forwarded-for'), headers.get('x-real-ip'));
}

/** A bearer secret's bucket: part of its SHA-256, never the secret (nothing that could be used is stored or logged). */
function tokenKey(secret: string): string {
  return createHash('sha256').update(secret, 'utf8').digest('hex').slice(0, 32);
}

/** Counts one request of this caller; throws the 429 AppError (with its Retry-After) when over the limit. */
export async function consumeApiLimit(request: Request): Promise<void> {
  const { pathname } = new URL(request.url);
  const kind = limitClassOf(pathname);
  const { byToken, byAddress, limits } = limiters();
  const bearer = /^Bearer\s+(\S+)\s*$/i.exec(request.headers.get('authorization') ?? '')?.[1];
  const [limiter, key] = bearer ? [byToken[kind], tokenKey(bearer)] : [byAddress[kind], clientAddressOf(request.headers)];
  try {
    await limiter.consume(key);
  } catch (rejection) {
    if (rejection instanceof Error) throw rejection;
    const waitS = Math.max(1, Math.ceil(((rejection as { msBeforeNext?: number }).msBeforeNext ?? 1000) / 1000));
    const perMinute = kind === 'compute' ? limits.computePerMinute : limits.libraryPerMinute;
    throw rateLimited(`Too many requests: at most ${perMinute} a minute ${bearer ? 'per access token' : 'per address'} on the ${kind === 'compute' ? 'compute' : 'Library'} routes. Try again in ${waitS} s.`, waitS);
  }
}
