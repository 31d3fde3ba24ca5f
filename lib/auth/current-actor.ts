import 'server-only';
import { headers } from 'next/headers';
import { readSessionUser } from './read-session';
import { clientIpFrom } from './client-ip';
import type { Actor } from './operation';

/** The signed-in person of the current request, as the operations see them; null when signed out. */
export async function currentActor(): Promise<Actor | null> {
  return readSessionUser();
}

export async function currentClientIp(): Promise<string | null> {
  return clientIpFrom(await headers());
}
