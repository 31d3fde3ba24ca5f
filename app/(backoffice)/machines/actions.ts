'use server';

import { revalidatePath } from 'next/cache';
import { runAsCurrentUser } from '@/lib/auth/adapters';
import { cancelInspection, requestInspection } from '@/lib/workflow/inspections';
import { setListingStatus } from '@/lib/workflow/listing-status';
import { createMachine, updateMachine } from '@/lib/workflow/machines';

export async function createMachineAction(input: unknown) {
  const result = await runAsCurrentUser(createMachine, input);
  if (result.ok) revalidatePath('/machines');
  return result;
}

export async function updateMachineAction(input: unknown) {
  const result = await runAsCurrentUser(updateMachine, input);
  if (result.ok) revalidatePath(`/machines/${result.data.machineId}`);
  return result;
}

export async function requestInspectionAction(input: unknown) {
  const result = await runAsCurrentUser(requestInspection, input);
  if (result.ok) revalidatePath('/machines');
  return result;
}

export async function cancelInspectionAction(input: unknown) {
  const result = await runAsCurrentUser(cancelInspection, input);
  if (result.ok) revalidatePath('/machines');
  return result;
}

export async function setListingStatusAction(input: unknown) {
  const result = await runAsCurrentUser(setListingStatus, input);
  if (result.ok) revalidatePath(`/machines/${result.data.machineId}`);
  return result;
}
