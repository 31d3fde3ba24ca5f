import type { Role } from '@/lib/roles';

declare module 'next-auth' {
  interface User {
    role: Role;
    sessionVersion: number;
  }
  interface Session {
    user: { id: string; role: Role; name?: string | null; email?: string | null };
  }
}

declare module '@auth/core/jwt' {
  interface JWT {
    role?: Role;
    sessionVersion?: number;
  }
}
