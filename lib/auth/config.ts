import NextAuth, { CredentialsSignin, type NextAuthConfig } from 'next-auth';
import Credentials from 'next-auth/providers/credentials';
import { eq } from 'drizzle-orm';
import { db } from '@/db/client';
import { users } from '@/db/schema';
import { env } from '@/lib/env';
import { toAppError } from '@/lib/errors';
import type { Role } from '@/lib/roles';
import { authenticate, type SignInRefusal } from './credentials';
import { clientIpFrom } from './client-ip';

/** Carries why sign-in was refused to the sign-in action, which words it for the person. */
class SignInRefused extends CredentialsSignin {
  constructor(reason: SignInRefusal) {
    super();
    this.code = reason;
  }
}

async function findActiveUser(id: string) {
  const [row] = await db
    .select({ id: users.id, role: users.role, sessionVersion: users.sessionVersion, deactivatedAt: users.deactivatedAt, name: users.name, email: users.email })
    .from(users)
    .where(eq(users.id, id))
    .limit(1);
  return row && !row.deactivatedAt ? row : null;
}

const config = (): NextAuthConfig => ({
  secret: env().AUTH_SECRET,
  trustHost: true,
  // __Secure- cookies need HTTPS; a local http:// address keeps plain names so it still works.
  useSecureCookies: env().NODE_ENV === 'production' && env().APP_URL.startsWith('https:'),
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
        return result.user;
      },
    }),
  ],
  callbacks: {
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
        current = await findActiveUser(token.sub);
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
