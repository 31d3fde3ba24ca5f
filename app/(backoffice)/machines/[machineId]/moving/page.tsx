import type { Metadata } from 'next';
import { eq } from 'drizzle-orm';
import { db } from '@/db/client';
import { machineMovingSheets } from '@/db/schema';
import { loadOwnMachine } from '../../load-machine';
import { MovingSheetForm } from './moving-sheet-form';

export const metadata: Metadata = { title: 'Moving sheet' };

export default async function MovingSheetPage({ params }: { params: Promise<{ machineId: string }> }) {
  const { machineId } = await params;
  const { machine } = await loadOwnMachine(machineId);
  const [sheet] = await db.select().from(machineMovingSheets).where(eq(machineMovingSheets.machineId, machine.id)).limit(1);
  return (
    <div className="max-w-3xl">
      <h1 className="text-3xl font-semibold">
        Moving sheet for {machine.maker} {machine.model}
      </h1>
      <p className="mt-2 mb-8 text-ink-soft">Buyers see it beside the report and use the weight to estimate rigging and transport.</p>
      <MovingSheetForm
        machineId={machine.id}
        defaults={
          sheet
            ? {
                weightKg: sheet.weightKg,
                lengthMm: sheet.lengthMm ?? undefined,
                widthMm: sheet.widthMm ?? undefined,
                heightMm: sheet.heightMm ?? undefined,
                heavyEnd: sheet.heavyEnd,
                siteAccess: sheet.siteAccess,
                accessNotes: sheet.accessNotes ?? '',
                removalBy: sheet.removalBy ?? '',
              }
            : {}
        }
      />
    </div>
  );
}
