'use server';

import { revalidatePath } from 'next/cache';
import { runAsCurrentUser } from '@/lib/auth/adapters';
import { saveMovingSheet } from '@/lib/workflow/moving-sheet';

export async function saveMovingSheetAction(input: unknown) {
  const result = await runAsCurrentUser(saveMovingSheet, input);
  if (result.ok) revalidatePath(`/machines/${result.data.machineId}`);
  return result;
}
