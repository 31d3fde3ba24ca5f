import NextAuth, { CredentialsSignin, type NextAuthConfig } from 'next-auth';
import Credentials from 'next-auth/providers/credentials';
import { env } from '@/lib/env';
import { toAppError } from '@/lib/errors';
import type { Role } from '@/lib/roles';
import { authenticate, type SignInRefusal } from './credentials';
import { clientIpFrom } from './client-ip';
import { rememberDevice } from './known-device-cookie';
import { findActiveAccount, usesSecureCookies } from './read-session';
import { redirectWithinSite } from './safe-callback-path';

/** Carries why sign-in was refused to the sign-in action, which words it for the person. */
class SignInRefused extends CredentialsSignin {
  constructor(reason: SignInRefusal) {
    super();
    this.code = reason;
  }
}

const config = (): NextAuthConfig => ({
  secret: env().AUTH_SECRET,
  trustHost: true,
  useSecureCookies: usesSecureCookies(),
  session: { strategy: 'jwt', maxAge: 60 * 60 * 12 },
  pages: { signIn: '/sign-in' },
  logger: {
    // A refused sign-in is an expected answer (and is in the audit log), not a server error.
    error(error) {
      if (error instanceof CredentialsSignin) return;
      console.error(error);
    },
  },
  providers: [
    Credentials({
      credentials: { email: { label: 'E-mail' }, password: { label: 'Password', type: 'password' } },
      async authorize(raw, request) {
        const result = await authenticate(raw, { ip: clientIpFrom(request.headers) });
        if (!result.ok) throw new SignInRefused(result.reason);
        await rememberDevice(result.user.id);
        return result.user;
      },
    }),
  ],
  callbacks: {
    // Only addresses on this site are followed after signing in or out (no open redirect).
    redirect: redirectWithinSite,
    async jwt({ token, user }) {
      if (user) {
        token.sub = user.id;
        token.role = user.role;
        token.sessionVersion = user.sessionVersion;
        return token;
      }
      // Every use of the session re-checks the account: deactivation or a password change ends it.
      if (!token.sub) return null;
      let current;
      try {
        current = await findActiveAccount(token.sub);
      } catch (error) {
        // The database is down: keep the signed token as it is rather than signing the person out.
        // Every operation needs the database too, so it answers "unavailable" (503), not "sign in".
        if (toAppError(error).code === 'unavailable') return token;
        throw error;
      }
      if (!current || current.sessionVersion !== token.sessionVersion) return null;
      token.role = current.role;
      token.name = current.name;
      return token;
    },
    session({ session, token }) {
      session.user.id = token.sub ?? '';
      session.user.role = token.role as Role;
      return session;
    },
  },
});

// Configured lazily so that building the app does not need the environment of a running one.
export const { handlers, auth, signIn, signOut } = NextAuth(() => config());
