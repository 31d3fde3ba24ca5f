import 'server-only';
import { headers } from 'next/headers';
import { auth } from './config';
import { clientIpFrom } from './client-ip';
import type { Actor } from './operation';

/** The signed-in person of the current request, as the operations see them; null when signed out. */
export async function currentActor(): Promise<Actor | null> {
  const session = await auth();
  const user = session?.user;
  return user?.id ? { id: user.id, role: user.role, name: user.name, email: user.email } : null;
}

export async function currentClientIp(): Promise<string | null> {
  return clientIpFrom(await headers());
}
