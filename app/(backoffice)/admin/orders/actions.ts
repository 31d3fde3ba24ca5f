'use server';

import { revalidatePath } from 'next/cache';
import { runAsCurrentUser } from '@/lib/auth/adapters';
import { refundOrder } from '@/lib/payments/refund-order';

export type RefundState = { message?: string; refunded?: boolean };

export async function refundOrderAction(_previous: RefundState, formData: FormData): Promise<RefundState> {
  const result = await runAsCurrentUser(refundOrder, { orderId: formData.get('orderId'), reason: formData.get('reason') });
  if (!result.ok) return { message: result.fieldErrors?.reason?.[0] ?? result.message };
  revalidatePath('/admin/orders');
  return { refunded: true };
}
