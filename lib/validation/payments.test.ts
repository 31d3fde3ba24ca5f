import { describe, expect, it } from 'vitest';
import { inspectionFeeSchema, refundOrderSchema } from './payments';

describe('inspectionFeeSchema', () => {
  it.each([
    ['490', 49_000],
    ['490.5', 49_050],
    [' 69.99 ', 6_999],
  ])('reads %j euros as %i cents', (amount, cents) => {
    expect(inspectionFeeSchema.parse({ sizeClass: 'small', amount }).amount).toBe(cents);
  });

  it.each(['', 'abc', '-5', '0.50', '12.345', '1e3'])('refuses %j with a message', (amount) => {
    const parsed = inspectionFeeSchema.safeParse({ sizeClass: 'small', amount });
    expect(parsed.success).toBe(false);
  });

  it('refuses a size class that does not exist', () => {
    expect(inspectionFeeSchema.safeParse({ sizeClass: 'huge', amount: '100' }).success).toBe(false);
  });
});

describe('refundOrderSchema', () => {
  it('requires a reason the buyer can read', () => {
    expect(refundOrderSchema.safeParse({ orderId: '4', reason: ' ' }).success).toBe(false);
    expect(refundOrderSchema.parse({ orderId: '4', reason: 'Buyer asked within the week' })).toEqual({ orderId: 4, reason: 'Buyer asked within the week' });
  });
});
