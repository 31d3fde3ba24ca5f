import 'server-only';
import { redirect } from 'next/navigation';
import { auth } from './config';

/** The signed-in user for a page, or a redirect to sign-in. Pages still check permissions themselves. */
export async function requirePageSession() {
  const session = await auth();
  if (!session?.user?.id) redirect('/sign-in');
  return session.user;
}
