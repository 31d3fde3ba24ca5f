'use server';

import { revalidatePath } from 'next/cache';
import { runAsCurrentUser } from '@/lib/auth/adapters';
import { addInclusion, removeInclusion } from '@/lib/workflow/inclusions';

export async function addInclusionAction(input: unknown) {
  const result = await runAsCurrentUser(addInclusion, input);
  if (result.ok) revalidatePath(`/machines/${result.data.machineId}/inclusions`);
  return result;
}

export async function removeInclusionAction(input: unknown) {
  const result = await runAsCurrentUser(removeInclusion, input);
  if (result.ok) revalidatePath(`/machines/${result.data.machineId}/inclusions`);
  return result;
}
