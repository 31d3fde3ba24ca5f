import 'server-only';
import { saveInspectionFee } from '@/db/queries/fees';
import { defineOperation } from '@/lib/auth/operation';
import { inspectionFeeSchema } from '@/lib/validation/payments';

/** A coordinator sets the fee buyers pay for reports on centre lathes of one size class. */
export const setInspectionFee = defineOperation({
  name: 'fees.update',
  entityType: 'inspection_fee',
  access: 'fees.manage',
  input: inspectionFeeSchema,
  async run({ actor, input, tx }) {
    await saveInspectionFee(tx, { machineType: 'centre_lathe', sizeClass: input.sizeClass, amountMinor: input.amount, currency: 'EUR', updatedById: actor!.id });
    return { data: { sizeClass: input.sizeClass, amountMinor: input.amount }, entityId: `centre_lathe/${input.sizeClass}`, detail: { amountMinor: input.amount } };
  },
});
