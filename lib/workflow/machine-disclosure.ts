import 'server-only';
import { z } from 'zod';
import { machineDisclosures } from '@/db/schema';
import { defineOperation } from '@/lib/auth/operation';
import { sellerDisclosureSchema, type SellerDisclosureForm } from '@/lib/validation/seller-disclosure';
import { ownsMachine } from './inspection-access';

/** A "no" answer stores empty text, the disclosure's way of saying "none known". */
function disclosureValues(form: SellerDisclosureForm) {
  return {
    knownFaults: form.hasKnownFaults === 'yes' ? form.knownFaults : '',
    repairsAndRebuilds: form.hasRepairs === 'yes' ? form.repairsAndRebuilds : '',
    crashesOrDrops: form.hasCrashes === 'yes' ? form.crashesOrDrops : '',
    usage: form.usage,
    usageNotes: form.usageNotes,
    supplyVoltage: form.supplyVoltage ?? null,
    supplyPhases: form.supplyPhases ?? null,
    included: form.included,
    saleTerm: form.saleTerm,
  };
}

export const saveMachineDisclosure = defineOperation({
  name: 'machine.disclosure.save',
  entityType: 'machine',
  access: 'machine.edit.own',
  input: z.intersection(sellerDisclosureSchema, z.object({ machineId: z.coerce.number().int().positive() })),
  authorize: ({ actor, input }) => ownsMachine(actor, input.machineId),
  async run({ input, tx }) {
    const values = disclosureValues(input);
    await tx
      .insert(machineDisclosures)
      .values({ machineId: input.machineId, ...values })
      .onDuplicateKeyUpdate({ set: values });
    return { data: { machineId: input.machineId }, entityId: input.machineId };
  },
});
