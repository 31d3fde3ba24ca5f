import { fmt, roundTo } from '../format-number';
import { tailstockAlignmentFromIndicator } from '../measure/tailstock-alignment';
import { twoCollarTest } from '../measure/two-collar';
import { WEAR_RUBRIC } from '../survey/rubrics';
import { toMillimetres } from '../units/length';
import { describeLength, evaluateDeviation } from './evaluate-against-limit';
import { evaluateDeviceState, evaluateRating } from './evaluate-rated';
import { latheLimit } from './lathe-context';
import { notMeasured, type LatheCheck } from './lathe-check';

/** Tailstock: alignment by indicator and by the two-collar test cut, centre height, quill. */

const MOVE_WORDS = {
  'toward-operator': 'toward the operator (front)',
  'away-from-operator': 'away from the operator (rear)',
  none: 'no move needed',
} as const;

export const TAILSTOCK_CHECKS: readonly LatheCheck[] = [
  {
    id: 'tailstock-alignment',
    subsystem: 'tailstock',
    label: 'Tailstock alignment along a test bar',
    weight: 2,
    evaluate(s, ctx) {
      const a = s.tailstock?.alignmentIndicator;
      if (!a) return notMeasured('not measured');
      const distanceMm = toMillimetres(a.distance);
      const result = tailstockAlignmentFromIndicator(
        toMillimetres(a.readingNearHeadstock),
        toMillimetres(a.readingNearTailstock),
        distanceMm,
      );
      return evaluateDeviation({
        deviation: result.offsetMm,
        unit: 'mm',
        permissible: latheLimit('tailstockAlignment', ctx, a.distance),
        inputs: [
          describeLength('reading near headstock', a.readingNearHeadstock),
          describeLength('reading near tailstock', a.readingNearTailstock),
          describeLength('distance', a.distance),
          `offset = tail − head = ${fmt(result.offsetMm)} mm; move the tailstock ${MOVE_WORDS[result.move]} by ${fmt(result.moveByMm)} mm`,
        ],
        what: `Tailstock offset over ${fmt(distanceMm, 1)} mm`,
        details: { move: result.move, moveByMm: roundTo(result.moveByMm, 4) },
      });
    },
  },
  {
    id: 'two-collar-test',
    subsystem: 'tailstock',
    label: 'Two-collar test cut',
    weight: 2,
    evaluate(s, ctx) {
      const t = s.testCuts?.twoCollar;
      if (!t) return notMeasured('no two-collar test cut');
      const collarDistanceMm = toMillimetres(t.collarDistance);
      const r = twoCollarTest({
        setup: t.setup,
        diameterNearHeadstockMm: toMillimetres(t.diameterNearHeadstock),
        diameterNearTailstockMm: toMillimetres(t.diameterNearTailstock),
        collarDistanceMm,
        ...(t.centresDistance ? { centresDistanceMm: toMillimetres(t.centresDistance) } : {}),
      });
      const correction = r.tailstockCorrection
        ? `move the tailstock ${MOVE_WORDS[r.tailstockCorrection.move]} by ${fmt(r.tailstockCorrection.byMm)} mm (${r.tailstockCorrection.basis})`
        : 'work held in the chuck: taper points to headstock alignment or bed wear, not the tailstock';
      return evaluateDeviation({
        deviation: r.radialOffsetMm,
        unit: 'mm',
        permissible: latheLimit('twoCollarConsistency', ctx, t.collarDistance),
        inputs: [
          describeLength('diameter near headstock', t.diameterNearHeadstock),
          describeLength('diameter near tailstock', t.diameterNearTailstock),
          describeLength('collar distance', t.collarDistance),
          `e = (D_tail − D_head)/2 = ${fmt(r.radialOffsetMm)} mm; taper ${fmt(r.taperMmPerM, 4)} mm/m on diameter`,
          correction,
        ],
        what: `Radial offset over ${fmt(collarDistanceMm, 1)} mm`,
        details: {
          setup: t.setup,
          radialOffsetMm: roundTo(r.radialOffsetMm, 5),
          taperMmPerM: roundTo(r.taperMmPerM, 5),
          move: r.tailstockCorrection?.move ?? null,
          moveByMm: r.tailstockCorrection ? roundTo(r.tailstockCorrection.byMm, 5) : null,
        },
      });
    },
  },
  {
    id: 'centre-height',
    subsystem: 'tailstock',
    label: 'Centre height, tailstock to headstock',
    weight: 1.5,
    evaluate(s, ctx) {
      const d = s.tailstock?.centreHeightDifference;
      if (!d) return notMeasured('not measured');
      return evaluateDeviation({
        deviation: toMillimetres(d),
        unit: 'mm',
        permissible: latheLimit('centreHeightDifference', ctx),
        inputs: [describeLength('tailstock minus headstock centre height', d)],
        what: 'Centre height difference',
        resolution: ctx.indicatorResolutionMm,
        wrongDirectionText: 'the tailstock centre may only be higher',
      });
    },
  },
  {
    id: 'quill-condition',
    subsystem: 'tailstock',
    label: 'Quill fit and bore',
    weight: 0.75,
    evaluate(s) {
      const r = s.tailstock?.quillCondition;
      return r === undefined ? notMeasured('not rated') : evaluateRating(r, WEAR_RUBRIC, 'Quill');
    },
  },
  {
    id: 'quill-lock',
    subsystem: 'tailstock',
    label: 'Quill lock',
    weight: 0.5,
    evaluate(s) {
      const st = s.tailstock?.quillLock;
      return st === undefined ? notMeasured('not tried') : evaluateDeviceState(st, 'Quill lock');
    },
  },
];
