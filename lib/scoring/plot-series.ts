import { roundTo } from './format-number';
import { lineAt } from './measure/least-squares-line';
import type { LatheContext } from './lathe/lathe-context';
import type { CheckResult, PlotSeries, SubsystemResult } from './result';

const round = (n: number, digits = 3) => roundTo(n, digits);

/** Series the report and survey screens plot: bed profile with both reference lines, twist, wear. */
export function plotSeries(
  ctx: LatheContext,
  checks: readonly CheckResult[],
  subsystems: readonly SubsystemResult[],
  bedWear: PlotSeries['bedWear'] = null,
): PlotSeries {
  const profile = ctx.bed.profile;
  const first = profile?.points[0];
  const last = profile?.points[profile.points.length - 1];
  const bedProfile =
    profile && first && last
      ? {
          xUnit: 'mm' as const,
          yUnit: 'µm' as const,
          points: profile.points.map((p) => ({ x: round(p.x, 1), y: round(p.z) })),
          endPointLine: [first, last].map((p) => ({ x: round(p.x, 1), y: round(lineAt(profile.endPoint.line, p.x)) })),
          leastSquaresLine: [first, last].map((p) => ({ x: round(p.x, 1), y: round(lineAt(profile.leastSquares.line, p.x)) })),
          shape: profile.shape,
        }
      : null;
  const twist = ctx.bed.twist;
  const bedTwist = twist
    ? {
        xUnit: 'mm' as const,
        yUnit: 'mm/m' as const,
        // Transverse readings are taken at the stations of the longitudinal run, one level base apart.
        points: twist.transverseMmPerM.map((v, i) => ({ x: round((ctx.bed.stationSpacingMm ?? 0) * i, 1), y: round(v, 5) })),
      }
    : null;
  const checkRatios: PlotSeries['checkRatios'] = [];
  for (const c of checks) {
    if (c.status === 'measured' && c.q !== null && c.band !== null) checkRatios.push({ checkId: c.id, label: c.label, q: c.q, band: c.band });
  }
  const subsystemScores: PlotSeries['subsystemScores'] = [];
  for (const s of subsystems) if (s.score !== null) subsystemScores.push({ subsystem: s.id, label: s.label, score: s.score });
  return { bedProfile, bedTwist, bedWear, checkRatios, subsystemScores };
}
