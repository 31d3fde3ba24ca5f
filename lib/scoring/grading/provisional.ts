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
 * so that leaving a section out never gives a firm grade. `areas` holds each check's area by index.
 */
export function provisionalFrom(
  checks: readonly CheckResult[],
  confidence: ScoringResult['confidence'],
  areas: readonly (NotInspectedArea | undefined)[],
): { provisional: boolean; reasons: string[] } {
  const reasons: string[] = [];
  if (confidence.value < FIRM_GRADE_CONFIDENCE) {
    reasons.push(`Only ${fmt(confidence.value * 100, 1)} % of the check weight was measured; a firm grade needs ${fmt(FIRM_GRADE_CONFIDENCE * 100, 0)} %.`);
  }
  // Areas in the order their checks come, each with whether any of its checks was measured
  // (plain arrays: this runs for every survey scored).
  const seen: NotInspectedArea[] = [];
  const measured: boolean[] = [];
  for (let i = 0; i < checks.length; i++) {
    const area = areas[i];
    if (area === undefined) continue;
    let k = seen.indexOf(area);
    if (k < 0) {
      k = seen.length;
      seen.push(area);
      measured.push(false);
    }
    if (checks[i]!.status === 'measured') measured[k] = true;
  }
  const empty: string[] = [];
  for (let k = 0; k < seen.length; k++) if (!measured[k]) empty.push(AREA_LABELS[seen[k]!] ?? seen[k]!);
  if (empty.length) reasons.push(`No check measured in: ${empty.join(', ')}.`);
  return { provisional: reasons.length > 0, reasons };
}
