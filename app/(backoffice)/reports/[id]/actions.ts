'use server';

import { redirect } from 'next/navigation';
import { runAsCurrentUser } from '@/lib/auth/adapters';
import { startCheckout } from '@/lib/payments/start-checkout';

export type BuyState = { message?: string };

/** Opens the provider's checkout page for this report, or says why it cannot be bought. */
export async function buyReportAction(_previous: BuyState, formData: FormData): Promise<BuyState> {
  const result = await runAsCurrentUser(startCheckout, { reportId: formData.get('reportId') });
  if (!result.ok) return { message: result.message };
  redirect(result.data.checkoutUrl);
}
