/**
 * Where to go after signing in or up: only ever a path on this site (no open redirect). Used by the sign-in and
 * sign-up forms (the `callbackUrl` parameter) and by next-auth's redirect callback.
 */

/** Used to resolve relative paths when the real origin is not known (server rendering). Never navigated to. */
const PLACEHOLDER_ORIGIN = 'https://return-path.invalid';

/** Tab, newline and the other control characters, which URL parsers drop (so `/\t/evil.example` becomes `//evil.example`). */
const CONTROL = /[\u0000-\u001F\u007F]/;

/**
 * `raw` as a same-origin path (`/systems/new?s=…#x`), or `fallback`. A relative path must start with one `/`
 * (`//host`, `/\host`, `https:…`, `javascript:…` are refused). With `origin`, an absolute URL on that origin is
 * accepted too and returned as its path.
 */
export function safeReturnPath(raw: string | null | undefined, fallback = '/library', origin?: string): string {
  if (typeof raw !== 'string' || raw === '' || raw.length > 100_000 || CONTROL.test(raw) || raw.includes('\\')) return fallback;
  const base = origin ?? PLACEHOLDER_ORIGIN;
  let baseOrigin: string;
  let url: URL;
  try {
    baseOrigin = new URL(base).origin;
    url = new URL(raw, baseOrigin);
  } catch {
    return fallback;
  }
  if (url.origin !== baseOrigin) return fallback;
  const relative = raw.startsWith('/') && !raw.startsWith('//');
  if (!relative && !(origin && /^https?:\/\//i.test(raw))) return fallback;
  return `${url.pathname}${url.search}${url.hash}`;
}
