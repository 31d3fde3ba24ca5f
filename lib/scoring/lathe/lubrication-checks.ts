import { fmt, roundTo } from '../format-number';
import { checkViscosityGrade, iso3448Range } from '../measure/iso3448';
import { formatIso4406, iso4406Code, iso4406Range } from '../measure/iso4406';
import { LATHE_LIMITS, LATHE_OIL_TARGET } from '../limits/lathe-limits';
import { bandWordsFor } from '../grading/bands';
import { DEBRIS_RUBRIC, FILTER_SCREEN_RUBRIC, LEAK_RUBRIC, OIL_CONDITION_RUBRIC } from '../survey/rubrics';
import { evaluateDeviceState, evaluateOilLevel, evaluateRating } from './evaluate-rated';
import { notMeasured, type LatheCheck } from './lathe-check';

/** Headstock lubrication: level, condition, debris, pump, oil sample (ISO 4406, ISO 3448, water). */

const SIZES = ['atLeast4um', 'atLeast6um', 'atLeast14um'] as const;

export const LUBRICATION_CHECKS: readonly LatheCheck[] = [
  {
    id: 'headstock-oil-level',
    subsystem: 'spindle-and-headstock',
    label: 'Headstock oil level',
    weight: 0.5,
    evaluate(s) {
      const l = s.lubrication?.headstockOilLevel;
      return l === undefined ? notMeasured('not checked') : evaluateOilLevel(l, 'Headstock oil level');
    },
  },
  {
    id: 'headstock-oil-condition',
    subsystem: 'spindle-and-headstock',
    label: 'Headstock oil colour and sludge',
    weight: 0.5,
    evaluate(s) {
      const r = s.lubrication?.oilCondition;
      return r === undefined ? notMeasured('not rated') : evaluateRating(r, OIL_CONDITION_RUBRIC, 'Headstock oil');
    },
  },
  {
    id: 'headstock-metal-particles',
    subsystem: 'spindle-and-headstock',
    label: 'Metal particles in the headstock',
    weight: 1,
    evaluate(s) {
      const r = s.lubrication?.metalParticles;
      return r === undefined ? notMeasured('not rated') : evaluateRating(r, DEBRIS_RUBRIC, 'Headstock metal debris');
    },
  },
  {
    id: 'oil-pump',
    subsystem: 'spindle-and-headstock',
    label: 'Oil pump and pressure lines',
    weight: 0.5,
    evaluate(s) {
      const st = s.lubrication?.pumpWorking;
      return st === undefined ? notMeasured('not checked') : evaluateDeviceState(st, 'Oil pump');
    },
  },
  {
    id: 'oil-filter-screen',
    subsystem: 'spindle-and-headstock',
    label: 'Oil filter screen',
    weight: 0.25,
    evaluate(s) {
      const r = s.lubrication?.filterScreen;
      return r === undefined ? notMeasured('not rated') : evaluateRating(r, FILTER_SCREEN_RUBRIC, 'Filter screen');
    },
  },
  {
    id: 'oil-leaks',
    subsystem: 'spindle-and-headstock',
    label: 'Headstock oil leaks',
    weight: 0.25,
    evaluate(s) {
      const r = s.lubrication?.leaks;
      return r === undefined ? notMeasured('not rated') : evaluateRating(r, LEAK_RUBRIC, 'Leaks');
    },
  },
  {
    id: 'oil-cleanliness',
    subsystem: 'spindle-and-headstock',
    label: 'Oil cleanliness (ISO 4406)',
    weight: 0.5,
    evaluate(s) {
      const counts = s.lubrication?.oilSample?.particlesPerMl;
      if (!counts) return notMeasured('no particle count');
      const values = {
        atLeast4um: counts.atLeast4um.value,
        atLeast6um: counts.atLeast6um.value,
        atLeast14um: counts.atLeast14um.value,
      };
      const code = iso4406Code(values);
      // q: the worst count as a multiple of the upper limit of its target scale number, so one
      // scale number above target (twice the particles) is q ≈ 2.
      const ratios = SIZES.map((k) => values[k] / iso4406Range(LATHE_OIL_TARGET[k]).upTo!);
      const q = Math.max(...ratios);
      const target = formatIso4406(LATHE_OIL_TARGET);
      return {
        measured: { value: roundTo(q, 4), unit: 'multiple of target count', text: formatIso4406(code) },
        permissible: {
          value: 1,
          unit: 'multiple of target count',
          direction: 'both',
          basis: `target code ${target}`,
          source: LATHE_LIMITS.oilCleanliness.source,
        },
        q,
        inputs: [`particles per mL ≥4/≥6/≥14 µm(c): ${values.atLeast4um}/${values.atLeast6um}/${values.atLeast14um}`],
        formula: `code by ISO 4406:1999 Table 1 = ${formatIso4406(code)}; q = max(count / upper limit of target scale number) = ${fmt(q, 3)}`,
        summary: `Oil cleanliness ${formatIso4406(code)} against target ${target}: ${bandWordsFor(q)}.`,
        details: { iso4406: formatIso4406(code), target },
      };
    },
  },
  {
    id: 'oil-viscosity',
    subsystem: 'spindle-and-headstock',
    label: 'Oil viscosity against its ISO 3448 grade',
    weight: 0.25,
    evaluate(s) {
      const sample = s.lubrication?.oilSample;
      if (!sample?.viscosityAt40C || sample.declaredGrade === undefined) return notMeasured('viscosity or declared grade not given');
      const range = iso3448Range(sample.declaredGrade);
      if (!range) return notMeasured(`VG ${sample.declaredGrade} is not an ISO 3448 grade`);
      const v = sample.viscosityAt40C.value;
      const result = checkViscosityGrade(v, sample.declaredGrade);
      const q = Math.abs(result.relativeDeviation) / LATHE_LIMITS.viscosity.value;
      return {
        measured: { value: v, unit: 'mm²/s' },
        permissible: {
          value: sample.declaredGrade,
          unit: 'mm²/s',
          direction: 'both',
          basis: `VG ${sample.declaredGrade}: ${range.min}–${range.max} mm²/s at 40 °C`,
          source: LATHE_LIMITS.viscosity.source,
        },
        q,
        inputs: [`viscosity at 40 °C: ${fmt(v, 2)} mm²/s`, `declared grade: VG ${sample.declaredGrade}`],
        formula: `q = |ν/VG − 1| / 0.10 = |${fmt(v, 2)}/${sample.declaredGrade} − 1| / 0.10 = ${fmt(q, 3)}`,
        summary: `Viscosity ${fmt(v, 2)} mm²/s is ${result.withinGrade ? 'within' : 'outside'} VG ${sample.declaredGrade}: ${bandWordsFor(q)}.`,
        details: { withinGrade: result.withinGrade },
      };
    },
  },
  {
    id: 'oil-water',
    subsystem: 'spindle-and-headstock',
    label: 'Water in the oil',
    weight: 0.5,
    evaluate(s) {
      const water = s.lubrication?.oilSample?.waterSeen;
      if (water === undefined) return notMeasured('not checked');
      // Water in gear oil rusts bearings and gears: treated like a worn finding (common practice).
      const q = water ? 3 : 0.25;
      return {
        measured: { value: water ? 1 : 0, unit: 'seen (1) / not (0)', text: water ? 'water seen' : 'none seen' },
        permissible: {
          value: 0,
          unit: 'seen (1) / not (0)',
          direction: 'both',
          basis: 'no free or emulsified water',
          source: { kind: 'practice', reference: 'water in gear oil calls for an oil change and a look at seals' },
        },
        q,
        inputs: [`water seen: ${water ? 'yes' : 'no'}`],
        formula: `seen → q 3, not seen → q 0.25: q = ${q}`,
        summary: water ? 'Water seen in the oil: change oil, find the source.' : 'No water seen in the oil.',
        details: { waterSeen: water },
      };
    },
  },
];
