import { fmt } from '../format-number';
import type { CheckResult, ScoringResult } from '../result';
import type { NotInspectedArea } from '../survey/checklist-items';
import { AREA_LABELS } from './not-inspected';

/**
 * Below this share of the check weight measured the grade is provisional (Waygrade rule, common
 * practice). Why three quarters: the heaviest subsystems (bed and ways, spindle and headstock)
 * carry 24 % of the overall weight each, so with a quarter of the check weight unmeasured a whole
 * one of them may be unknown, and one unknown subsystem between "Sharp" and "Worn" moves the
 * overall score by 0.7 × 0.24 × 70 + up to 0.3 × 70 ≈ 33 points — more than two grades' width
 * (grades are 13 to 15 points wide). Above it, what is missing is spread thin enough that a grade
 * can be signed, with what is missing listed beside it.
 */
export const FIRM_GRADE_CONFIDENCE = 0.75;

/**
 * Whether the grade is provisional, and why: confidence below FIRM_GRADE_CONFIDENCE, or a survey
 * area with checks of its own none of which was measured (a section left out or not inspected),
 * so that leaving a section out never gives a firm grade.
 */
export function provisionalFrom(
  checks: readonly CheckResult[],
  confidence: ScoringResult['confidence'],
  areaOf: (checkId: string) => NotInspectedArea | undefined,
): { provisional: boolean; reasons: string[] } {
  const reasons: string[] = [];
  if (confidence.value < FIRM_GRADE_CONFIDENCE) {
    reasons.push(`Only ${fmt(confidence.value * 100, 1)} % of the check weight was measured; a firm grade needs ${fmt(FIRM_GRADE_CONFIDENCE * 100, 0)} %.`);
  }
  const measuredByArea = new Map<NotInspectedArea, number>();
  for (const c of checks) {
    const area = areaOf(c.id);
    if (!area) continue;
    measuredByArea.set(area, (measuredByArea.get(area) ?? 0) + (c.status === 'measured' ? 1 : 0));
  }
  const empty = [...measuredByArea].filter(([, n]) => n === 0).map(([area]) => AREA_LABELS[area] ?? area);
  if (empty.length) reasons.push(`No check measured in: ${empty.join(', ')}.`);
  return { provisional: reasons.length > 0, reasons };
}
