'use client';

import { useMemo, useState } from 'react';
import { Card } from '@/components/ui/card';
import { INPUT_CLASS } from '@/components/forms/field';
import { DecisionInputError } from '@/lib/decision/decision-input-error';
import { landedCost, type RepairSplit } from '@/lib/decision/landed-cost';
import type { SupplyAssessment } from '@/lib/decision/phase-converter';
import { DEMO_RIGGING_RATES, estimateRigging, SITE_ACCESS, SITE_ACCESS_LABELS, STARTING_RIGGING_DISTANCE_KM, type SiteAccess } from '@/lib/decision/rigging-estimate';
import { formatMoney } from '@/lib/format';

export interface LandedCostFacts {
  currency: string;
  askingPriceMinor: number | null;
  repairsMinor: number | null;
  /** The valuation's repair split (before use, accuracy, unmeasured allowance), when the result has one. */
  repairSplit: RepairSplit | null;
  /** null when the seller has listed no inclusions, so nothing is known to be missing. */
  missingToolingMinor: number | null;
  supply: SupplyAssessment;
  weightKg: number | null;
  siteAccess: SiteAccess;
}

const VERDICT_WORDS: Record<SupplyAssessment['verdict'], string> = {
  runs: 'Runs on your supply',
  'converter-needed': 'Needs a phase converter',
  'voltage-differs': 'Voltage differs from your supply',
  unknown: 'Supply not compared',
};

/** Whole currency units typed by the buyer → minor units; empty is "not set". */
const toMinor = (text: string) => (text.trim() === '' ? null : Math.round(Number(text) * 100));
const toNumber = (text: string) => (text.trim() === '' ? null : Number(text));

function NumberInput({ id, label, value, onChange, unit }: { id: string; label: string; value: string; onChange: (v: string) => void; unit: string }) {
  return (
    <label htmlFor={id} className="block">
      <span className="text-sm font-medium">
        {label} ({unit})
      </span>
      <input id={id} inputMode="decimal" value={value} onChange={(e) => onChange(e.target.value)} className={`${INPUT_CLASS} figures`} />
    </label>
  );
}

/**
 * What the machine costs standing in the buyer's shop. Rates start at invented demo figures and are
 * the buyer's to edit; nothing here is saved or sent.
 */
