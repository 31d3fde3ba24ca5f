import type { Metadata } from 'next';
import { asc, eq } from 'drizzle-orm';
import { Card } from '@/components/ui/card';
import { db } from '@/db/client';
import { machineInclusions } from '@/db/schema';
import { INCLUSION_CONDITION_LABELS, valueInclusions } from '@/lib/decision/inclusions-value';
import { formatMoney } from '@/lib/format';
import { loadOwnMachine } from '../../load-machine';
import { InclusionForm } from './inclusion-form';
import { INCLUSION_KIND_LABELS } from './inclusion-kind-labels';
import { RemoveInclusionButton } from './remove-inclusion-button';

export const metadata: Metadata = { title: 'What comes with it' };

export default async function InclusionsPage({ params }: { params: Promise<{ machineId: string }> }) {
  const { machineId } = await params;
  const { machine } = await loadOwnMachine(machineId);
  const items = await db.select().from(machineInclusions).where(eq(machineInclusions.machineId, machine.id)).orderBy(asc(machineInclusions.id));
  const totals = valueInclusions(
    items.filter((i) => i.currency === machine.currency).map((i) => ({ description: i.description, condition: i.condition, replacementCost: i.replacementCostMinor === null ? null : { amountMinor: i.replacementCostMinor, currency: i.currency } })),
    machine.currency,
  );
  return (
    <div className="max-w-3xl">
      <h1 className="text-3xl font-semibold">
        What comes with {machine.maker} {machine.model}
      </h1>
      <p className="mt-2 text-ink-soft">Chucks, rests, tool post, collets, DRO, manuals: each with its condition and what it would cost new. Buyers see the list and its value beside the report.</p>
      <Card className="mt-6">
        {items.length === 0 ? (
          <p className="text-ink-soft">Nothing listed yet. Add the first item below.</p>
        ) : (
          <table className="figures w-full">
            <thead>
              <tr className="border-b border-line text-left text-sm text-ink-soft">
                <th className="py-2 font-medium">Item</th>
                <th className="py-2 font-medium">Condition</th>
                <th className="py-2 text-right font-medium">Replacement cost</th>
                <th className="py-2"><span className="sr-only">Remove</span></th>
              </tr>
            </thead>
            <tbody>
              {items.map((i) => (
                <tr key={i.id} className="border-b border-line">
                  <td className="py-2">
                    {i.description}
                    <span className="block text-sm text-ink-soft">{INCLUSION_KIND_LABELS[i.kind]}</span>
                  </td>
                  <td className="py-2">{INCLUSION_CONDITION_LABELS[i.condition]}</td>
                  <td className="py-2 text-right">{formatMoney(i.replacementCostMinor, i.currency)}</td>
                  <td className="py-2 text-right">
                    <RemoveInclusionButton inclusionId={i.id} description={i.description} />
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
        {items.length ? (
          <p className="figures mt-3 text-ink-soft">
            Worth as they stand: {formatMoney(totals.value.amountMinor, machine.currency)} · missing, to replace: {formatMoney(totals.missingCost.amountMinor, machine.currency)}
            {totals.unpriced.length ? ` · no cost given for ${totals.unpriced.length}` : ''}
          </p>
        ) : null}
      </Card>
      <Card title="Add an item" className="mt-6">
        <InclusionForm machineId={machine.id} />
      </Card>
    </div>
  );
}
