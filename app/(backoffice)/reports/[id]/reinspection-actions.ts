'use server';

import { redirect } from 'next/navigation';
import { runAsCurrentUser } from '@/lib/auth/adapters';
import { startReinspectionCheckout } from '@/lib/reinspection/start-reinspection-checkout';

export type ReinspectionRequestState = { message?: string };

/** Opens the provider's checkout page for a re-inspection of this report's machine, or says why not. */
export async function requestReinspectionAction(_previous: ReinspectionRequestState, formData: FormData): Promise<ReinspectionRequestState> {
  const result = await runAsCurrentUser(startReinspectionCheckout, { reportId: formData.get('reportId') });
  if (!result.ok) return { message: result.message };
  redirect(result.data.checkoutUrl);
}
