import 'server-only';
import { eq } from 'drizzle-orm';
import { z } from 'zod';
import { machinePriceChanges, machines } from '@/db/schema';
import { defineOperation } from '@/lib/auth/operation';
import { sizeClassForSwing } from '@/lib/machine-size';
import { endReinspectionsWhenListingEnds } from '@/lib/reinspection/listing-ended';
import { machineFormSchema, type MachineForm } from '@/lib/validation/machine';
import { ownsMachine } from './inspection-access';

function machineValues(form: MachineForm) {
  return {
    maker: form.maker,
    model: form.model,
    serialNumber: form.serialNumber || null,
    latheKind: form.latheKind,
    yearBuilt: form.yearBuilt ?? null,
    swingMm: form.swingMm,
    betweenCentresMm: form.betweenCentresMm,
    spindleBoreMm: form.spindleBoreMm ?? null,
    motorKw: form.motorKw === undefined ? null : form.motorKw.toFixed(2),
    supplyVoltage: form.supplyVoltage ?? null,
    supplyPhases: form.supplyPhases ?? null,
    sizeClass: sizeClassForSwing(form.swingMm),
    town: form.town,
    region: form.region,
    askingPriceMinor: form.askingPrice === undefined ? null : form.askingPrice * 100,
    accessories: form.accessories || null,
    description: form.description || null,
    listingStatus: form.listingStatus,
  };
}

export const createMachine = defineOperation({
  name: 'machine.create',
  entityType: 'machine',
  access: 'machine.edit.own',
  input: machineFormSchema,
  async run({ actor, input, tx }) {
    const values = machineValues(input);
    const [row] = await tx.insert(machines).values({ ...values, sellerId: actor!.id }).$returningId();
    await tx.insert(machinePriceChanges).values({ machineId: row!.id, askingPriceMinor: values.askingPriceMinor });
    return { data: { machineId: row!.id }, entityId: row!.id };
  },
});

export const updateMachine = defineOperation({
  name: 'machine.update',
  entityType: 'machine',
  access: 'machine.edit.own',
  input: machineFormSchema.extend({ machineId: z.coerce.number().int().positive() }),
  authorize: ({ actor, input }) => ownsMachine(actor, input.machineId),
  async run({ actor, input, tx }) {
    const values = machineValues(input);
    const [before] = await tx
      .select({ askingPriceMinor: machines.askingPriceMinor, listingStatus: machines.listingStatus })
      .from(machines)
      .where(eq(machines.id, input.machineId))
      .for('update');
    await tx.update(machines).set(values).where(eq(machines.id, input.machineId));
    // Sold or withdrawn through the edit form: the same cancellation and refunds as the one-click change.
    await endReinspectionsWhenListingEnds(tx, { machineId: input.machineId, from: before?.listingStatus ?? null, to: values.listingStatus, actor: actor! });
    // Price history: a row only when the asking price actually changes.
    if (before && before.askingPriceMinor !== values.askingPriceMinor) {
      await tx.insert(machinePriceChanges).values({ machineId: input.machineId, askingPriceMinor: values.askingPriceMinor });
    }
    return { data: { machineId: input.machineId }, entityId: input.machineId };
  },
});
