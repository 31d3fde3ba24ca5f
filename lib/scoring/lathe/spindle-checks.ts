import { fmt } from '../format-number';
import { ratioFromKnots } from '../measure/deviation-ratio';
import {
  ISO_10816_1_BOUNDARIES,
  vibrationClassForMotorPower,
  vibrationRatioKnots,
  vibrationZone,
} from '../measure/vibration-zone';
import { LATHE_LIMITS } from '../limits/lathe-limits';
import { bandWordsFor } from '../grading/bands';
import { src } from '../source-marks';
import { toMillimetres, type Length } from '../units/length';
import { describeLength, evaluateDeviation } from './evaluate-against-limit';
import { latheLimit, type LatheContext } from './lathe-context';
import { notMeasured, type LatheCheck } from './lathe-check';
import type { LatheLimitId } from '../limits/lathe-limits';

/** Spindle geometry, play, heat and vibration. */

function plainLengthCheck(
  id: string,
  label: string,
  weight: number,
  limit: LatheLimitId,
  pick: (s: Parameters<LatheCheck['evaluate']>[0]) => Length | undefined,
): LatheCheck {
  return {
    id,
    subsystem: 'spindle-and-headstock',
    label,
    weight,
    evaluate(survey, ctx) {
      const length = pick(survey);
      if (!length) return notMeasured('not measured');
      return evaluateDeviation({
        deviation: toMillimetres(length),
        unit: 'mm',
        permissible: latheLimit(limit, ctx),
        inputs: [describeLength(label, length)],
        what: label,
      });
    },
  };
}

function parallelismCheck(
  id: string,
  label: string,
  limit: 'spindleParallelismVertical' | 'spindleParallelismHorizontal',
  plane: 'parallelismVertical' | 'parallelismHorizontal',
  wrongWay: string,
): LatheCheck {
  return {
    id,
    subsystem: 'spindle-and-headstock',
    label,
    weight: 1.5,
    evaluate(survey, ctx: LatheContext) {
      const reading = survey.spindle?.[plane];
      if (!reading) return notMeasured('not measured');
      const overMm = toMillimetres(reading.over);
      return evaluateDeviation({
        deviation: toMillimetres(reading.deviation),
        unit: 'mm',
        permissible: latheLimit(limit, ctx, reading.over),
        inputs: [describeLength('deviation at the free end', reading.deviation), describeLength('over', reading.over)],
        what: `${label} over ${fmt(overMm, 1)} mm`,
        resolution: ctx.indicatorResolutionMm,
        wrongDirectionText: wrongWay,
      });
    },
  };
}

/** Common-practice temperature limit in kelvin; no class factor applies. */
const TEMPERATURE_LIMIT = LATHE_LIMITS.spindleTemperatureRise;

