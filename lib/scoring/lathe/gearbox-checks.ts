import { fmt, roundTo } from '../format-number';
import { ratioFromKnots, type RatioKnot } from '../measure/deviation-ratio';
import { bandWordsFor } from '../grading/bands';
import { ratioForRating } from '../grading/rubric-ratios';
import { practice } from '../source-marks';
import { DEBRIS_RUBRIC, WEAR_RUBRIC } from '../survey/rubrics';
import { evaluateDeviceState, evaluateOilLevel, evaluateRating } from './evaluate-rated';
import { notMeasured, type LatheCheck } from './lathe-check';

/**
 * Gear noise by speed range, as a rating and/or a sound level at 1 m. Sound-level knots are a
 * Waygrade shop rule (common practice): 70 dB(A) → q 0.5, 78 → 1, 85 → 2 (a gear train that is
 * audibly louder than a quiet workshop conversation over several metres is worn).
 */
export const GEAR_NOISE_KNOTS: readonly RatioKnot[] = [
  { value: 70, q: 0.5 },
  { value: 78, q: 1 },
  { value: 85, q: 2 },
];

export const GEARBOX_CHECKS: readonly LatheCheck[] = [
  {
    id: 'gearbox-oil-level',
    subsystem: 'gearbox-and-feeds',
    label: 'Gearbox oil level',
    weight: 0.5,
    evaluate(s) {
      const l = s.gearboxAndFeeds?.sightGlassOilLevel;
      return l === undefined ? notMeasured('not checked') : evaluateOilLevel(l, 'Gearbox oil level');
    },
  },
  {
    id: 'gearbox-drain-debris',
    subsystem: 'gearbox-and-feeds',
    label: 'Debris at the gearbox drain plug',
    weight: 1,
    evaluate(s) {
      const r = s.gearboxAndFeeds?.drainPlugDebris;
      return r === undefined ? notMeasured('not rated') : evaluateRating(r, DEBRIS_RUBRIC, 'Drain-plug debris');
    },
  },
  {
    id: 'gear-noise',
    subsystem: 'gearbox-and-feeds',
    label: 'Gear noise by speed range',
    weight: 1.5,
    evaluate(s) {
      const ranges = s.gearboxAndFeeds?.noiseBySpeedRange?.filter((r) => r.rating !== undefined || r.soundLevel);
      if (!ranges?.length) return notMeasured('no speed range rated');
      const perRange = ranges.map((r) => {
        const byRating = r.rating === undefined ? 0 : ratioForRating(r.rating);
        const bySound = r.soundLevel ? ratioFromKnots(r.soundLevel.value, GEAR_NOISE_KNOTS) : 0;
        return { range: r.range, q: Math.max(byRating, bySound), rating: r.rating, db: r.soundLevel?.value };
      });
      const worst = perRange.reduce((a, b) => (b.q > a.q ? b : a));
      return {
        measured: { value: roundTo(worst.q, 4), unit: 'q of noisiest range', text: worst.range },
        permissible: {
          value: 1,
          unit: 'q of noisiest range',
          direction: 'both',
          basis: 'rating 1 or better, and 78 dB(A) at 1 m or less',
          source: practice('Waygrade noise rubric and sound-level knots'),
        },
        q: worst.q,
        inputs: perRange.map(
          (r) => `${r.range}: ${r.rating === undefined ? '' : `rating ${r.rating}`}${r.rating !== undefined && r.db !== undefined ? ', ' : ''}${r.db === undefined ? '' : `${fmt(r.db, 1)} dB(A)`} → q ${fmt(r.q, 3)}`,
        ),
        formula: 'per range q = max(rating ratio, sound-level ratio); check q = worst range',
        summary: `Noisiest range "${worst.range}": ${bandWordsFor(worst.q)}.`,
        details: { noisiestRange: worst.range },
      };
    },
  },
  {
    id: 'feeds-engage',
    subsystem: 'gearbox-and-feeds',
    label: 'Feed ranges engage',
    weight: 1,
    evaluate(s) {
      const st = s.gearboxAndFeeds?.feedsEngage;
      return st === undefined ? notMeasured('not tried') : evaluateDeviceState(st, 'Feed ranges');
    },
  },
  {
    id: 'thread-ranges-engage',
    subsystem: 'gearbox-and-feeds',
    label: 'Thread ranges engage',
    weight: 1,
    evaluate(s) {
      const st = s.gearboxAndFeeds?.threadRangesEngage;
      return st === undefined ? notMeasured('not tried') : evaluateDeviceState(st, 'Thread ranges');
    },
  },
  {
    id: 'half-nut',
    subsystem: 'gearbox-and-feeds',
    label: 'Half-nut',
    weight: 0.75,
    evaluate(s) {
      const r = s.gearboxAndFeeds?.halfNut;
      return r === undefined ? notMeasured('not rated') : evaluateRating(r, WEAR_RUBRIC, 'Half-nut');
    },
  },
  {
    id: 'feed-clutch',
    subsystem: 'gearbox-and-feeds',
    label: 'Feed clutch',
    weight: 0.5,
    evaluate(s) {
      const r = s.gearboxAndFeeds?.feedClutch;
      return r === undefined ? notMeasured('not rated') : evaluateRating(r, WEAR_RUBRIC, 'Feed clutch');
    },
  },
];
