import 'server-only';
import { notFound } from 'next/navigation';
import { getMachine } from '@/db/queries/machines';
import { requirePageSession } from '@/lib/auth/session';

/** The machine of the URL if the signed-in seller owns it (coordinators see every machine). */
export async function loadOwnMachine(rawId: string) {
  const user = await requirePageSession();
  const id = Number(rawId);
  if (!Number.isInteger(id) || id <= 0) notFound();
  const machine = await getMachine(id);
  if (!machine || (user.role !== 'admin' && !(user.role === 'seller' && machine.sellerId === user.id))) notFound();
  return { user, machine };
}
