import 'server-only';
import { notFound, redirect } from 'next/navigation';
import { can, type Permission } from '@/lib/roles';
import { readSessionUser } from './read-session';

/** The signed-in user for a page, or a redirect to sign-in. Pages still check permissions themselves. */
export async function requirePageSession() {
  const user = await readSessionUser();
  if (!user) redirect('/sign-in');
  return user;
}

/** The signed-in user if their role has the permission; anyone else sees "not found". */
export async function requirePagePermission(permission: Permission) {
  const user = await requirePageSession();
  if (!can(user.role, permission)) notFound();
  return user;
}
