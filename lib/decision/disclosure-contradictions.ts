import type { CheckResult, ScoringResult } from '@/lib/scoring/result';
import type { CheckBand } from '@/lib/scoring/grading/bands';
import { SALE_TERM_LABELS, USAGE_LABELS, type SellerDisclosure } from './seller-disclosure';
import { VOLTAGE_TOLERANCE, type SupplySpec } from './phase-converter';

export type ClaimId = 'known-faults' | 'repairs' | 'crashes' | 'usage' | 'supply' | 'included' | 'sale-term';

/**
 * contradicted: a finding says otherwise; consistent: the findings that bear on it agree;
 * unconfirmed: the inspection could only partly test it; not-compared: nothing measured bears on it.
 */
export type ClaimStatus = 'contradicted' | 'consistent' | 'unconfirmed' | 'not-compared';

export interface ClaimAssessment {
  claimId: ClaimId;
  question: string;
  claim: string;
  status: ClaimStatus;
  /** The findings behind the status, in words. */
  findings: string[];
}

/** Bands that mean a fault a seller would have noticed in use. */
const FAULT_BANDS: ReadonlySet<CheckBand> = new Set(['worn', 'unfit']);

/** Checks that can only be done with the machine running under power. */
export const POWER_ON_CHECKS: readonly string[] = [
  'spindle-temperature-rise',
  'spindle-vibration',
  'gear-noise',
  'motor-noise',
  'brake-stopping-time',
  'two-collar-test',
  'facing-test',
];

/** The parts a rebuild or reconditioning restores first: the ways and the spindle. */
const REBUILT_SUBSYSTEMS: ReadonlySet<string> = new Set(['bed-and-ways', 'spindle-and-headstock']);

const describeCheck = (c: CheckResult) => `${c.label}: ${c.bandLabel}`;
const orNone = (text: string, none: string) => (text.trim() ? text.trim() : none);

function knownFaults(d: SellerDisclosure, r: ScoringResult): ClaimAssessment {
  const base = { claimId: 'known-faults' as const, question: 'Known faults' };
  if (d.knownFaults.trim()) return { ...base, claim: d.knownFaults.trim(), status: 'not-compared', findings: [] };
  const findings = [
    // A deal-breaker the inspector saw (results from scoring 1.1 on) is a fault a seller would know of.
    ...(r.dealBreakers ?? []).map((d) => `Deal-breaker: ${d.label}`),
    ...r.checks.filter((c) => c.band !== null && FAULT_BANDS.has(c.band)).map(describeCheck),
    ...r.safetyFindings.map((s) => `Safety: ${s.message}`),
  ];
  return { ...base, claim: 'No known faults', status: findings.length ? 'contradicted' : 'consistent', findings };
}

function saleTerm(d: SellerDisclosure, r: ScoringResult): ClaimAssessment {
  const base = { claimId: 'sale-term' as const, question: 'Sale terms', claim: SALE_TERM_LABELS[d.saleTerm] };
  if (d.saleTerm === 'tested-under-power') {
    const powerChecks = r.checks.filter((c) => POWER_ON_CHECKS.includes(c.id));
    const notRun = powerChecks.filter((c) => c.status === 'not-measured');
    if (powerChecks.length === 0) return { ...base, status: 'not-compared', findings: [] };
    if (notRun.length === powerChecks.length) {
      return { ...base, status: 'contradicted', findings: ['None of the checks under power could be done', ...notRun.map((c) => `${c.label}: not measured`)] };
    }
    if (notRun.length > 0) return { ...base, status: 'unconfirmed', findings: notRun.map((c) => `${c.label}: not measured`) };
    return { ...base, status: 'consistent', findings: ['Every check under power was done'] };
  }
  if (d.saleTerm === 'rebuilt' || d.saleTerm === 'reconditioned') {
    const worn = r.checks.filter((c) => REBUILT_SUBSYSTEMS.has(c.subsystem) && c.band !== null && FAULT_BANDS.has(c.band));
    return { ...base, status: worn.length ? 'contradicted' : 'consistent', findings: worn.map(describeCheck) };
  }
  return { ...base, status: 'not-compared', findings: [] };
}

function supply(d: SellerDisclosure, nameplate: SupplySpec | null): ClaimAssessment {
  const base = { claimId: 'supply' as const, question: 'Power supply' };
  if (d.supplyVoltage === null || d.supplyPhases === null) return { ...base, claim: 'Not stated', status: 'not-compared', findings: [] };
  const claim = `${d.supplyVoltage} V, ${d.supplyPhases === 1 ? 'single' : 'three'} phase`;
  if (!nameplate) return { ...base, claim, status: 'not-compared', findings: ['The nameplate supply was not recorded'] };
  const plate = `Nameplate: ${nameplate.voltage} V, ${nameplate.phases === 1 ? 'single' : 'three'} phase`;
  const voltageAgrees = Math.abs(d.supplyVoltage - nameplate.voltage) <= VOLTAGE_TOLERANCE * Math.max(d.supplyVoltage, nameplate.voltage);
  const agrees = voltageAgrees && d.supplyPhases === nameplate.phases;
  return { ...base, claim, status: agrees ? 'consistent' : 'contradicted', findings: [plate] };
}

/**
 * Each of the seller's answers beside what the inspection found. Only claims a finding can bear on
 * are compared; the others are shown as stated, never marked true.
 */
export function assessDisclosure(disclosure: SellerDisclosure, result: ScoringResult, nameplate: SupplySpec | null): ClaimAssessment[] {
  const stated = (claimId: ClaimId, question: string, claim: string): ClaimAssessment => ({ claimId, question, claim, status: 'not-compared', findings: [] });
  return [
    knownFaults(disclosure, result),
    stated('repairs', 'Repairs and rebuilds', orNone(disclosure.repairsAndRebuilds, 'None known')),
    stated('crashes', 'Crashes or drops', orNone(disclosure.crashesOrDrops, 'None known')),
    stated('usage', 'How it was used', [USAGE_LABELS[disclosure.usage], disclosure.usageNotes.trim()].filter(Boolean).join(' — ')),
    supply(disclosure, nameplate),
    stated('included', 'What is included', orNone(disclosure.included, 'Nothing listed')),
    saleTerm(disclosure, result),
  ];
}
