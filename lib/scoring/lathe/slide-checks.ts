import { fmt } from '../format-number';
import { backlashMm } from '../measure/backlash';
import { faceShape } from '../measure/facing';
import { DIAL_RUBRIC, WEAR_RUBRIC } from '../survey/rubrics';
import type { ParsedLatheSurvey } from '../survey/lathe-survey';
import { toMillimetres } from '../units/length';
import { describeLength, evaluateDeviation } from './evaluate-against-limit';
import { evaluateRating } from './evaluate-rated';
import { latheLimit } from './lathe-context';
import { notMeasured, type LatheCheck } from './lathe-check';

/** Slides and screws: backlash, leadscrew end play, slide wear, and the facing test cut. */

type BacklashEntry = NonNullable<NonNullable<ParsedLatheSurvey['slidesAndScrews']>['crossSlideBacklash']>;

function backlashInputs(entry: BacklashEntry): { mm: number; inputs: string[] } {
  if (entry.method === 'length') {
    return { mm: toMillimetres(entry.backlash), inputs: [describeLength('backlash', entry.backlash)] };
  }
  const graduationMm = toMillimetres(entry.graduation);
  const mm = backlashMm({ method: 'dial', divisions: entry.divisions, graduationMm, readsDiameter: entry.readsDiameter });
  return {
    mm,
    inputs: [
      `${fmt(entry.divisions, 2)} divisions × ${describeLength('graduation', entry.graduation).replace('graduation: ', '')}${entry.readsDiameter ? ' × ½ (dial reads diameter)' : ''} = ${fmt(mm)} mm`,
    ],
  };
}

function backlashCheck(id: string, label: string, weight: number, key: 'crossSlideBacklash' | 'topSlideBacklash'): LatheCheck {
  return {
    id,
    subsystem: 'slides-and-screws',
    label,
    weight,
    evaluate(s, ctx) {
      const entry = s.slidesAndScrews?.[key];
      if (!entry) return notMeasured('not measured');
      const { mm, inputs } = backlashInputs(entry);
      return evaluateDeviation({ deviation: mm, unit: 'mm', permissible: latheLimit('slideBacklash', ctx), inputs, what: label });
    },
  };
}

export const SLIDE_CHECKS: readonly LatheCheck[] = [
  backlashCheck('cross-slide-backlash', 'Cross-slide screw backlash', 1.5, 'crossSlideBacklash'),
  backlashCheck('top-slide-backlash', 'Top-slide screw backlash', 1, 'topSlideBacklash'),
  {
    id: 'leadscrew-end-play',
    subsystem: 'slides-and-screws',
    label: 'Leadscrew end play',
    weight: 1,
    evaluate(s, ctx) {
      const play = s.slidesAndScrews?.leadscrewEndPlay;
      if (!play) return notMeasured('not measured');
      return evaluateDeviation({
        deviation: toMillimetres(play),
        unit: 'mm',
        permissible: latheLimit('leadscrewEndPlay', ctx),
        inputs: [describeLength('end play', play)],
        what: 'Leadscrew end play',
      });
    },
  },
  {
    id: 'slide-wear',
    subsystem: 'slides-and-screws',
    label: 'Slide dovetails and gibs',
    weight: 1,
    evaluate(s) {
      const r = s.slidesAndScrews?.slideWear;
      return r === undefined ? notMeasured('not rated') : evaluateRating(r, WEAR_RUBRIC, 'Slide wear');
    },
  },
  {
    id: 'dials',
    subsystem: 'slides-and-screws',
    label: 'Feed dials',
    weight: 0.25,
    evaluate(s) {
      const r = s.slidesAndScrews?.dials;
      return r === undefined ? notMeasured('not rated') : evaluateRating(r, DIAL_RUBRIC, 'Dials');
    },
  },
  {
    id: 'facing-test',
    subsystem: 'slides-and-screws',
    label: 'Facing test (concave only)',
    weight: 1.5,
    evaluate(s, ctx) {
      const facing = s.testCuts?.facing;
      if (!facing) return notMeasured('no facing test cut');
      const diameterMm = toMillimetres(facing.diameter);
      const deviation = toMillimetres(facing.centreDeviation);
      return evaluateDeviation({
        deviation,
        unit: 'mm',
        // Stated over a 300 mm diameter; a face is judged over its radius, so the proportional
        // rule is applied to the diameter as the stated length is.
        permissible: latheLimit('facing', ctx, facing.diameter),
        inputs: [describeLength('faced diameter', facing.diameter), describeLength('centre deviation (+ = concave)', facing.centreDeviation)],
        what: `Facing over Ø${fmt(diameterMm, 1)} mm (${faceShape(deviation)})`,
        resolution: ctx.indicatorResolutionMm,
        wrongDirectionText: 'a faced surface may only be concave',
        details: { shape: faceShape(deviation) },
      });
    },
  },
];
