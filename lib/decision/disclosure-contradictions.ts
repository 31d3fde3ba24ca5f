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

/** Hidden-damage answers that speak of a crash, and of a repair (results from scoring 1.2 on). */
const CRASH_FINDINGS: ReadonlySet<string> = new Set(['crashMarks', 'crackedCasting', 'crackedChuck']);
const REPAIR_FINDINGS: ReadonlySet<string> = new Set(['welds', 'freshPaintOverFiller', 'nonOriginalHandles']);

const damageOf = (r: ScoringResult, ids: ReadonlySet<string>) =>
  (r.damageFindings ?? []).filter((f) => ids.has(f.id)).map((f) => `${f.label}: ${f.evidence}`);

/**
 * A claim of "none" against the findings that bear on it: contradicted when one is found. A
 * declared event is borne out when a finding shows it, otherwise only stated (nothing seen need
 * not mean nothing happened).
 */
function eventClaim(claimId: 'repairs' | 'crashes', question: string, declared: string, found: string[]): ClaimAssessment {
  if (!declared.trim()) return { claimId, question, claim: 'None known', status: found.length ? 'contradicted' : 'not-compared', findings: found };
  return { claimId, question, claim: declared.trim(), status: found.length ? 'consistent' : 'not-compared', findings: found };
}

/** The words a seller uses for each kind of accessory the inspector records. */
const ACCESSORY_WORDS: readonly [kind: string, words: RegExp][] = [
  ['three-jaw-chuck', /\b(3|three)[- ]?jaw/i],
  ['four-jaw-chuck', /\b(4|four)[- ]?jaw/i],
  ['collet-chuck', /collet/i],
  ['faceplate', /face ?plate/i],
  ['fixed-steady', /fixed steady|\bsteady rest/i],
  ['travelling-steady', /travell?ing steady|follow(er)? rest/i],
  ['tool-post', /tool ?post/i],
  ['digital-readout', /\bdro\b|digital read-?out/i],
  ['taper-attachment', /taper attachment/i],
  ['manuals', /manual/i],
];

/**
 * What the seller listed beside the accessories the inspector recorded: an item listed and not
 * found contradicts the claim; items found confirm it; items whose kind the survey does not name
 * stay unconfirmed.
 */
function included(d: SellerDisclosure, r: ScoringResult): ClaimAssessment {
  const base = { claimId: 'included' as const, question: 'What is included', claim: orNone(d.included, 'Nothing listed') };
  const check = r.checks.find((c) => c.id === 'accessories');
  if (!d.included.trim() || !check) return { ...base, status: 'not-compared', findings: [] };
  const found = new Set(check.status === 'measured' ? (check.measured?.text ?? '').split(', ') : []);
  const listed = d.included.split(/[,;\n]|\band\b/).map((x) => x.trim()).filter(Boolean);
  const missing: string[] = [];
  const seen: string[] = [];
  const unknown: string[] = [];
  for (const item of listed) {
    const kind = ACCESSORY_WORDS.find(([, words]) => words.test(item))?.[0];
    if (kind === undefined) unknown.push(item);
    else if (found.has(kind)) seen.push(item);
    else missing.push(item);
  }
  if (missing.length) return { ...base, status: 'contradicted', findings: missing.map((m) => `Listed, not found by the inspector: ${m}`) };
  if (unknown.length) return { ...base, status: 'unconfirmed', findings: [...seen.map((m) => `Found: ${m}`), ...unknown.map((m) => `Not recorded by kind: ${m}`)] };
  return { ...base, status: 'consistent', findings: seen.map((m) => `Found: ${m}`) };
}
const orNone = (text: string, none: string) => (text.trim() ? text.trim() : none);

function knownFaults(d: SellerDisclosure, r: ScoringResult): ClaimAssessment {
  const base = { claimId: 'known-faults' as const, question: 'Known faults' };
  if (d.knownFaults.trim()) return { ...base, claim: d.knownFaults.trim(), status: 'not-compared', findings: [] };
  const findings = [
    // A deal-breaker the inspector saw (results from scoring 1.1 on) is a fault a seller would know of.
    ...(r.dealBreakers ?? []).map((d) => `Deal-breaker: ${d.label}`),
    ...r.checks.filter((c) => c.band !== null && FAULT_BANDS.has(c.band)).map(describeCheck),
    ...r.safetyFindings.map((s) => `Safety: ${s.message}`),
    // Hidden damage the inspector found (results from scoring 1.2 on), other than what is merely noted.
    ...(r.damageFindings ?? []).filter((f) => f.consequence === 'grade-ceiling').map((f) => `Damage: ${f.label}`),
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
 * Each of the seller's answers beside every finding that bears on it: faults, crashes and repairs
 * against the checks and the hidden-damage answers, what is included against the accessories the
 * inspector recorded, the supply against the nameplate, the sale term against the checks. A claim
 * nothing bears on is shown as stated, never marked true.
 */
export function assessDisclosure(disclosure: SellerDisclosure, result: ScoringResult, nameplate: SupplySpec | null): ClaimAssessment[] {
  const stated = (claimId: ClaimId, question: string, claim: string): ClaimAssessment => ({ claimId, question, claim, status: 'not-compared', findings: [] });
  return [
    knownFaults(disclosure, result),
    eventClaim('repairs', 'Repairs and rebuilds', disclosure.repairsAndRebuilds, damageOf(result, REPAIR_FINDINGS)),
    eventClaim('crashes', 'Crashes or drops', disclosure.crashesOrDrops, damageOf(result, CRASH_FINDINGS)),
    stated('usage', 'How it was used', [USAGE_LABELS[disclosure.usage], disclosure.usageNotes.trim()].filter(Boolean).join(' — ')),
    supply(disclosure, nameplate),
    included(disclosure, result),
    saleTerm(disclosure, result),
  ];
}
