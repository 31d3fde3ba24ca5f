import type { ParsedLatheSurvey } from '../survey/lathe-survey';
import type { ScoringResult } from '../result';

/** Names of the survey areas the inspector can mark as not inspected. */
export const AREA_LABELS: Readonly<Record<string, string>> = {
  lubrication: 'Headstock and lubrication',
  gearboxAndFeeds: 'Gearbox and feeds',
  drive: 'Drive',
  bedAndWays: 'Bed and ways',
  spindle: 'Spindle',
  slidesAndScrews: 'Slides and screws',
  tailstock: 'Tailstock',
  testCuts: 'Test cuts',
  electricalAndSafety: 'Electrical and safety',
  accessories: 'Accessories',
  powerRun: 'Power run',
};

/**
 * What was not inspected, and why: the areas the inspector set aside with a reason first, then
 * every check without a reading (with the scorer's reason), so a buyer sees the gaps beside the grade.
 */
export function notInspectedFrom(survey: ParsedLatheSurvey, confidence: ScoringResult['confidence']): ScoringResult['notInspected'] {
  const list: ScoringResult['notInspected'] = [];
  for (const entry of survey.notInspected ?? []) {
    list.push({ id: `area:${entry.area}`, label: AREA_LABELS[entry.area] ?? entry.area, reason: entry.reason });
  }
  for (const m of confidence.missing) list.push({ id: m.checkId, label: m.label, reason: m.reason });
  return list;
}
