/**
 * Signs in as the seeded demo owner through next-auth's credentials flow, the way a browser does, and returns the
 * Cookie header to send with later requests (the CSRF cookie and the session cookie). For scripts that drive a
 * running app over HTTP (bench:load, test:fault).
 */
export async function demoSessionCookie(base: string): Promise<string> {
  const csrfRes = await fetch(`${base}/api/auth/csrf`);
  const cookie = csrfRes.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
  const { csrfToken } = (await csrfRes.json()) as { csrfToken: string };
  const res = await fetch(`${base}/api/auth/callback/credentials`, {
    method: 'POST',
    redirect: 'manual',
    headers: { 'Content-Type': 'application/x-www-form-urlencoded', Cookie: cookie },
    body: new URLSearchParams({ csrfToken, email: 'demo@seamline.test', password: 'seamline-demo', json: 'true' }),
  });
  const session = res.headers.getSetCookie().map((c) => c.split(';')[0]).find((c) => c?.includes('session-token'));
  if (!session) throw new Error('could not sign in as the demo owner');
  return `${cookie}; ${session}`;
}
