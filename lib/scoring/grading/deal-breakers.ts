import { DEAL_BREAKER_ITEMS } from '../survey/condition-findings';
import type { ParsedLatheSurvey } from '../survey/lathe-survey';
import type { DealBreaker } from '../result';

/**
 * Deal-breakers: faults that usually cost more to put right than the machine is worth or that
 * cannot be put right at all (a cracked casting, growling spindle bearings, broken gear teeth, a
 * motor that cannot run on the stated supply). They head the report whatever the overall grade, so
 * a good average never hides one. Recorded by the inspector; a grinding noise in the power run is
 * not turned into one automatically, because the inspector decides whether it comes from the bearings.
 */
export function dealBreakersFrom(survey: ParsedLatheSurvey): DealBreaker[] {
  const found: DealBreaker[] = [];
  const recorded = survey.dealBreakers;
  if (!recorded) return found;
  for (const item of DEAL_BREAKER_ITEMS) {
    const finding = recorded[item.id];
    if (!finding?.present) continue;
    found.push({
      id: item.id,
      label: item.label,
      evidence: finding.note?.trim() || 'Seen by the inspector on site; see the photos.',
      photoRequired: true,
    });
  }
  return found;
}
