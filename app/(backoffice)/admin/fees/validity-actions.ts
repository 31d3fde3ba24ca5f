'use server';

import { revalidatePath } from 'next/cache';
import { runAsCurrentUser } from '@/lib/auth/adapters';
import { setReportValidity } from '@/lib/workflow/report-validity';

export async function setReportValidityAction(input: unknown) {
  const result = await runAsCurrentUser(setReportValidity, input);
  if (result.ok) revalidatePath('/admin/fees');
  return result;
}
