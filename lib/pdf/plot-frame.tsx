import type { ReactNode } from 'react';
import { Line, Svg, Text, View } from '@react-pdf/renderer';
import { linearScale } from './plot-scale';
import { COLOURS, styles } from './theme';

export interface PlotGeometry {
  width: number;
  height: number;
  left: number;
  right: number;
  top: number;
  bottom: number;
}

export type Scale = (v: number) => number;

/**
 * Axes, grid and tick labels around a plot drawn in data coordinates. Labels are positioned text
 * rather than SVG text, so they use the report's font and tabular figures.
 */
export function PlotFrame({
  geometry: g,
  xTicks,
  yTicks,
  xLabel,
  yLabel,
  formatX = (v) => v.toLocaleString('en-GB'),
  formatY = (v) => v.toLocaleString('en-GB'),
  children,
}: {
  geometry: PlotGeometry;
  xTicks: number[];
  yTicks: number[];
  xLabel: string;
  yLabel: string;
  formatX?: (v: number) => string;
  formatY?: (v: number) => string;
  children: (x: Scale, y: Scale) => ReactNode;
}) {
  const x = linearScale([xTicks[0]!, xTicks[xTicks.length - 1]!], [g.left, g.width - g.right]);
  const y = linearScale([yTicks[0]!, yTicks[yTicks.length - 1]!], [g.height - g.bottom, g.top]);
  const label = { ...styles.figures, position: 'absolute' as const, fontSize: 7, color: COLOURS.inkSoft };
  return (
    <View style={{ width: g.width, height: g.height, position: 'relative' }}>
      <Svg width={g.width} height={g.height} viewBox={`0 0 ${g.width} ${g.height}`}>
        {yTicks.map((t) => (
          <Line key={`y${t}`} x1={g.left} x2={g.width - g.right} y1={y(t)} y2={y(t)} stroke={t === 0 ? COLOURS.lineStrong : COLOURS.line} strokeWidth={t === 0 ? 0.9 : 0.5} />
        ))}
        {xTicks.map((t) => (
          <Line key={`x${t}`} x1={x(t)} x2={x(t)} y1={g.top} y2={g.height - g.bottom} stroke={COLOURS.line} strokeWidth={0.5} />
        ))}
        {children(x, y)}
      </Svg>
      {yTicks.map((t) => (
        <Text key={`yl${t}`} style={{ ...label, left: 0, width: g.left - 5, top: y(t) - 4.5, textAlign: 'right' }}>
          {formatY(t)}
        </Text>
      ))}
      {xTicks.map((t) => (
        <Text key={`xl${t}`} style={{ ...label, left: x(t) - 25, width: 50, top: g.height - g.bottom + 3, textAlign: 'center' }}>
          {formatX(t)}
        </Text>
      ))}
      <Text style={{ ...label, left: g.left, top: g.height - 10, width: g.width - g.left - g.right, textAlign: 'center' }}>{xLabel}</Text>
      <Text style={{ ...label, left: g.left + 4, top: g.top - 11 }}>{yLabel}</Text>
    </View>
  );
}

/** A line of the legend: a short sample of the stroke, then its meaning. */
export function LegendItem({ colour, dash, label, width = 2 }: { colour: string; dash?: string; label: string; width?: number }) {
  return (
    <View style={{ flexDirection: 'row', alignItems: 'center', marginRight: 14 }}>
      <Svg width={22} height={6} viewBox="0 0 22 6">
        <Line x1={0} x2={22} y1={3} y2={3} stroke={colour} strokeWidth={width} strokeDasharray={dash} />
      </Svg>
      <Text style={{ ...styles.small, marginLeft: 4 }}>{label}</Text>
    </View>
  );
}
