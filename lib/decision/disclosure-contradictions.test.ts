import { describe, expect, it } from 'vitest';
import { scoreSurvey } from '@/lib/scoring';
import nearNew from '@/lib/scoring/examples/near-new.json';
import worn from '@/lib/scoring/examples/worn.json';
import safetyDefect from '@/lib/scoring/examples/safety-defect.json';
import mostlyUnmeasured from '@/lib/scoring/examples/mostly-unmeasured.json';
import dealBreaker from '@/lib/scoring/examples/deal-breaker.json';
import { assessDisclosure, POWER_ON_CHECKS } from './disclosure-contradictions';
import type { SellerDisclosure } from './seller-disclosure';

// The scoring results come from the scoring library's own example surveys, scored here, so a change
// in grading shows up as a changed status rather than being hidden by a hand-made fixture.
const claims: SellerDisclosure = {
  knownFaults: '',
  repairsAndRebuilds: '',
  crashesOrDrops: '',
  usage: 'toolroom-or-maintenance',
  usageNotes: '',
  supplyVoltage: 400,
  supplyPhases: 3,
  included: '3-jaw chuck, fixed steady',
  saleTerm: 'as-is',
};

const statusOf = (d: SellerDisclosure, survey: unknown, plate: { voltage: number; phases: 1 | 3 } | null = null) =>
  Object.fromEntries(assessDisclosure(d, scoreSurvey(survey), plate).map((a) => [a.claimId, a]));

describe('assessDisclosure', () => {
  it('contradicts "no known faults" when a check is worn or unfit and names the check', () => {
    const r = scoreSurvey(worn);
    const faulty = r.checks.filter((c) => c.band === 'worn' || c.band === 'unfit');
    expect(faulty.length).toBeGreaterThan(0);
    const a = statusOf(claims, worn)['known-faults']!;
    expect(a.status).toBe('contradicted');
    expect(a.claim).toBe('No known faults');
    expect(a.findings).toContain(`${faulty[0]!.label}: ${faulty[0]!.bandLabel}`);
  });

  it('contradicts "no known faults" when the inspector found a deal-breaker, and names it first', () => {
    const r = scoreSurvey(dealBreaker);
    expect(r.dealBreakers.length).toBeGreaterThan(0);
    const a = statusOf(claims, dealBreaker)['known-faults']!;
    expect(a.status).toBe('contradicted');
    expect(a.findings[0]).toBe(`Deal-breaker: ${r.dealBreakers[0]!.label}`);
  });

  it('contradicts "no known faults" when there is a safety finding', () => {
    const r = scoreSurvey(safetyDefect);
    expect(r.safetyFindings.length).toBeGreaterThan(0);
    const a = statusOf(claims, safetyDefect)['known-faults']!;
    expect(a.status).toBe('contradicted');
    expect(a.findings).toContain(`Safety: ${r.safetyFindings[0]!.message}`);
  });

  it('finds "no known faults" consistent with a near-new machine', () => {
    const r = scoreSurvey(nearNew);
    expect(r.checks.some((c) => c.band === 'worn' || c.band === 'unfit')).toBe(false);
    expect(r.safetyFindings).toEqual([]);
    expect(statusOf(claims, nearNew)['known-faults']!.status).toBe('consistent');
  });

  it('shows faults the seller did declare as stated, not compared', () => {
    expect(statusOf({ ...claims, knownFaults: 'Top-slide screw backlash' }, worn)['known-faults']!.status).toBe('not-compared');
  });

  it('contradicts "tested under power" when no check under power could be done', () => {
    const r = scoreSurvey(mostlyUnmeasured);
    const power = r.checks.filter((c) => POWER_ON_CHECKS.includes(c.id));
    const a = statusOf({ ...claims, saleTerm: 'tested-under-power' }, mostlyUnmeasured)['sale-term']!;
    const expected = power.every((c) => c.status === 'not-measured') ? 'contradicted' : power.some((c) => c.status === 'not-measured') ? 'unconfirmed' : 'consistent';
    expect(expected).not.toBe('consistent');
    expect(a.status).toBe(expected);
  });

  it('finds "tested under power" consistent when every check under power was done', () => {
    const r = scoreSurvey(nearNew);
    expect(r.checks.filter((c) => POWER_ON_CHECKS.includes(c.id)).every((c) => c.status === 'measured')).toBe(true);
    expect(statusOf({ ...claims, saleTerm: 'tested-under-power' }, nearNew)['sale-term']!.status).toBe('consistent');
  });

  it.each(['rebuilt', 'reconditioned'] as const)('contradicts "%s" when the bed or spindle is worn', (saleTerm) => {
    const r = scoreSurvey(worn);
    const wornCore = r.checks.filter((c) => (c.subsystem === 'bed-and-ways' || c.subsystem === 'spindle-and-headstock') && (c.band === 'worn' || c.band === 'unfit'));
    expect(wornCore.length).toBeGreaterThan(0);
    const a = statusOf({ ...claims, saleTerm }, worn)['sale-term']!;
    expect(a.status).toBe('contradicted');
    expect(a.findings).toHaveLength(wornCore.length);
    expect(statusOf({ ...claims, saleTerm }, nearNew)['sale-term']!.status).toBe('consistent');
  });

  it('leaves "as-is" uncompared', () => {
    expect(statusOf(claims, worn)['sale-term']!.status).toBe('not-compared');
  });

  it.each([
    [{ voltage: 400, phases: 3 as const }, 'consistent'],
    [{ voltage: 415, phases: 3 as const }, 'consistent'],
    [{ voltage: 230, phases: 1 as const }, 'contradicted'],
    [{ voltage: 230, phases: 3 as const }, 'contradicted'],
    [null, 'not-compared'],
  ])('compares a claimed 400 V three-phase supply with nameplate %o as %s', (plate, status) => {
    expect(statusOf(claims, nearNew, plate)['supply']!.status).toBe(status);
  });

  it('leaves an unstated supply uncompared', () => {
    expect(statusOf({ ...claims, supplyVoltage: null }, nearNew, { voltage: 230, phases: 1 })['supply']!.status).toBe('not-compared');
  });

  it('lists every question once, in the order the seller answered them', () => {
    expect(assessDisclosure(claims, scoreSurvey(nearNew), null).map((a) => a.claimId)).toEqual(['known-faults', 'repairs', 'crashes', 'usage', 'supply', 'included', 'sale-term']);
  });
});