export const SPINDLE_CHECKS: readonly LatheCheck[] = [
  plainLengthCheck('spindle-nose-runout', 'Spindle nose run-out', 2, 'spindleNoseRunout', (s) => s.spindle?.noseRunout),
  plainLengthCheck('test-bar-runout-nose', 'Test bar run-out at the nose', 2, 'testBarRunoutAtNose', (s) => s.spindle?.testBarRunoutAtNose),
  {
    id: 'test-bar-runout-far',
    subsystem: 'spindle-and-headstock',
    label: 'Test bar run-out away from the nose',
    weight: 2,
    evaluate(survey, ctx) {
      const far = survey.spindle?.testBarRunoutFar;
      if (!far) return notMeasured('not measured');
      const distanceMm = toMillimetres(far.distanceFromNose);
      return evaluateDeviation({
        deviation: toMillimetres(far.runout),
        unit: 'mm',
        permissible: latheLimit('testBarRunoutFar', ctx, far.distanceFromNose),
        inputs: [describeLength('run-out', far.runout), describeLength('distance from the nose', far.distanceFromNose)],
        what: `Test bar run-out ${fmt(distanceMm, 0)} mm out`,
      });
    },
  },
  plainLengthCheck('spindle-axial-slip', 'Spindle axial slip', 1.5, 'spindleAxialSlip', (s) => s.spindle?.axialSlip),
  {
    id: 'spindle-lift-play',
    subsystem: 'spindle-and-headstock',
    label: 'Spindle bearing lift play',
    weight: 1.5,
    evaluate(survey, ctx) {
      const play = survey.spindle?.liftPlay;
      if (!play) return notMeasured('not measured');
      // The limit depends on the bearings: a plain-bearing spindle runs with a working clearance,
      // a preloaded rolling-bearing one shows next to none.
      const bearings = survey.spindle?.bearings;
      const limit = bearings === 'rolling' ? 'spindleLiftPlayRolling' : 'spindleLiftPlay';
      const bearingText = bearings === undefined
        ? 'bearing type not stated: judged by the plain-bearing limit; a rolling-bearing spindle should show next to none'
        : `${bearings} bearings`;
      return evaluateDeviation({
        deviation: toMillimetres(play),
        unit: 'mm',
        permissible: latheLimit(limit, ctx),
        inputs: [describeLength('Spindle bearing lift play', play), bearingText],
        what: 'Spindle bearing lift play',
        details: { bearings: bearings ?? null },
      });
    },
  },
  parallelismCheck(
    'spindle-parallelism-vertical',
    'Spindle axis to carriage, vertical',
    'spindleParallelismVertical',
    'parallelismVertical',
    'the free end may only rise',
  ),
  parallelismCheck(
    'spindle-parallelism-horizontal',
    'Spindle axis to carriage, horizontal',
    'spindleParallelismHorizontal',
    'parallelismHorizontal',
    'the free end may only point toward the tool',
  ),
  {
    id: 'spindle-temperature-rise',
    subsystem: 'spindle-and-headstock',
    label: 'Spindle bearing temperature rise',
    weight: 0.5,
    evaluate(survey, ctx) {
      const rise = survey.spindle?.temperatureRise;
      if (!rise) return notMeasured('not measured');
      return evaluateDeviation({
        // A fall in temperature is no sign of wear: only a rise counts.
        deviation: Math.max(0, rise.value),
        unit: 'K',
        permissible: latheLimit('spindleTemperatureRise', ctx),
        inputs: [`temperature rise after running: ${fmt(rise.value, 1)} K (limit ${TEMPERATURE_LIMIT.value} K)`],
        what: 'Temperature rise',
      });
    },
  },
  {
    id: 'spindle-vibration',
    subsystem: 'spindle-and-headstock',
    label: 'Headstock vibration (ISO 10816-1 zone)',
    weight: 1,
    evaluate(survey, ctx) {
      const v = survey.spindle?.vibration;
      if (!v) return notMeasured('not measured');
      const klass = vibrationClassForMotorPower(ctx.motorKw ?? undefined);
      const b = ISO_10816_1_BOUNDARIES[klass];
      const zone = vibrationZone(v.value, klass);
      const q = ratioFromKnots(v.value, vibrationRatioKnots(klass));
      return {
        measured: { value: v.value, unit: 'mm/s', text: `zone ${zone}` },
        permissible: {
          value: b.bc,
          unit: 'mm/s',
          direction: 'both',
          basis: `class ${klass} boundaries A/B ${b.ab}, B/C ${b.bc}, C/D ${b.cd} mm/s RMS${ctx.motorKw === null ? ' (class I assumed: motor power not given)' : ` (motor ${fmt(ctx.motorKw, 2)} kW)`}`,
          source: src(`ISO 10816-1 Annex B, class ${klass}`),
        },
        q,
        inputs: [`vibration velocity: ${fmt(v.value, 2)} mm/s RMS`],
        formula: `q interpolated through A/B → 0.5, B/C → 1, C/D → 2: q = ${fmt(q, 3)}`,
        summary: `Vibration ${fmt(v.value, 2)} mm/s is zone ${zone} for class ${klass}: ${bandWordsFor(q)}.`,
        details: { zone, vibrationClass: klass },
      };
    },
  },
];
