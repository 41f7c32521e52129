import { RateLimiterPostgres, RateLimiterRes } from 'rate-limiter-flexible';
import { db } from './db';
import { rateLimited } from './errors';

/**
 * Failed sign-ins, counted in PostgreSQL (table `rate_limits`) so the limit holds across app
 * instances: 5 failures per e-mail in 15 minutes, 30 per client address in 15 minutes.
 */
const WINDOW_S = 15 * 60;
/** Failed sign-ins one e-mail address may have in the window; the next attempt is refused, even with the right password. */
export const SIGN_IN_FAILURES_PER_EMAIL = 5;
const SIGN_IN_FAILURES_PER_ADDRESS = 30;
const globalForLimits = globalThis as unknown as { seamlineLimiters?: { byEmail: RateLimiterPostgres; byAddress: RateLimiterPostgres } };

function limiters() {
  if (!globalForLimits.seamlineLimiters) {
    const common = { storeClient: db(), storeType: 'sequelize', tableName: 'rate_limits', tableCreated: true, duration: WINDOW_S, blockDuration: WINDOW_S };
    globalForLimits.seamlineLimiters = {
      byEmail: new RateLimiterPostgres({ ...common, keyPrefix: 'signin-email', points: SIGN_IN_FAILURES_PER_EMAIL }),
      byAddress: new RateLimiterPostgres({ ...common, keyPrefix: 'signin-addr', points: SIGN_IN_FAILURES_PER_ADDRESS }),
    };
  }
  return globalForLimits.seamlineLimiters;
}

const message = (s: number) => `Too many failed sign-ins. Try again in ${Math.max(1, Math.ceil(s / 60))} minute(s), or reset your password.`;

/** Throws a 429 AppError when either key has used up its failures. */
export async function assertSignInAllowed(email: string, address: string): Promise<void> {
  const { byEmail, byAddress } = limiters();
  const [e, a] = await Promise.all([byEmail.get(email), byAddress.get(address)]);
  const blocked = [e && e.consumedPoints >= SIGN_IN_FAILURES_PER_EMAIL ? e : null, a && a.consumedPoints >= SIGN_IN_FAILURES_PER_ADDRESS ? a : null].filter(Boolean) as RateLimiterRes[];
  if (blocked.length) {
    const wait = Math.max(...blocked.map((r) => r.msBeforeNext / 1000));
    throw rateLimited(message(wait), wait);
  }
}

export async function recordFailedSignIn(email: string, address: string): Promise<void> {
  const { byEmail, byAddress } = limiters();
  await Promise.allSettled([byEmail.consume(email), byAddress.consume(address)]);
}

export async function clearFailedSignIns(email: string): Promise<void> {
  await limiters().byEmail.delete(email).catch(() => undefined);
}
