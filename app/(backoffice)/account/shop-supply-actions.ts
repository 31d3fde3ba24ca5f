'use server';

import { revalidatePath } from 'next/cache';
import { runAsCurrentUser } from '@/lib/auth/adapters';
import { saveShopSupply } from '@/lib/workflow/shop-supply';

export async function saveShopSupplyAction(input: unknown) {
  const result = await runAsCurrentUser(saveShopSupply, input);
  if (result.ok) revalidatePath('/account');
  return result;
}
