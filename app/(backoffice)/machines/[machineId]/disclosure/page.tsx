import type { Metadata } from 'next';
import { findMachineDisclosure } from '@/db/queries/machine-disclosures';
import { loadOwnMachine } from '../../load-machine';
import { DisclosureForm } from './disclosure-form';

export const metadata: Metadata = { title: 'Seller’s disclosure' };

export default async function DisclosurePage({ params }: { params: Promise<{ machineId: string }> }) {
  const { machineId } = await params;
  const { machine } = await loadOwnMachine(machineId);
  const saved = await findMachineDisclosure(machine.id);
  const yesNo = (text: string) => (text ? 'yes' : 'no') as 'yes' | 'no';
  return (
    <div className="max-w-3xl">
      <h1 className="text-3xl font-semibold">
        Disclosure for {machine.maker} {machine.model}
      </h1>
      <p className="mt-2 mb-8 text-ink-soft">
        Your answers appear in the condition report beside what the inspection finds. Answer as you know the machine today.
      </p>
      <DisclosureForm
        machineId={machine.id}
        defaults={
          saved
            ? {
                hasKnownFaults: yesNo(saved.knownFaults),
                knownFaults: saved.knownFaults,
                hasRepairs: yesNo(saved.repairsAndRebuilds),
                repairsAndRebuilds: saved.repairsAndRebuilds,
                hasCrashes: yesNo(saved.crashesOrDrops),
                crashesOrDrops: saved.crashesOrDrops,
                usage: saved.usage,
                usageNotes: saved.usageNotes,
                supplyVoltage: saved.supplyVoltage ?? undefined,
                supplyPhases: saved.supplyPhases ?? undefined,
                included: saved.included,
                saleTerm: saved.saleTerm,
              }
            : {
                supplyVoltage: machine.supplyVoltage ?? undefined,
                supplyPhases: machine.supplyPhases === 1 || machine.supplyPhases === 3 ? machine.supplyPhases : undefined,
                included: machine.accessories ?? '',
              }
        }
      />
    </div>
  );
}
