import { Circle, Polyline, Text, View } from '@react-pdf/renderer';
import type { PlotSeries } from '@/lib/scoring';
import { LegendItem, PlotFrame } from './plot-frame';
import { niceTicks } from './plot-scale';
import { COLOURS, CONTENT_WIDTH, styles } from './theme';

type BedProfile = NonNullable<PlotSeries['bedProfile']>;

const SHAPE_WORDS: Record<BedProfile['shape'], string> = {
  convex: 'convex (middle high), the direction the limit allows',
  concave: 'concave (middle low), the direction the limit does not allow',
  mixed: 'concave over a stretch beside a raised one; the limit allows no concave stretch anywhere',
  straight: 'straight within the reading resolution',
};

/** The bed's height profile from the level readings, with the end-point and least-squares reference lines. */
export function BedProfilePlot({ profile }: { profile: BedProfile }) {
  const xs = profile.points.map((p) => p.x);
  const ys = [...profile.points, ...profile.endPointLine, ...profile.leastSquaresLine].map((p) => p.y);
  const xTicks = niceTicks(Math.min(...xs), Math.max(...xs), 6);
  const yTicks = niceTicks(Math.min(0, ...ys), Math.max(0, ...ys), 5);
  const geometry = { width: CONTENT_WIDTH, height: 185, left: 38, right: 8, top: 14, bottom: 26 };
  const polyline = (points: { x: number; y: number }[], x: (v: number) => number, y: (v: number) => number) =>
    points.map((p) => `${x(p.x).toFixed(2)},${y(p.y).toFixed(2)}`).join(' ');
  return (
    <View wrap={false} style={{ marginTop: 10 }}>
      <Text style={styles.h3}>Bed profile along the ways</Text>
      <Text style={{ ...styles.small, marginBottom: 6 }}>
        Heights from the level readings, summed station by station. The profile is {SHAPE_WORDS[profile.shape]}.
      </Text>
      <PlotFrame geometry={geometry} xTicks={xTicks} yTicks={yTicks} xLabel="Distance from the headstock end (mm)" yLabel="Height (µm)">
        {(x, y) => (
          <>
            <Polyline points={polyline(profile.endPointLine, x, y)} fill="none" stroke={COLOURS.copper} strokeWidth={1.2} strokeDasharray="5,3" />
            <Polyline points={polyline(profile.leastSquaresLine, x, y)} fill="none" stroke={COLOURS.inkFaint} strokeWidth={1} strokeDasharray="1.5,2" />
            <Polyline points={polyline(profile.points, x, y)} fill="none" stroke={COLOURS.ink} strokeWidth={1.6} />
            {profile.points.map((p) => (
              <Circle key={p.x} cx={x(p.x)} cy={y(p.y)} r={2} fill={COLOURS.white} stroke={COLOURS.ink} strokeWidth={1} />
            ))}
          </>
        )}
      </PlotFrame>
      <View style={{ flexDirection: 'row', marginTop: 4, marginLeft: geometry.left }}>
        <LegendItem colour={COLOURS.ink} label="Measured profile (stations marked)" />
        <LegendItem colour={COLOURS.copper} dash="5,3" width={1.2} label="End-point reference line" />
        <LegendItem colour={COLOURS.inkFaint} dash="1.5,2" width={1} label="Least-squares reference line" />
      </View>
    </View>
  );
}
