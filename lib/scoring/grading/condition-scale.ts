import { roundTo } from '../format-number';

/**
 * The appraisers' condition scale [src: machinery-appraisal condition terms] and the score
 * (0–100) at which each grade begins. The score edges are a Waygrade rule (common practice).
 */
export const CONDITION_GRADES = ['Excellent', 'Very good', 'Good', 'Fair', 'Poor', 'Salvage'] as const;
export type ConditionGrade = (typeof CONDITION_GRADES)[number];

export const CONDITION_SCALE: readonly { grade: ConditionGrade; fromScore: number; meaning: string }[] = [
  { grade: 'Excellent', fromScore: 88, meaning: 'like new; no defects that affect accuracy' },
  { grade: 'Very good', fromScore: 75, meaning: 'light wear; holds close work with care' },
  { grade: 'Good', fromScore: 60, meaning: 'normal wear for its age; fit for general work' },
  { grade: 'Fair', fromScore: 45, meaning: 'marked wear; needs some repair for accurate work' },
  { grade: 'Poor', fromScore: 25, meaning: 'major repairs needed before productive use' },
  { grade: 'Salvage', fromScore: 0, meaning: 'worth its parts or scrap more than its use' },
];

/**
 * A score as it is shown: cut, not rounded, to `digits` decimals. The grade edges are whole numbers,
 * so a score cut at any number of decimals stays on the same side of every edge: 87.96 shows as 87.9
 * or 87 and reads "Very good", never as 88.0 beside a scale that starts "Excellent" at 88. The cut is
 * taken after rounding away binary noise (0.29 × 100 is 28.999…), at 6 decimals (common practice).
 */
export function shownScore(score: number, digits = 0): number {
  const scale = 10 ** digits;
  return Math.floor(roundTo(score * scale, 6)) / scale;
}

export function gradeForScore(score: number): ConditionGrade {
  for (const g of CONDITION_SCALE) if (score >= g.fromScore) return g.grade;
  return CONDITION_SCALE[CONDITION_SCALE.length - 1]!.grade;
}

export function gradeRank(grade: ConditionGrade): number {
  return CONDITION_GRADES.indexOf(grade);
}
