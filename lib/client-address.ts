/**
 * The client's address, for the sign-in and API limits. A route handler cannot see the socket: Next's server writes the
 * socket's address into X-Forwarded-For only when a request arrives without that header, so the header is the one
 * source — and every entry left of those the proxies added is whatever the client chose to send. Each reverse proxy in
 * front of Seamline appends the address it saw (or replaces the header with it), so the client is the entry
 * `SEAMLINE_TRUSTED_PROXIES` places from the right (default 1: one proxy; with none, the one entry Next wrote).
 */

/** The default number of reverse proxies in front of Seamline that add to X-Forwarded-For. */
const DEFAULT_TRUSTED_PROXIES = 1;

/** `SEAMLINE_TRUSTED_PROXIES`: a whole number 1–10; anything else stops the server with the variable named. */
export function readTrustedProxies(env: Record<string, string | undefined> = process.env): number {
  const raw = env.SEAMLINE_TRUSTED_PROXIES;
  if (raw === undefined || raw.trim() === '') return DEFAULT_TRUSTED_PROXIES;
  const n = Number(raw);
  if (!Number.isInteger(n) || n < 1 || n > 10) throw new Error(`SEAMLINE_TRUSTED_PROXIES must be a whole number of proxies, 1–10, got "${raw}"`);
  return n;
}

/**
 * The address `trustedProxies` places from the right of an X-Forwarded-For value (the leftmost when it holds fewer),
 * else X-Real-IP, else "unknown". `clientAddress('203.0.113.9, 198.51.100.7', null, 1)` → '198.51.100.7'.
 */
export function clientAddress(forwardedFor: string | null | undefined, realIp: string | null | undefined, trustedProxies: number = readTrustedProxies()): string {
  const entries = (forwardedFor ?? '')
    .split(',')
    .map((e) => e.trim())
    .filter(Boolean);
  if (entries.length) return entries[Math.max(0, entries.length - trustedProxies)]!;
  return realIp?.trim() || 'unknown';
}
