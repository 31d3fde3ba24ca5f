import { fmt } from '../format-number';
import type { DamageFinding, SafetyFinding, ScoringResult } from '../result';
import { DEAL_BREAKER_ITEMS, HIDDEN_DAMAGE_ITEMS, type DealBreakerId, type HiddenDamageId } from '../survey/checklist-items';
import type { ParsedLatheSurvey } from '../survey/lathe-survey';
import { CONDITION_SCALE, gradeForScore, type ConditionGrade } from './condition-scale';

/**
 * What each hidden-damage answer means for the machine (Waygrade rule, common practice): a
 * repaired, filled or chipped casting is not "like new", a weld or braze on a casting holds the
 * machine to general work until it is examined, a cracked chuck can burst at speed.
 */
const HIDDEN_DAMAGE_CONSEQUENCES: Readonly<Record<HiddenDamageId, { consequence: DamageFinding['consequence']; ceiling: ConditionGrade | null; text: string }>> = {
  freshPaintOverFiller: {
    consequence: 'grade-ceiling',
    ceiling: 'Very good',
    text: 'Filler under fresh paint hides what lies beneath; the machine is graded no better than Very good.',
  },
  welds: {
    consequence: 'grade-ceiling',
    ceiling: 'Good',
    text: 'A welded or brazed repair on a casting: graded no better than Good until the repair is examined.',
  },
  nonOriginalHandles: {
    consequence: 'noted',
    ceiling: null,
    text: 'Non-original handles or levers: noted; they do not affect accuracy and do not change the grade.',
  },
  chippedCastings: {
    consequence: 'grade-ceiling',
    ceiling: 'Very good',
    text: 'Chipped castings: the machine is graded no better than Very good.',
  },
  crashMarks: {
    consequence: 'grade-ceiling',
    ceiling: 'Very good',
    text: 'Crash marks: a crash can bend the spindle or shift the headstock; graded no better than Very good, and run-out and alignment readings carry the rest.',
  },
  crackedChuck: {
    consequence: 'safety',
    ceiling: null,
    text: 'Cracked chuck: fix before use — a cracked chuck can burst at speed. Replace it; do not run it.',
  },
};

/**
 * A deal-breaker usually costs more to put right than the machine is worth (common practice), so the
 * machine is graded no better than Poor, "major repairs needed before productive use", however well
 * the rest of it measures.
 */
const DEAL_BREAKER_CEILING: ConditionGrade = 'Poor';

const DEAL_BREAKER_TEXT: Readonly<Record<DealBreakerId, string>> = {
  crackedCasting: 'Cracked casting: a deal-breaker; graded no better than Poor; it heads the report and changes the premise of value.',
  growlingSpindleBearings: 'Growling spindle bearings: a deal-breaker; graded no better than Poor; it heads the report and changes the premise of value.',
  brokenGearTeeth: 'Broken gear teeth: a deal-breaker; graded no better than Poor; it heads the report and changes the premise of value.',
  motorCannotRunOnSupply: 'The motor cannot run on the stated supply: a deal-breaker; graded no better than Poor; it heads the report and changes the premise of value.',
};

const SEEN = 'Seen by the inspector on site; see the photos.';

/** Every "yes" on the hidden-damage and deal-breaker checklists, each with its consequence. */
export function damageFindingsFrom(survey: ParsedLatheSurvey): DamageFinding[] {
  const found: DamageFinding[] = [];
  for (const item of DEAL_BREAKER_ITEMS) {
    const answer = survey.dealBreakers?.[item.id];
    if (!answer?.present) continue;
    found.push({ id: item.id, label: item.label, evidence: answer.note?.trim() || SEEN, consequence: 'deal-breaker', gradeCeiling: DEAL_BREAKER_CEILING, text: DEAL_BREAKER_TEXT[item.id] });
  }
  for (const item of HIDDEN_DAMAGE_ITEMS) {
    const answer = survey.hiddenDamage?.[item.id];
    if (!answer?.present) continue;
    const c = HIDDEN_DAMAGE_CONSEQUENCES[item.id];
    found.push({ id: item.id, label: item.label, evidence: answer.note?.trim() || SEEN, consequence: c.consequence, gradeCeiling: c.ceiling, text: c.text });
  }
  return found;
}

/** Safety findings from the damage checklist ("fix before use"), keyed `hidden-damage:<id>`. */
export function damageSafetyFindings(findings: readonly DamageFinding[]): SafetyFinding[] {
  return findings
    .filter((f) => f.consequence === 'safety')
    .map((f) => ({ checkId: `hidden-damage:${f.id}`, message: f.text, action: 'fix before use' }));
}

/** Highest score a grade allows: just below where the next better grade begins. */
function topScoreOf(grade: ConditionGrade): number {
  const index = CONDITION_SCALE.findIndex((g) => g.grade === grade);
  return index <= 0 ? 100 : CONDITION_SCALE[index - 1]!.fromScore - 0.01;
}

/** The overall condition held under the lowest ceiling any damage finding sets. */
export function applyDamageCeilings(overall: ScoringResult['overall'], findings: readonly DamageFinding[]): ScoringResult['overall'] {
  if (overall.score === null) return overall;
  let lowest: DamageFinding | null = null;
  for (const f of findings) {
    if (f.gradeCeiling === null) continue;
    if (lowest === null || topScoreOf(f.gradeCeiling) < topScoreOf(lowest.gradeCeiling!)) lowest = f;
  }
  if (lowest === null || overall.score <= topScoreOf(lowest.gradeCeiling!)) return overall;
  const score = topScoreOf(lowest.gradeCeiling!);
  return {
    score,
    condition: gradeForScore(score),
    explanation: `${overall.explanation} Held at ${fmt(score, 2)} → ${gradeForScore(score)}: ${lowest.label.toLowerCase()} found (${lowest.text})`,
  };
}
