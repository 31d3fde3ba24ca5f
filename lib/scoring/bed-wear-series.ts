import { roundTo } from './format-number';
import { wayWearProfile } from './measure/way-wear';
import type { PlotSeries } from './result';
import type { ParsedLatheSurvey } from './survey/lathe-survey';
import { toMillimetres } from './units/length';

/**
 * The wear profile plotted beside the level profile: way wear in µm at each thickness station, and
 * where the locked carriage binds (wear near the chuck leaves the far end of the ways thicker, so a
 * lightly locked carriage moved toward the tailstock binds where the unworn ways begin).
 */
export function bedWearSeries(survey: ParsedLatheSurvey): PlotSeries['bedWear'] {
  const bed = survey.bedAndWays;
  const stations = bed?.wayThickness?.stations.map((s) => ({ xMm: toMillimetres(s.distanceFromHeadstock), thicknessMm: toMillimetres(s.thickness) }));
  const wear = stations ? wayWearProfile(stations) : null;
  const lock = bed?.carriageLockTest;
  const bindsAt = lock ? roundTo(toMillimetres(lock.bindsAtFromHeadstock), 1) : null;
  if (!wear && bindsAt === null) return null;
  return {
    xUnit: 'mm',
    yUnit: 'µm',
    points: wear ? wear.points.map((p) => ({ x: roundTo(p.xMm, 1), y: roundTo(p.wearMm * 1000, 1) })) : [],
    carriageBindsAtMm: bindsAt,
  };
}

/** States how warm the machine was for the readings, because run-out, noise and heat depend on it. */
export function powerRunNotice(survey: ParsedLatheSurvey): string | null {
  const run = survey.powerRun;
  if (!run) return null;
  const minutes = run.minutesRunBeforeReadings;
  return `Power run: the machine was ${run.startState} at the start and ran ${minutes} min before the readings were taken.`;
}
