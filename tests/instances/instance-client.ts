// eslint-disable-next-line @typescript-eslint/no-explicit-any -- answers are checked field by field in the tests
type Json = any;

/**
 * One browser's cookie jar in front of several app instances (as behind a balancer): every request names the
 * instance it goes to, and carries whatever cookies any instance set before.
 */
export class Browser {
  private cookies = new Map<string, string>();

  private remember(res: Response) {
    for (const line of res.headers.getSetCookie()) {
      const [pair = ''] = line.split(';');
      const i = pair.indexOf('=');
      const name = pair.slice(0, i).trim();
      const value = pair.slice(i + 1).trim();
      if (value === '' || /expires=Thu, 01 Jan 1970/i.test(line)) this.cookies.delete(name);
      else this.cookies.set(name, value);
    }
  }

  async request(base: string, method: string, path: string, body?: unknown, headers: Record<string, string> = {}): Promise<{ status: number; body: Json; headers: Headers; text: string }> {
    const isForm = body instanceof URLSearchParams;
    const res = await fetch(`${base}${path}`, {
      method,
      redirect: 'manual',
      headers: {
        ...(body !== undefined && !isForm ? { 'Content-Type': 'application/json' } : {}),
        ...(this.cookies.size ? { Cookie: [...this.cookies].map(([k, v]) => `${k}=${v}`).join('; ') } : {}),
        ...headers,
      },
      body: body === undefined ? undefined : isForm ? body : JSON.stringify(body),
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

  /**
   * Signs in through next-auth's credentials flow on the instance at `base`, from the client address `address`
   * (X-Forwarded-For); returns the error text next-auth gave, or null.
   */
  async signIn(base: string, email: string, password: string, address: string): Promise<string | null> {
    const csrf = await this.request(base, 'GET', '/api/auth/csrf');
    const form = new URLSearchParams({ csrfToken: csrf.body.csrfToken, email, password, json: 'true', callbackUrl: '/library' });
    const res = await this.request(base, 'POST', '/api/auth/callback/credentials', form, {
      'Content-Type': 'application/x-www-form-urlencoded',
      'X-Forwarded-For': address,
    });
    const location = res.headers.get('location') ?? (res.body?.url as string | undefined) ?? '';
    return new URL(location, base).searchParams.get('error');
  }

  get signedIn() {
    return [...this.cookies.keys()].some((k) => k.includes('next-auth.session-token'));
  }
}
