import type { NextAuthOptions, Session } from 'next-auth';
import { getServerSession } from 'next-auth';
import { headers } from 'next/headers';
import CredentialsProvider from 'next-auth/providers/credentials';
import type { Caller } from './access';
import { callerForAccessToken } from './data/access-tokens';
import { findSessionUser, findUserByEmail } from './data/users';
import { AppError, unauthorized } from './errors';
import { DUMMY_HASH, verifyPassword } from './passwords';
import { assertSignInAllowed, clearFailedSignIns, recordFailedSignIn } from './rate-limit';
import { safeReturnPath } from './return-path';
import { signInSchema } from './validations/auth';
import { clientAddress } from './client-address';

declare module 'next-auth' {
  interface Session {
    user: { id: string; email: string; name: string; siteRole: 'admin' | 'member' };
  }
  interface User {
    id: string;
    siteRole: 'admin' | 'member';
  }
}
declare module 'next-auth/jwt' {
  interface JWT {
    uid?: string;
    siteRole?: 'admin' | 'member';
  }
}

/** The sign-in limits' client address: the same rule as the API limits (lib/client-address.ts). */
function clientAddressOfSignIn(headers: Record<string, unknown> | undefined): string {
  const text = (name: string) => (typeof headers?.[name] === 'string' ? (headers[name] as string) : null);
  return clientAddress(text('x-forwarded-for'), text('x-real-ip'));
}

/** Thrown by the jwt callback for a cookie whose account no longer exists: next-auth then clears the cookie. */
class AccountGoneError extends Error {
  constructor() {
    super('The account of this session no longer exists.');
    this.name = 'AccountGoneError';
  }
}

export const authOptions: NextAuthOptions = {
  logger: {
    // A deleted account's cookie is an expected end of a session, not an error worth a stack trace in the log.
    error(code, metadata) {
      const error = metadata instanceof Error ? metadata : (metadata as { error?: unknown } | undefined)?.error;
      if (error instanceof AccountGoneError) return;
      console.error(`[next-auth][error][${code}]`, metadata);
    },
  },
  session: { strategy: 'jwt', maxAge: 30 * 24 * 3600 },
  pages: { signIn: '/sign-in' },
  providers: [
    CredentialsProvider({
      name: 'E-mail and password',
      credentials: { email: { label: 'E-mail', type: 'email' }, password: { label: 'Password', type: 'password' } },
      async authorize(credentials, req) {
        const parsed = signInSchema.safeParse(credentials ?? {});
        if (!parsed.success) throw new Error('Enter your e-mail and password.');
        const { email, password } = parsed.data;
        const address = clientAddressOfSignIn(req?.headers as Record<string, unknown> | undefined);
        try {
          await assertSignInAllowed(email, address);
        } catch (e) {
          if (e instanceof AppError) throw new Error(e.message);
          throw new Error('Sign-in is not available right now. Try again in a few seconds.');
        }
        const user = await findUserByEmail(email);
        const ok = await verifyPassword(password, user?.passwordHash ?? DUMMY_HASH);
        if (!user || !ok) {
          await recordFailedSignIn(email, address);
          throw new Error('That e-mail and password do not match an account.');
        }
        await clearFailedSignIns(email);
        return { id: user.id, email: user.email, name: user.name, siteRole: user.siteRole };
      },
    }),
  ],
  callbacks: {
    /** Only ever back to this site: a callbackUrl on another origin (or a `//host` path) goes to the home page. */
    async redirect({ url, baseUrl }) {
      return `${baseUrl}${safeReturnPath(url, '/', baseUrl)}`;
    },
    /**
     * At sign-in the account goes into the cookie; on every later read (the browser's /api/auth/session, a page's
     * getServerSession) the account is looked up again: a deleted account's cookie is cleared and reads as signed out,
     * and a changed name or site role shows at once. While the database cannot answer the cookie stands as it is (an
     * outage must not sign everyone out; whatever needs the database answers 503 meanwhile).
     */
    async jwt({ token, user }) {
      if (user) {
        token.uid = user.id;
        token.siteRole = user.siteRole;
        return token;
      }
      let stored: Awaited<ReturnType<typeof findSessionUser>> | undefined;
      try {
        stored = await findSessionUser(token.uid ?? '');
      } catch {
        return token;
      }
      if (!stored) throw new AccountGoneError();
      token.name = stored.name;
      token.email = stored.email;
      token.siteRole = stored.siteRole;
      return token;
    },
    async session({ session, token }) {
      session.user = {
        id: token.uid ?? '',
        email: token.email ?? '',
        name: token.name ?? '',
        siteRole: token.siteRole ?? 'member',
      };
      return session;
    },
  },
};

export async function getSession(): Promise<Session | null> {
  const session = await getServerSession(authOptions);
  return session?.user?.id ? session : null;
}

/**
 * The caller of a browser session (pages), or null. Bearer tokens are for the API only. The account was looked up
 * afresh by the jwt callback while reading the session (never on a compute route that needs no caller), so a deleted
 * account's cookie reads as no session at once, and the name and site role are the stored ones, not the ones signed
 * into the cookie. While the database cannot answer, the cookie's own account stands (whatever needs the database
 * answers 503 meanwhile).
 */
export async function getSessionCaller(): Promise<(Caller & { email: string; name: string }) | null> {
  const session = await getSession();
  if (!session) return null;
  const { id, siteRole, email, name } = session.user;
  return { id, siteRole, email, name };
}

/** One answer for every token that is not accepted, so a caller cannot tell a mistyped token from a revoked one. */
const TOKEN_REFUSED = 'The access token was not accepted: it may be mistyped, revoked or expired. Make a new one on the Account page.';

/**
 * The API's caller: `Authorization: Bearer <personal access token>` when the request carries that header (any
 * other or a refused token: 401), else the signed-in session, else null.
 */
export async function getCaller(): Promise<(Caller & { email: string; name: string }) | null> {
  const authorization = (await headers()).get('authorization');
  if (authorization === null) return getSessionCaller();
  const match = /^Bearer\s+(\S+)\s*$/i.exec(authorization);
  const caller = match ? await callerForAccessToken(match[1] as string) : null;
  if (!caller) throw unauthorized(TOKEN_REFUSED);
  return caller;
}

export async function requireCaller(): Promise<Caller & { email: string; name: string }> {
  const caller = await getCaller();
  if (!caller) throw unauthorized();
  return caller;
}
