import { Circle, Line, Rect, Text, View } from '@react-pdf/renderer';
import type { CheckResult } from '@/lib/scoring';
import { BandMark } from './band-mark';
import { formatQuantity } from './check-figures';
import { PlotFrame } from './plot-frame';
import { niceTicks } from './plot-scale';
import { pdfText } from './pdf-text';
import { COLOURS, CONTENT_WIDTH, styles } from './theme';

/** The measuring length the check states in its own words ("… over 250 mm …"), when it does. */
function measuringLengthMm(check: CheckResult): number | null {
  const match = /over ([\d.]+) mm/.exec(check.explanation.text);
  return match ? Number(match[1]) : null;
}

const MOVE_WORDS: Record<string, string> = {
  'toward-operator': 'toward the operator',
  'away-from-operator': 'away from the operator',
  none: 'no move needed',
};

/**
 * How far the work's axis (or the test bar) drifts from the spindle axis between the headstock
 * and the tailstock end, drawn against the permitted zone. Micrometres, so small offsets show.
 */
function OffsetPanel({ check, title, width }: { check: CheckResult; title: string; width: number }) {
  const offsetUm = check.measured!.value * 1000;
  const limitUm = check.permissible!.value * 1000;
  const direction = check.permissible!.direction;
  const zone: [number, number] = direction === 'positive-only' ? [0, limitUm] : direction === 'negative-only' ? [-limitUm, 0] : [-limitUm, limitUm];
  const extent = Math.max(Math.abs(offsetUm), limitUm) * 1.25;
  const yTicks = niceTicks(-extent, extent, 4);
  const lengthMm = measuringLengthMm(check);
  const geometry = { width, height: 150, left: 30, right: 12, top: 14, bottom: 24 };
  const move = typeof check.details.move === 'string' ? MOVE_WORDS[check.details.move] : null;
  return (
    <View style={{ width }}>
      <Text style={{ fontWeight: 600, marginBottom: 2 }}>{title}</Text>
      <PlotFrame
        geometry={geometry}
        xTicks={[0, 1]}
        yTicks={yTicks}
        xLabel={lengthMm ? `Headstock end to tailstock end, ${lengthMm.toLocaleString('en-GB')} mm` : 'Headstock end to tailstock end'}
        yLabel="Offset (µm)"
        formatX={(v) => (v === 0 ? 'head' : 'tail')}
      >
        {(x, y) => (
          <>
            <Rect x={x(0)} y={y(zone[1])} width={x(1) - x(0)} height={y(zone[0]) - y(zone[1])} fill={COLOURS.bandTrue} fillOpacity={0.1} />
            <Line x1={x(0)} x2={x(1)} y1={y(zone[1])} y2={y(zone[1])} stroke={COLOURS.bandTrue} strokeWidth={0.8} strokeDasharray="3,2" />
            <Line x1={x(0)} x2={x(1)} y1={y(zone[0])} y2={y(zone[0])} stroke={COLOURS.bandTrue} strokeWidth={0.8} strokeDasharray="3,2" />
            <Line x1={x(0)} x2={x(1)} y1={y(0)} y2={y(offsetUm)} stroke={COLOURS.ink} strokeWidth={1.6} />
            <Circle cx={x(0)} cy={y(0)} r={2.2} fill={COLOURS.ink} />
            <Circle cx={x(1)} cy={y(offsetUm)} r={3} fill={COLOURS.white} stroke={COLOURS.ink} strokeWidth={1.2} />
          </>
        )}
      </PlotFrame>
      <View style={{ flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center', marginTop: 3 }}>
        <Text style={{ ...styles.figures, fontSize: 8.5 }}>
          {formatQuantity(check.measured!.value, 'mm')} against {direction === 'both' ? '±' : ''}
          {formatQuantity(check.permissible!.value, 'mm')}
        </Text>
        <BandMark band={check.band ?? 'not-measured'} />
      </View>
      {move ? (
        <Text style={{ ...styles.small, marginTop: 1 }}>
          Correction: {pdfText(move)}
          {typeof check.details.moveByMm === 'number' && check.details.move !== 'none' ? ` by ${formatQuantity(check.details.moveByMm, 'mm')}` : ''}
        </Text>
      ) : null}
    </View>
  );
}

/** The tailstock's two views of the same error: the indicator along a test bar and the two-collar cut. */
export function AlignmentPlot({ checks }: { checks: readonly CheckResult[] }) {
  const panels = [
    { id: 'tailstock-alignment', title: 'Indicator along a test bar' },
    { id: 'two-collar-test', title: 'Two-collar test cut' },
  ]
    .map((p) => ({ ...p, check: checks.find((c) => c.id === p.id && c.status === 'measured' && c.measured && c.permissible) }))
    .filter((p): p is typeof p & { check: CheckResult } => Boolean(p.check));
  if (panels.length === 0) return null;
  const width = (CONTENT_WIDTH - 20) / 2;
  return (
    <View wrap={false} style={{ marginTop: 10 }}>
      <Text style={styles.h3}>Tailstock alignment, drawn</Text>
      <Text style={{ ...styles.small, marginBottom: 6 }}>
        The line runs from the headstock end to the tailstock end; the shaded band is the permitted offset. Offsets are in
        micrometres, so the drawing is many times exaggerated.
      </Text>
      <View style={{ flexDirection: 'row', justifyContent: 'space-between' }}>
        {panels.map((p) => (
          <OffsetPanel key={p.id} check={p.check} title={p.title} width={width} />
        ))}
      </View>
    </View>
  );
}
