'use server';

import { revalidatePath } from 'next/cache';
import { runAsCurrentUser } from '@/lib/auth/adapters';
import { setInspectionFee } from '@/lib/payments/set-inspection-fee';

export type FeeFormState = { message?: string; saved?: boolean; amount?: string };

export async function saveFeeAction(_previous: FeeFormState, formData: FormData): Promise<FeeFormState> {
  const amount = String(formData.get('amount') ?? '');
  const result = await runAsCurrentUser(setInspectionFee, { sizeClass: formData.get('sizeClass'), amount });
  if (!result.ok) return { message: result.fieldErrors?.amount?.[0] ?? result.fieldErrors?.sizeClass?.[0] ?? result.message, amount };
  revalidatePath('/admin/fees');
  return { saved: true, amount };
}