export function LandedCostPanel({ facts }: { facts: LandedCostFacts }) {
  const c = facts.currency;
  const [distance, setDistance] = useState(String(STARTING_RIGGING_DISTANCE_KM));
  const [weight, setWeight] = useState(facts.weightKg === null ? '' : String(facts.weightKg));
  const [access, setAccess] = useState<SiteAccess>(facts.siteAccess);
  const [callOut, setCallOut] = useState(String(DEMO_RIGGING_RATES.callOutMinor / 100));
  const [perTonne, setPerTonne] = useState(String(DEMO_RIGGING_RATES.handlingPerTonneMinor / 100));
  const [perKm, setPerKm] = useState(String(DEMO_RIGGING_RATES.perKmMinor / 100));
  const [heavyPerKm, setHeavyPerKm] = useState(String(DEMO_RIGGING_RATES.heavyPerKmMinor / 100));
  const [premium, setPremium] = useState('');
  const [tax, setTax] = useState('');

  const outcome = useMemo(() => {
    try {
      const weightKg = toNumber(weight);
      const rigging =
        weightKg === null
          ? null
          : estimateRigging(
              { weightKg, distanceKm: toNumber(distance) ?? 0, siteAccess: access },
              { ...DEMO_RIGGING_RATES, currency: c, callOutMinor: toMinor(callOut) ?? 0, handlingPerTonneMinor: toMinor(perTonne) ?? 0, perKmMinor: toMinor(perKm) ?? 0, heavyPerKmMinor: toMinor(heavyPerKm) ?? 0 },
            );
      const converter = facts.supply.verdict === 'converter-needed' ? facts.supply.converterCost : facts.supply.verdict === 'runs' ? { amountMinor: 0, currency: c } : null;
      const cost = landedCost({
        currency: c,
        askingPrice: facts.askingPriceMinor === null ? null : { amountMinor: facts.askingPriceMinor, currency: c },
        buyersPremiumPercent: toNumber(premium),
        taxPercent: toNumber(tax),
        rigging: rigging?.total ?? null,
        converter: converter && converter.currency === c ? converter : null,
        missingTooling: facts.missingToolingMinor === null ? null : { amountMinor: facts.missingToolingMinor, currency: c },
        repairs: facts.repairsMinor === null ? null : { amountMinor: facts.repairsMinor, currency: c },
        repairSplit: facts.repairSplit,
      });
      return { ok: true as const, rigging, cost };
    } catch (e) {
      if (e instanceof DecisionInputError) return { ok: false as const, message: e.message };
      throw e;
    }
  }, [weight, distance, access, callOut, perTonne, perKm, heavyPerKm, premium, tax, facts, c]);

  return (
    <Card title="Landed cost in your shop" className="mt-6">
      <p data-supply-verdict={facts.supply.verdict} className="font-medium">
        {VERDICT_WORDS[facts.supply.verdict]}
      </p>
      <p className="text-sm text-ink-soft">{facts.supply.explanation}</p>

      <div className="mt-5 grid gap-6 lg:grid-cols-2">
        <fieldset className="grid grid-cols-2 gap-3">
          <legend className="mb-2 font-semibold">Moving it</legend>
          <NumberInput id="lc-weight" label="Machine weight" unit="kg" value={weight} onChange={setWeight} />
          <NumberInput id="lc-distance" label="Distance to your shop" unit="km" value={distance} onChange={setDistance} />
          <label htmlFor="lc-access" className="col-span-2 block">
            <span className="text-sm font-medium">Site access</span>
            <select id="lc-access" value={access} onChange={(e) => setAccess(e.target.value as SiteAccess)} className={INPUT_CLASS}>
              {SITE_ACCESS.map((a) => (
                <option key={a} value={a}>
                  {SITE_ACCESS_LABELS[a]}
                </option>
              ))}
            </select>
          </label>
          <NumberInput id="lc-callout" label="Rigging call-out" unit={c} value={callOut} onChange={setCallOut} />
          <NumberInput id="lc-tonne" label="Handling per tonne" unit={c} value={perTonne} onChange={setPerTonne} />
          <NumberInput id="lc-km" label="Transport per km" unit={c} value={perKm} onChange={setPerKm} />
          <NumberInput id="lc-heavy-km" label="Heavy vehicle per km" unit={c} value={heavyPerKm} onChange={setHeavyPerKm} />
          <NumberInput id="lc-premium" label="Buyer’s premium, if any" unit="%" value={premium} onChange={setPremium} />
          <NumberInput id="lc-tax" label="Tax you cannot reclaim, if any" unit="%" value={tax} onChange={setTax} />
          <p className="col-span-2 text-sm text-ink-soft">Rates start at invented demo figures, not a quotation; change them to your riggers’ rates.</p>
        </fieldset>

        <div>
          {outcome.ok ? (
            <table className="figures w-full">
              <tbody>
                {outcome.cost.lines.map((line) => (
                  <tr key={line.id} className="border-b border-line">
                    <th scope="row" className="py-1.5 pr-4 text-left font-normal">
                      {line.label}
                      {line.note ? <span className="block text-sm text-ink-soft">{line.note}</span> : null}
                    </th>
                    <td className="py-1.5 text-right">{line.amount ? formatMoney(line.amount.amountMinor, c) : 'not known'}</td>
                  </tr>
                ))}
              </tbody>
              <tfoot>
                <tr>
                  <th scope="row" className="pt-3 text-left font-semibold">
                    {outcome.cost.notKnown.length ? 'Landed cost, at least' : 'Landed cost'}
                  </th>
                  <td data-landed-total className="pt-3 text-right text-xl font-semibold">
                    {formatMoney(outcome.cost.total.amountMinor, c)}
                  </td>
                </tr>
              </tfoot>
            </table>
          ) : (
            <p role="alert" className="rounded-lg border border-band-rebuild/40 px-4 py-3 text-band-rebuild">
              {outcome.message}
            </p>
          )}
          {outcome.ok && outcome.rigging ? (
            <p className="mt-3 text-sm text-ink-soft">
              Rigging: handling {formatMoney(outcome.rigging.handling.amountMinor, c)} + transport {formatMoney(outcome.rigging.transport.amountMinor, c)}
              {outcome.rigging.heavyVehicle ? ' (heavy vehicle)' : ''}.
            </p>
          ) : null}
          {outcome.ok && outcome.cost.notKnown.length ? <p className="mt-2 text-sm text-ink-soft">Not in the total: {outcome.cost.notKnown.join(', ')}.</p> : null}
        </div>
      </div>
    </Card>
  );
}
