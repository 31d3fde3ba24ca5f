'use client';

import { BedProfilePlot } from '@/components/charts/bed-profile-plot';
import { bedTwist, levelProfile } from '@/lib/scoring/measure/level-profile';
import { toMillimetres, type Length } from '@/lib/scoring/units/length';
import { toMillimetresPerMetre, type Slope } from '@/lib/scoring/units/slope';

const SHAPE_WORDS = { convex: 'Convex — middle high (allowed)', concave: 'Concave — middle low (not allowed)', mixed: 'A concave stretch beside a raised one (not allowed)', straight: 'Straight within the level’s step' } as const;

/**
 * The bed profile redrawn with every reading typed: heights by cumulative sum of the level readings,
 * with the end-point and least-squares lines, straightness both ways and twist.
 */
export function BedLiveResults({ readings, transverse, spacing, sensitivity }: { readings: readonly number[] | undefined; transverse: readonly number[] | undefined; spacing: Length | undefined; sensitivity: Slope | undefined }) {
  if (!sensitivity?.value || !spacing?.value) {
    return <p className="rounded-lg bg-paper-sunken px-3 py-3 text-ink-soft">The profile appears here once the level sensitivity (first screen) and the distance between stations are set.</p>;
  }
  if (!readings || readings.length < 1) {
    return <p className="rounded-lg bg-paper-sunken px-3 py-3 text-ink-soft">Type the first reading along the bed to start the profile.</p>;
  }
  const sensitivityMmPerM = toMillimetresPerMetre(sensitivity);
  const profile = levelProfile({ readingsDivisions: readings, sensitivityMmPerM, stationSpacingMm: toMillimetres(spacing), resolutionUm: 1 });
  const first = profile.points[0]!;
  const last = profile.points[profile.points.length - 1]!;
  const lineAt = (line: { slope: number; intercept: number }, x: number) => line.slope * x + line.intercept;
  const series = {
    xUnit: 'mm' as const,
    yUnit: 'µm' as const,
    points: profile.points.map((p) => ({ x: p.x, y: p.z })),
    endPointLine: [first, last].map((p) => ({ x: p.x, y: lineAt(profile.endPoint.line, p.x) })),
    leastSquaresLine: [first, last].map((p) => ({ x: p.x, y: lineAt(profile.leastSquares.line, p.x) })),
    shape: profile.shape,
  };
  const twist = transverse && transverse.length >= 2 ? bedTwist(transverse, sensitivityMmPerM) : null;
  return (
    <div className="flex flex-col gap-3" data-testid="bed-live-results">
      <BedProfilePlot series={series} />
      <dl className="figures grid grid-cols-2 gap-x-4 gap-y-2">
        <dt className="text-ink-soft">Straightness, end points</dt>
        <dd className="text-right text-lg font-semibold">{profile.endPoint.straightnessUm.toFixed(1)} µm</dd>
        <dt className="text-ink-soft">Straightness, least squares</dt>
        <dd className="text-right text-lg font-semibold">{profile.leastSquares.straightnessUm.toFixed(1)} µm</dd>
        <dt className="text-ink-soft">Shape</dt>
        <dd className="text-right font-semibold">{SHAPE_WORDS[profile.shape]}</dd>
        {twist ? (
          <>
            <dt className="text-ink-soft">Twist along the bed</dt>
            <dd className="text-right text-lg font-semibold">{twist.twistMmPerM.toFixed(3)} mm/m</dd>
          </>
        ) : null}
      </dl>
    </div>
  );
}
