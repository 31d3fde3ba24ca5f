import { fmt, joinNumbers, roundTo } from '../format-number';
import { BED_STRAIGHTNESS_BY_LENGTH, bedStraightnessLimitMm } from '../limits/lathe-limits';
import { WEAR_RUBRIC } from '../survey/rubrics';
import { toMillimetres } from '../units/length';
import { describeLength, evaluateDeviation } from './evaluate-against-limit';
import { evaluateRating } from './evaluate-rated';
import { latheLimit } from './lathe-context';
import { notMeasured, type LatheCheck } from './lathe-check';

/** Bed and ways: levelling profile, local straightness, twist, visible wear. */
export const BED_CHECKS: readonly LatheCheck[] = [
  {
    id: 'bed-straightness',
    subsystem: 'bed-and-ways',
    label: 'Bed straightness, vertical plane',
    weight: 3,
    evaluate(survey, ctx) {
      const profile = ctx.bed.profile;
      if (!profile) return notMeasured(ctx.bed.unusableReason ?? 'no longitudinal level readings entered');
      const base = bedStraightnessLimitMm(ctx.distanceBetweenCentresMm);
      const value = roundTo((base * ctx.classFactor), 6);
      const straightnessMm = profile.endPoint.straightnessUm / 1000;
      // Sign for the one-sided rule: a convex (middle high) bed is allowed; a concave stretch
      // anywhere is not, whatever the rest of the profile does. A bed with one fails by the larger
      // of its deepest dip and its overall straightness, so a raised spot elsewhere never helps.
      const concave = profile.shape === 'concave' || profile.shape === 'mixed';
      const signed = concave ? -Math.max(straightnessMm, profile.deepestDipUm / 1000) : straightnessMm;
      const run = survey.bedAndWays!.levelling!;
      return evaluateDeviation({
        deviation: signed,
        unit: 'mm',
        permissible: {
          value,
          unit: 'mm',
          direction: 'positive-only',
          basis: `${fmt(base)} mm for ${fmt(ctx.distanceBetweenCentresMm, 0)} mm between centres${ctx.classFactor === 1 ? '' : ` × ${ctx.classFactor} (${ctx.sizeClassLabel})`}; convex only`,
          source: BED_STRAIGHTNESS_BY_LENGTH.source,
        },
        inputs: [
          `level sensitivity: ${fmt(ctx.levelSensitivityMmPerM ?? 0, 5)} mm/m per division`,
          describeLength('station spacing', run.stationSpacing),
          `readings (divisions): ${joinNumbers(run.longitudinalReadings!)}`,
          `end-point straightness ${fmt(profile.endPoint.straightnessUm, 1)} µm, least-squares ${fmt(profile.leastSquares.straightnessUm, 1)} µm, shape ${profile.shape}`,
          `deepest point below the chord of any stretch: ${fmt(profile.deepestDipUm, 1)} µm`,
        ],
        what: `Bed straightness (end-point reference, ${profile.shape})`,
        resolution: (0.5 * (ctx.levelSensitivityMmPerM ?? 0) * toMillimetres(run.stationSpacing)) / 1000,
        wrongDirectionText: profile.shape === 'mixed' ? 'a concave stretch beside a raised one; a bed may be convex but nowhere concave' : 'a bed may be convex but not concave',
        details: {
          shape: profile.shape,
          deepestDipUm: roundTo(profile.deepestDipUm, 2),
          endPointStraightnessUm: roundTo(profile.endPoint.straightnessUm, 2),
          leastSquaresStraightnessUm: roundTo(profile.leastSquares.straightnessUm, 2),
          formulaProfile: 'z_k = Σ r_i · s · L; deviation = max above + |max below| the reference line',
        },
      });
    },
  },
  {
    id: 'bed-local-straightness',
    subsystem: 'bed-and-ways',
    label: 'Bed straightness, any 250 mm',
    weight: 1.5,
    evaluate(_survey, ctx) {
      const profile = ctx.bed.profile;
      if (!profile) return notMeasured(ctx.bed.unusableReason ?? 'no longitudinal level readings entered');
      if (profile.worstLocalUm === null) {
        // A stretch's straightness is measured against the chord through its end stations; with
        // only two stations in 250 mm the chord passes through both and shows no deviation at all.
        const window = profile.localWindowMm;
        return notMeasured(
          `stations ${fmt(ctx.bed.stationSpacingMm ?? 0, 0)} mm apart leave no station between the ends of a ${window} mm stretch, and a chord through two stations shows no deviation — level again with stations at most ${fmt(window / 2, 0)} mm apart (a level base of ${fmt(window / 2, 0)} mm or less) to judge any ${window} mm`,
        );
      }
      return evaluateDeviation({
        deviation: profile.worstLocalUm / 1000,
        unit: 'mm',
        permissible: latheLimit('bedLocalStraightness', ctx),
        inputs: [`worst straightness of any ${profile.localWindowMm} mm stretch against its own chord: ${fmt(profile.worstLocalUm, 1)} µm`],
        what: 'Worst local straightness',
      });
    },
  },
  {
    id: 'bed-twist',
    subsystem: 'bed-and-ways',
    label: 'Bed twist (transverse level along the bed)',
    weight: 2,
    evaluate(_survey, ctx) {
      const twist = ctx.bed.twist;
      if (!twist) return notMeasured(ctx.bed.unusableReason ?? 'no transverse level readings entered');
      return evaluateDeviation({
        deviation: twist.twistMmPerM,
        unit: 'mm/m',
        permissible: latheLimit('bedTwist', ctx),
        inputs: [`transverse level at each station (mm/m): ${twist.transverseMmPerM.map((v) => fmt(v, 4)).join(', ')}`],
        what: 'Change of transverse level along the bed (max − min)',
      });
    },
  },
  {
    id: 'bed-visual-wear',
    subsystem: 'bed-and-ways',
    label: 'Ways, visible wear and scoring',
    weight: 1,
    evaluate(survey) {
      const r = survey.bedAndWays?.visualWear;
      return r === undefined ? notMeasured('not rated') : evaluateRating(r, WEAR_RUBRIC, 'Ways wear');
    },
  },
  {
    id: 'bed-step-near-chuck',
    subsystem: 'bed-and-ways',
    label: 'Worn step in the ways near the chuck',
    weight: 1,
    evaluate(survey, ctx) {
      const step = survey.bedAndWays?.stepNearChuck;
      if (!step) return notMeasured('step depth not measured');
      return evaluateDeviation({
        deviation: toMillimetres(step),
        unit: 'mm',
        permissible: latheLimit('stepNearChuck', ctx),
        inputs: [describeLength('step depth', step)],
        what: 'Step depth',
      });
    },
  },
  {
    id: 'carriage-wear',
    subsystem: 'bed-and-ways',
    label: 'Carriage fit and gib adjustment',
    weight: 1,
    evaluate(survey) {
      const r = survey.bedAndWays?.carriageWear;
      return r === undefined ? notMeasured('not rated') : evaluateRating(r, WEAR_RUBRIC, 'Carriage wear');
    },
  },
];
