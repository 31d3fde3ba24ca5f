import { Card } from '@/components/ui/card';
import { INCLUSION_CONDITION_LABELS, valueInclusions, type InclusionCondition } from '@/lib/decision/inclusions-value';
import { formatMoney } from '@/lib/format';

type Row = { id: number; description: string; condition: InclusionCondition; replacementCostMinor: number | null; currency: string };

/** What comes with the machine, each with its condition, and what the lot is worth as it stands. */
export function InclusionsPanel({ items, currency }: { items: Row[]; currency: string }) {
  const priced = items.filter((i) => i.currency === currency);
  const totals = valueInclusions(
    priced.map((i) => ({ description: i.description, condition: i.condition, replacementCost: i.replacementCostMinor === null ? null : { amountMinor: i.replacementCostMinor, currency } })),
    currency,
  );
  return (
    <Card title="What comes with it" className="mt-6">
      {items.length === 0 ? (
        <p className="text-ink-soft">The seller has not listed what comes with the machine.</p>
      ) : (
        <>
          <table className="figures w-full">
            <thead>
              <tr className="border-b border-line text-left text-sm text-ink-soft">
                <th className="py-2 font-medium">Item</th>
                <th className="py-2 font-medium">Condition</th>
                <th className="py-2 text-right font-medium">Replacement cost new</th>
              </tr>
            </thead>
            <tbody>
              {items.map((i) => (
                <tr key={i.id} className="border-b border-line">
                  <td className="py-1.5">{i.description}</td>
                  <td className="py-1.5">{INCLUSION_CONDITION_LABELS[i.condition]}</td>
                  <td className="py-1.5 text-right">{formatMoney(i.replacementCostMinor, i.currency)}</td>
                </tr>
              ))}
            </tbody>
          </table>
          <p data-inclusions-value className="figures mt-3">
            Worth as they stand: <strong>{formatMoney(totals.value.amountMinor, currency)}</strong> · missing items to replace: {formatMoney(totals.missingCost.amountMinor, currency)}
          </p>
          <p className="text-sm text-ink-soft">Each item at a share of its cost new by condition: good 60 %, usable 40 %, worn 20 %, missing 0 % (Waygrade rule).</p>
        </>
      )}
    </Card>
  );
}
