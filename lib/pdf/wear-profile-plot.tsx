import { Line, Polyline, Rect, Text, View } from '@react-pdf/renderer';
import type { PlotSeries } from '@/lib/scoring';
import { LegendItem, PlotFrame } from './plot-frame';
import { niceTicks } from './plot-scale';
import { COLOURS, CONTENT_WIDTH, styles } from './theme';

type BedWear = NonNullable<PlotSeries['bedWear']>;

/**
 * Way wear along the bed from the thickness stations, drawn downward below the thickest station,
 * with where the locked carriage binds; printed under the level profile on the same distance axis.
 */
export function WearProfilePlot({ wear, xMaxMm }: { wear: BedWear; xMaxMm: number | null }) {
  const xs = [...wear.points.map((p) => p.x), wear.carriageBindsAtMm ?? 0, xMaxMm ?? 0];
  const deepest = Math.max(1, ...wear.points.map((p) => p.y));
  const xTicks = niceTicks(0, Math.max(1, ...xs), 6);
  const yTicks = niceTicks(-deepest, 0, 4);
  const geometry = { width: CONTENT_WIDTH, height: 130, left: 38, right: 8, top: 10, bottom: 26 };
  const worst = wear.points.reduce<{ x: number; y: number } | null>((w, p) => (w === null || p.y > w.y ? p : w), null);
  return (
    <View wrap={false} style={{ marginTop: 8 }}>
      <Text style={styles.h3}>Way wear along the bed</Text>
      <Text style={{ ...styles.small, marginBottom: 6 }}>
        {worst && wear.points.length > 1
          ? `Wear below the thickest station, from micrometer readings of the way thickness; deepest ${worst.y.toLocaleString('en-GB')} µm at ${worst.x.toLocaleString('en-GB')} mm from the headstock.`
          : 'No way-thickness stations recorded.'}
        {wear.carriageBindsAtMm !== null ? ` The locked carriage binds ${wear.carriageBindsAtMm.toLocaleString('en-GB')} mm from the headstock.` : ''}
      </Text>
      <PlotFrame geometry={geometry} xTicks={xTicks} yTicks={yTicks} xLabel="Distance from the headstock end (mm)" yLabel="Wear (µm)" formatY={(v) => Math.abs(v).toLocaleString('en-GB')}>
        {(x, y) => (
          <>
            {wear.points.length > 1 ? (
              <Polyline points={wear.points.map((p) => `${x(p.x).toFixed(2)},${y(-p.y).toFixed(2)}`).join(' ')} fill="none" stroke={COLOURS.copper} strokeWidth={1.6} />
            ) : null}
            {wear.points.map((p) => (
              <Rect key={p.x} x={x(p.x) - 2.5} y={y(-p.y) - 2.5} width={5} height={5} fill={COLOURS.copper} />
            ))}
            {wear.carriageBindsAtMm !== null ? (
              <Line x1={x(wear.carriageBindsAtMm)} x2={x(wear.carriageBindsAtMm)} y1={geometry.top} y2={geometry.height - geometry.bottom} stroke={COLOURS.ink} strokeWidth={1} strokeDasharray="4,3" />
            ) : null}
          </>
        )}
      </PlotFrame>
      <View style={{ flexDirection: 'row', marginTop: 4, marginLeft: geometry.left }}>
        <LegendItem colour={COLOURS.copper} label="Way wear (stations marked)" />
        <LegendItem colour={COLOURS.ink} dash="4,3" width={1} label="Where the locked carriage binds" />
      </View>
    </View>
  );
}
