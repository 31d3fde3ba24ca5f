import { CONDITION_SCALE } from './grading/condition-scale';

/**
 * The words every report carries, whatever the machine: how the grade scale reads, what the
 * inspection covered and who stands behind it, that it is not a warranty, and that it gives no
 * advice to buy or not to buy. Kept here so the report page and the PDF say exactly the same.
 */
export const GRADE_SCALE_TEXT: readonly { grade: string; fromScore: number; meaning: string }[] = CONDITION_SCALE.map((g) => ({
  grade: g.grade,
  fromScore: g.fromScore,
  meaning: g.meaning,
}));

export const REPORT_STATEMENTS = {
  scope:
    'Scope: this report records the condition of the machine as the inspector found it on the inspection date, by the readings, ratings and photos listed here. Parts that were not opened, run or measured are listed under "Not inspected" and are not graded.',
  independence:
    'Independence: the inspector is paid the same fee whatever the grade and has no interest in the sale of this machine; neither the seller nor the buyer can change the readings or the grade.',
  notAWarranty:
    'Not a warranty: this report is not a warranty or guarantee of the machine\'s condition, accuracy, safety or future life. Wear and faults can appear after the inspection date.',
  noAdvice:
    'No advice to buy or not to buy: the report states condition, estimated repair costs and an estimated value; the decision to buy, and at what price, is yours.',
  dealBreakers:
    'Deal-breakers are faults that usually cost more to put right than the machine is worth or cannot be put right; they are listed first whatever the overall grade.',
} as const;
