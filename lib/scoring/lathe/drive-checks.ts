import { fmt, roundTo } from '../format-number';
import { LATHE_LIMITS } from '../limits/lathe-limits';
import {
  beltSpanMm,
  beltTensionRatio,
  beltTensionStatus,
  deflectionBySixteenPerMetreRule,
  deflectionBySixtyFourthRule,
} from '../measure/v-belt';
import { bandWordsFor } from '../grading/bands';
import { src } from '../source-marks';
import { BELT_RUBRIC, NOISE_RUBRIC } from '../survey/rubrics';
import { toMillimetres } from '../units/length';
import { describeLength } from './evaluate-against-limit';
import { evaluateRating } from './evaluate-rated';
import { notMeasured, type LatheCheck } from './lathe-check';

/** Drive: V-belt condition and tension, motor noise. */
export const DRIVE_CHECKS: readonly LatheCheck[] = [
  {
    id: 'belt-condition',
    subsystem: 'drive',
    label: 'V-belt condition',
    weight: 1,
    evaluate(s) {
      const r = s.drive?.belt?.condition ?? s.drive?.beltCondition;
      return r === undefined ? notMeasured('not rated') : evaluateRating(r, BELT_RUBRIC, 'V-belt');
    },
  },
  {
    id: 'belt-tension',
    subsystem: 'drive',
    label: 'V-belt tension (mid-span deflection)',
    weight: 1,
    evaluate(s) {
      const belt = s.drive?.belt;
      if (!belt?.measuredDeflection) return notMeasured('deflection not measured');
      const d1 = toMillimetres(belt.driverPulleyDiameter);
      const d2 = toMillimetres(belt.drivenPulleyDiameter);
      const centreDistanceMm = toMillimetres(belt.centreDistance);
      // Two pulleys can only sit on centres further apart than the sum of their radii.
      if (centreDistanceMm <= (d1 + d2) / 2) return notMeasured('centre distance does not exceed the sum of the pulley radii; check the entries');
      const spanMm = beltSpanMm({
        centreDistanceMm,
        largePulleyDiameterMm: Math.max(d1, d2),
        smallPulleyDiameterMm: Math.min(d1, d2),
      });
      const target = deflectionBySixtyFourthRule(spanMm);
      const fenner = deflectionBySixteenPerMetreRule(spanMm);
      const measured = toMillimetres(belt.measuredDeflection);
      const status = beltTensionStatus(measured, target);
      const q = beltTensionRatio(measured, target);
      return {
        measured: { value: roundTo(measured, 3), unit: 'mm', text: status },
        permissible: {
          value: roundTo(target, 3),
          unit: 'mm',
          direction: 'both',
          basis: `target t/64 = ${fmt(target, 2)} mm (16 mm/m rule: ${fmt(fenner, 2)} mm), ±30 %`,
          source: src("belt makers' design guides (1/64 in per inch of span); the Fenner method (16 mm per m)"),
        },
        q,
        inputs: [
          describeLength('centre distance', belt.centreDistance),
          describeLength('driver pulley', belt.driverPulleyDiameter),
          describeLength('driven pulley', belt.drivenPulleyDiameter),
          describeLength('measured deflection', belt.measuredDeflection),
          `span t = √(C² − ((D − d)/2)²) = ${fmt(spanMm, 1)} mm`,
        ],
        formula: `q = |measured/target − 1| / ${LATHE_LIMITS.beltDeflection.value} = |${fmt(measured, 2)}/${fmt(target, 2)} − 1| / 0.3 = ${fmt(q, 3)}`,
        summary: `Belt deflection ${fmt(measured, 1)} mm against a ${fmt(target, 1)} mm target: ${status} (${bandWordsFor(q)}).`,
        details: {
          spanMm: roundTo(spanMm, 2),
          targetSixtyFourthMm: roundTo(target, 3),
          targetSixteenPerMetreMm: roundTo(fenner, 3),
          status,
        },
      };
    },
  },
  {
    id: 'motor-noise',
    subsystem: 'drive',
    label: 'Motor noise',
    weight: 1,
    evaluate(s) {
      const r = s.drive?.motorNoise;
      return r === undefined ? notMeasured('not rated') : evaluateRating(r, NOISE_RUBRIC, 'Motor noise');
    },
  },
];
