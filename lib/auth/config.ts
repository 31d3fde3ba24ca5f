import NextAuth, { CredentialsSignin, type NextAuthConfig } from 'next-auth';
import Credentials from 'next-auth/providers/credentials';
import { eq } from 'drizzle-orm';
import { z } from 'zod';
import { db } from '@/db/client';
import { users } from '@/db/schema';
import { env } from '@/lib/env';
import type { Role } from '@/lib/roles';
import { verifyPassword } from './password';

const credentialsSchema = z.object({
  email: z.string().trim().toLowerCase().pipe(z.email()),
  password: z.string().min(1).max(200),
});

class InvalidCredentials extends CredentialsSignin {
  code = 'invalid_credentials';
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
  session: { strategy: 'jwt', maxAge: 60 * 60 * 12 },
  pages: { signIn: '/sign-in' },
  providers: [
    Credentials({
      credentials: { email: { label: 'E-mail' }, password: { label: 'Password', type: 'password' } },
      async authorize(raw) {
        const parsed = credentialsSchema.safeParse(raw);
        if (!parsed.success) throw new InvalidCredentials();
        const [user] = await db.select().from(users).where(eq(users.email, parsed.data.email)).limit(1);
        const ok = await verifyPassword(parsed.data.password, user?.passwordHash);
        if (!user || !ok || user.deactivatedAt) throw new InvalidCredentials();
        return { id: user.id, name: user.name, email: user.email, role: user.role, sessionVersion: user.sessionVersion };
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
      const current = await findActiveUser(token.sub);
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
