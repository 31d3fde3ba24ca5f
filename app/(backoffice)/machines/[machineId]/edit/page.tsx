import type { Metadata } from 'next';
import { loadOwnMachine } from '../../load-machine';
import { MachineForm } from '../../machine-form';

export const metadata: Metadata = { title: 'Edit listing' };

export default async function EditMachinePage({ params }: { params: Promise<{ machineId: string }> }) {
  const { machineId } = await params;
  const { machine } = await loadOwnMachine(machineId);
  return (
    <div className="max-w-3xl">
      <h1 className="mb-8 text-3xl font-semibold">
        Edit {machine.maker} {machine.model}
      </h1>
      <MachineForm
        machineId={machine.id}
        defaults={{
          maker: machine.maker,
          model: machine.model,
          serialNumber: machine.serialNumber ?? '',
          latheKind: machine.latheKind,
          yearBuilt: machine.yearBuilt ?? undefined,
          swingMm: machine.swingMm,
          betweenCentresMm: machine.betweenCentresMm,
          spindleBoreMm: machine.spindleBoreMm ?? undefined,
          motorKw: machine.motorKw ? Number(machine.motorKw) : undefined,
          supplyVoltage: machine.supplyVoltage ?? undefined,
          supplyPhases: (machine.supplyPhases as 1 | 3 | null) ?? undefined,
          town: machine.town,
          region: machine.region,
          askingPrice: machine.askingPriceMinor === null ? undefined : Math.round(machine.askingPriceMinor / 100),
          accessories: machine.accessories ?? '',
          description: machine.description ?? '',
          listingStatus: machine.listingStatus,
        }}
      />
    </div>
  );
}