describe('assessDisclosure against the hidden-damage answers and the accessories found', () => {
  const withDamage = (ids: string[]) => {
    const s = structuredClone(nearNew) as Record<string, unknown>;
    s.hiddenDamage = Object.fromEntries(ids.map((id) => [id, { present: true, note: 'seen on site' }]));
    return s;
  };

  it('contradicts "no crashes known" when the inspector recorded crash marks', () => {
    const a = statusOf(claims, withDamage(['crashMarks'])).crashes!;
    expect(a.status).toBe('contradicted');
    expect(a.findings[0]).toContain('Crash marks');
  });

  it('contradicts "no repairs known" when the inspector found welds or filler', () => {
    const a = statusOf(claims, withDamage(['welds', 'freshPaintOverFiller'])).repairs!;
    expect(a.status).toBe('contradicted');
    expect(a.findings).toHaveLength(2);
  });

  it('finds a declared crash borne out by crash marks', () => {
    expect(statusOf({ ...claims, crashesOrDrops: 'Chuck hit the compound in 2019' }, withDamage(['crashMarks'])).crashes!.status).toBe('consistent');
  });

  it('contradicts the list of what is included when a listed accessory was not found', () => {
    // near-new.json records a three-jaw and a four-jaw chuck, both steadies, a tool post, a DRO and manuals.
    const a = statusOf({ ...claims, included: '3-jaw chuck, taper attachment' }, nearNew).included!;
    expect(a.status).toBe('contradicted');
    expect(a.findings).toEqual(['Listed, not found by the inspector: taper attachment']);
    expect(statusOf({ ...claims, included: '3-jaw chuck, fixed steady and DRO' }, nearNew).included!.status).toBe('consistent');
    expect(statusOf({ ...claims, included: '3-jaw chuck, box of tools' }, nearNew).included!.status).toBe('unconfirmed');
  });
});
