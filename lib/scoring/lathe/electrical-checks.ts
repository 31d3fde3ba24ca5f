import { fmt } from '../format-number';
import { LATHE_LIMITS } from '../limits/lathe-limits';
import { bandFor, bandWords } from '../grading/bands';
import { CABLE_RUBRIC } from '../survey/rubrics';
import { evaluateDeviation } from './evaluate-against-limit';
import { evaluateDeviceState, evaluateRating } from './evaluate-rated';
import { latheLimit } from './lathe-context';
import { notMeasured, type LatheCheck } from './lathe-check';

/**
 * Electrical and safety. Any failure here is a safety finding ("fix before use") whatever the grade:
 * the repair belongs to a qualified electrician and the maker's instructions and local codes rule.
 */
const FIX = 'fix before use';

/** Insulation readings below this are treated as this value so q stays finite (a dead short). */
const SHORT_CIRCUIT_MOHM = 0.001;

export const ELECTRICAL_CHECKS: readonly LatheCheck[] = [
  {
    id: 'emergency-stop',
    subsystem: 'electrical-and-safety',
    label: 'Emergency stop',
    weight: 2,
    evaluate(s) {
      const st = s.electricalAndSafety?.emergencyStop;
      return st === undefined ? notMeasured('not tried') : evaluateDeviceState(st, 'Emergency stop', FIX);
    },
  },
  {
    id: 'chuck-guard-interlock',
    subsystem: 'electrical-and-safety',
    label: 'Chuck guard and interlock',
    weight: 1.5,
    evaluate(s) {
      const st = s.electricalAndSafety?.chuckGuardInterlock;
      return st === undefined ? notMeasured('not tried') : evaluateDeviceState(st, 'Chuck guard interlock', FIX);
    },
  },
  {
    id: 'brake-function',
    subsystem: 'electrical-and-safety',
    label: 'Spindle brake works',
    weight: 1,
    evaluate(s) {
      const st = s.electricalAndSafety?.brakeWorks;
      return st === undefined ? notMeasured('not tried') : evaluateDeviceState(st, 'Spindle brake', FIX);
    },
  },
  {
    id: 'brake-stopping-time',
    subsystem: 'electrical-and-safety',
    label: 'Spindle brake stopping time',
    weight: 1,
    evaluate(s, ctx) {
      const t = s.electricalAndSafety?.brakeStoppingTime;
      if (!t) return notMeasured('not timed');
      return evaluateDeviation({
        deviation: t.value,
        unit: 's',
        permissible: latheLimit('brakeStoppingTime', ctx),
        inputs: [`stopping time from top speed: ${fmt(t.value, 1)} s`],
        what: 'Stopping time',
        safetyFindingWhenOver: `spindle takes ${fmt(t.value, 1)} s to stop: ${FIX}`,
      });
    },
  },
  {
    id: 'earth-continuity',
    subsystem: 'electrical-and-safety',
    label: 'Protective-earth continuity',
    weight: 1.5,
    evaluate(s, ctx) {
      const r = s.electricalAndSafety?.earthContinuity;
      if (!r) return notMeasured('not measured (qualified person only)');
      return evaluateDeviation({
        deviation: r.value,
        unit: 'Ω',
        permissible: latheLimit('earthContinuity', ctx),
        inputs: [`protective-earth resistance: ${fmt(r.value, 3)} Ω`],
        what: 'Earth continuity resistance',
        safetyFindingWhenOver: `protective earth ${fmt(r.value, 3)} Ω, above ${LATHE_LIMITS.earthContinuity.value} Ω: ${FIX}`,
      });
    },
  },
  {
    id: 'insulation-resistance',
    subsystem: 'electrical-and-safety',
    label: 'Insulation resistance',
    weight: 1.5,
    evaluate(s, ctx) {
      const r = s.electricalAndSafety?.insulationResistance;
      if (!r) return notMeasured('not measured (qualified person only)');
      const limit = latheLimit('insulationResistance', ctx);
      // A minimum, not a maximum: q = required / measured, so half the required resistance is q = 2.
      const q = limit.value / Math.max(r.value, SHORT_CIRCUIT_MOHM);
      const band = bandFor(q);
      return {
        measured: { value: r.value, unit: 'MΩ' },
        permissible: { ...limit, basis: `at least ${limit.value} MΩ at 500 V DC` },
        q,
        inputs: [`insulation resistance: ${fmt(r.value, 3)} MΩ`],
        formula: `q = required / measured = ${limit.value}/${fmt(Math.max(r.value, SHORT_CIRCUIT_MOHM), 3)} = ${fmt(q, 3)}`,
        summary: `Insulation ${fmt(r.value, 2)} MΩ against at least ${limit.value} MΩ: ${bandWords(band)}.`,
        ...(q > 1 ? { safetyFinding: `insulation resistance ${fmt(r.value, 3)} MΩ, below ${limit.value} MΩ: ${FIX}` } : {}),
      };
    },
  },
  {
    id: 'covers',
    subsystem: 'electrical-and-safety',
    label: 'Guards and covers in place',
    weight: 0.5,
    evaluate(s) {
      const st = s.electricalAndSafety?.coversInPlace;
      return st === undefined ? notMeasured('not checked') : evaluateDeviceState(st, 'Guards and covers', FIX);
    },
  },
  {
    id: 'cables',
    subsystem: 'electrical-and-safety',
    label: 'Cables and glands',
    weight: 0.5,
    evaluate(s) {
      const r = s.electricalAndSafety?.cables;
      if (r === undefined) return notMeasured('not rated');
      const e = evaluateRating(r, CABLE_RUBRIC, 'Cables');
      // Damaged sheaths or loose glands (rating 3) expose live parts.
      return r >= 3 ? { ...e, safetyFinding: `cable sheaths or glands damaged: ${FIX}` } : e;
    },
  },
];
