import 'server-only';
import { eq } from 'drizzle-orm';
import { z } from 'zod';
import { machines } from '@/db/schema';
import { defineOperation } from '@/lib/auth/operation';
import { sizeClassForSwing } from '@/lib/machine-size';
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
    const [row] = await tx.insert(machines).values({ ...machineValues(input), sellerId: actor!.id }).$returningId();
    return { data: { machineId: row!.id }, entityId: row!.id };
  },
});

export const updateMachine = defineOperation({
  name: 'machine.update',
  entityType: 'machine',
  access: 'machine.edit.own',
  input: machineFormSchema.extend({ machineId: z.coerce.number().int().positive() }),
  authorize: ({ actor, input }) => ownsMachine(actor, input.machineId),
  async run({ input, tx }) {
    await tx.update(machines).set(machineValues(input)).where(eq(machines.id, input.machineId));
    return { data: { machineId: input.machineId }, entityId: input.machineId };
  },
});
