import 'server-only';
import { eq } from 'drizzle-orm';
import { z } from 'zod';
import { db } from '@/db/client';
import { machineInclusions, machines } from '@/db/schema';
import { defineOperation } from '@/lib/auth/operation';
import { inclusionSchema } from '@/lib/validation/inclusion';
import { ownsMachine } from './inspection-access';

export const addInclusion = defineOperation({
  name: 'machine.inclusion.add',
  entityType: 'machine',
  access: 'machine.edit.own',
  input: inclusionSchema.extend({ machineId: z.coerce.number().int().positive() }),
  authorize: ({ actor, input }) => ownsMachine(actor, input.machineId),
  async run({ input, tx }) {
    const [machine] = await tx.select({ currency: machines.currency }).from(machines).where(eq(machines.id, input.machineId));
    const [row] = await tx
      .insert(machineInclusions)
      .values({
        machineId: input.machineId,
        kind: input.kind,
        description: input.description,
        condition: input.condition,
        replacementCostMinor: input.replacementCost === undefined ? null : input.replacementCost * 100,
        currency: machine?.currency ?? 'EUR',
      })
      .$returningId();
    return { data: { machineId: input.machineId, inclusionId: row!.id }, entityId: input.machineId };
  },
});

async function machineOfInclusion(inclusionId: number) {
  const [row] = await db.select({ machineId: machineInclusions.machineId }).from(machineInclusions).where(eq(machineInclusions.id, inclusionId));
  return row?.machineId ?? null;
}

export const removeInclusion = defineOperation({
  name: 'machine.inclusion.remove',
  entityType: 'machine',
  access: 'machine.edit.own',
  input: z.object({ inclusionId: z.coerce.number().int().positive() }),
  authorize: async ({ actor, input }) => {
    const machineId = await machineOfInclusion(input.inclusionId);
    return machineId !== null && ownsMachine(actor, machineId);
  },
  async run({ input, tx }) {
    const [row] = await tx.select({ machineId: machineInclusions.machineId }).from(machineInclusions).where(eq(machineInclusions.id, input.inclusionId));
    await tx.delete(machineInclusions).where(eq(machineInclusions.id, input.inclusionId));
    return { data: { machineId: row!.machineId }, entityId: row!.machineId };
  },
});
