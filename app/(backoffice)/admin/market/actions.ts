'use server';

import { revalidatePath } from 'next/cache';
import { runAsCurrentUser } from '@/lib/auth/adapters';
import { importComparableSales, recordComparableSale } from '@/lib/market/comparable-sale-operations';

export async function recordComparableSaleAction(input: unknown) {
  const result = await runAsCurrentUser(recordComparableSale, input);
  if (result.ok) revalidatePath('/admin/market');
  return result;
}

export async function importComparableSalesAction(input: unknown) {
  const result = await runAsCurrentUser(importComparableSales, input);
  if (result.ok) revalidatePath('/admin/market');
  return result;
}
