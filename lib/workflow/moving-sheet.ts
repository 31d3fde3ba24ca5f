import 'server-only';
import { z } from 'zod';
import { machineMovingSheets } from '@/db/schema';
import { defineOperation } from '@/lib/auth/operation';
import { movingSheetSchema } from '@/lib/validation/moving-sheet';
import { ownsMachine } from './inspection-access';

export const saveMovingSheet = defineOperation({
  name: 'machine.moving-sheet.save',
  entityType: 'machine',
  access: 'machine.edit.own',
  input: movingSheetSchema.extend({ machineId: z.coerce.number().int().positive() }),
  authorize: ({ actor, input }) => ownsMachine(actor, input.machineId),
  async run({ input, tx }) {
    const values = {
      weightKg: input.weightKg,
      lengthMm: input.lengthMm ?? null,
      widthMm: input.widthMm ?? null,
      heightMm: input.heightMm ?? null,
      heavyEnd: input.heavyEnd,
      siteAccess: input.siteAccess,
      accessNotes: input.accessNotes || null,
      removalBy: input.removalBy || null,
    };
    await tx.insert(machineMovingSheets).values({ machineId: input.machineId, ...values }).onDuplicateKeyUpdate({ set: values });
    return { data: { machineId: input.machineId }, entityId: input.machineId };
  },
});
