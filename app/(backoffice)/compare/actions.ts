'use server';

import { revalidatePath } from 'next/cache';
import { runAsCurrentUser } from '@/lib/auth/adapters';
import { addToShortlist, createShortlist, deleteShortlist, removeFromShortlist } from '@/lib/comparison/shortlist-operations';

export async function createShortlistAction(input: unknown) {
  const result = await runAsCurrentUser(createShortlist, input);
  if (result.ok) revalidatePath('/compare');
  return result;
}

export async function addToShortlistAction(input: unknown) {
  const result = await runAsCurrentUser(addToShortlist, input);
  if (result.ok) revalidatePath('/compare');
  return result;
}

export async function removeFromShortlistAction(input: unknown) {
  const result = await runAsCurrentUser(removeFromShortlist, input);
  if (result.ok) revalidatePath('/compare');
  return result;
}

export async function deleteShortlistAction(input: unknown) {
  const result = await runAsCurrentUser(deleteShortlist, input);
  if (result.ok) revalidatePath('/compare');
  return result;
}
