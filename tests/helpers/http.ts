import { baseUrl } from './env';

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- answers are checked field by field in the tests
type Json = any;

/** A tiny HTTP client with a cookie jar, for calling the running app as a browser would. */
export class Client {
  private cookies = new Map<string, string>();

  /** `headers` go with every request (e.g. `{ Authorization: 'Bearer slp_…' }` for a program with a token). */
  constructor(private readonly defaultHeaders: Record<string, string> = {}) {}

  private cookieHeader() {
    return [...this.cookies.entries()].map(([k, v]) => `${k}=${v}`).join('; ');
  }

  private remember(res: Response) {
    for (const line of res.headers.getSetCookie()) {
      const [pair] = line.split(';');
      const i = pair!.indexOf('=');
      const name = pair!.slice(0, i).trim();
      const value = pair!.slice(i + 1).trim();
      if (value === '' || /expires=Thu, 01 Jan 1970/i.test(line)) this.cookies.delete(name);
      else this.cookies.set(name, value);
    }
  }

  request(method: string, path: string, body?: unknown, headers: Record<string, string> = {}) {
    return this.requestAt(baseUrl(), method, path, body, headers);
  }

  /** A request to the app at `base` (one of several instances, as behind a balancer), with this client's cookies. */
  async requestAt(base: string, method: string, path: string, body?: unknown, headers: Record<string, string> = {}): Promise<{ status: number; body: Json; headers: Headers; text: string }> {
    const isForm = body instanceof URLSearchParams || body instanceof FormData;
    const res = await fetch(`${base}${path}`, {
      method,
      redirect: 'manual',
      headers: {
        ...(body !== undefined && !isForm && typeof body !== 'string' ? { 'Content-Type': 'application/json' } : {}),
        ...(this.cookies.size ? { Cookie: this.cookieHeader() } : {}),
        ...this.defaultHeaders,
        ...headers,
      },
      body: body === undefined ? undefined : isForm || typeof body === 'string' ? (body as BodyInit) : JSON.stringify(body),
    });
    this.remember(res);
    const text = await res.text();
    let parsed: unknown = null;
    try {
      parsed = text ? JSON.parse(text) : null;
    } catch {
      parsed = null;
    }
    return { status: res.status, body: parsed, headers: res.headers, text };
  }

  get(path: string) {
    return this.request('GET', path);
  }
  post(path: string, body?: unknown, headers?: Record<string, string>) {
    return this.request('POST', path, body, headers);
  }
  put(path: string, body?: unknown) {
    return this.request('PUT', path, body);
  }
  patch(path: string, body?: unknown) {
    return this.request('PATCH', path, body);
  }
  delete(path: string) {
    return this.request('DELETE', path);
  }

  /** Signs in through next-auth's credentials flow; returns the error text next-auth gave, or null. */
  signIn(email: string, password: string, address?: string): Promise<string | null> {
    return this.signInAt(baseUrl(), email, password, address);
  }

  /** Signs in on the app at `base`, from the client address `address` (X-Forwarded-For) when given. */
  async signInAt(base: string, email: string, password: string, address?: string): Promise<string | null> {
    const csrf = await this.requestAt(base, 'GET', '/api/auth/csrf');
    const form = new URLSearchParams({ csrfToken: csrf.body.csrfToken, email, password, json: 'true', callbackUrl: '/library' });
    const res = await this.requestAt(base, 'POST', '/api/auth/callback/credentials', form, {
      'Content-Type': 'application/x-www-form-urlencoded',
      ...(address ? { 'X-Forwarded-For': address } : {}),
    });
    const location = res.headers.get('location') ?? (res.body?.url as string | undefined) ?? '';
    return new URL(location, base).searchParams.get('error');
  }

  get signedIn() {
    return [...this.cookies.keys()].some((k) => k.includes('next-auth.session-token'));
  }
}

export async function signedInClient(email: string, password = 'seamline-demo'): Promise<Client> {
  const c = new Client();
  const error = await c.signIn(email, password);
  if (error || !c.signedIn) throw new Error(`could not sign in as ${email}: ${error ?? 'no session cookie'}`);
  return c;
}

export const uniqueEmail = (prefix: string) => `${prefix}-${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 7)}@example.test`;

/** A signed-in session's Cookie header, for plain fetch calls (bytes, multipart bodies) that the Client does not send. */
export async function sessionCookie(email: string, password: string): Promise<string> {
  const jar = new Map<string, string>();
  const keep = (res: Response) => {
    for (const line of res.headers.getSetCookie()) {
      const [pair] = line.split(';');
      const i = pair!.indexOf('=');
      jar.set(pair!.slice(0, i).trim(), pair!.slice(i + 1).trim());
    }
  };
  const header = () => [...jar.entries()].map(([k, v]) => `${k}=${v}`).join('; ');
  const csrf = await fetch(`${baseUrl()}/api/auth/csrf`);
  keep(csrf);
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  const res = await fetch(`${baseUrl()}/api/auth/callback/credentials`, {
    method: 'POST',
    redirect: 'manual',
    headers: { 'Content-Type': 'application/x-www-form-urlencoded', Cookie: header() },
    body: new URLSearchParams({ csrfToken, email, password, json: 'true', callbackUrl: '/library' }),
  });
  keep(res);
  if (![...jar.keys()].some((k) => k.includes('session-token'))) throw new Error(`could not sign in as ${email}`);
  return header();
}
