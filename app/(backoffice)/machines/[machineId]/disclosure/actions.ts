'use server';

import { revalidatePath } from 'next/cache';
import { runAsCurrentUser } from '@/lib/auth/adapters';
import { saveMachineDisclosure } from '@/lib/workflow/machine-disclosure';

export async function saveDisclosureAction(input: unknown) {
  const result = await runAsCurrentUser(saveMachineDisclosure, input);
  if (result.ok) revalidatePath(`/machines/${result.data.machineId}`);
  return result;
}
