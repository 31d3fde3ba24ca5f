import 'server-only';
import { reportSettings } from '@/db/schema';
import { defineOperation } from '@/lib/auth/operation';
import { reportValiditySchema } from '@/lib/validation/report-validity';

/** The coordinator sets one validity for every report; the single settings row has id 1. */
export const setReportValidity = defineOperation({
  name: 'report.validity.set',
  entityType: 'report',
  access: 'fees.manage',
  input: reportValiditySchema,
  async run({ input, tx }) {
    await tx.insert(reportSettings).values({ id: 1, validityDays: input.validityDays }).onDuplicateKeyUpdate({ set: { validityDays: input.validityDays } });
    return { data: { validityDays: input.validityDays }, entityId: 1 };
  },
});
