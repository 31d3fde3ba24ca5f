import type { PlotSeries } from '@/lib/scoring';

export type BedWearSeries = NonNullable<PlotSeries['bedWear']>;

const WIDTH = 360;
const HEIGHT = 180;
const PAD = { left: 46, right: 12, top: 14, bottom: 36 };

function niceStep(span: number, ticks: number) {
  const raw = span / ticks;
  const power = 10 ** Math.floor(Math.log10(raw || 1));
  return [1, 2, 5, 10].map((m) => m * power).find((step) => step >= raw) ?? power * 10;
}

/**
 * Way wear along the bed (µm below the thickest station), drawn downward so a hollow near the
 * chuck looks like one, with the point where the locked carriage binds marked. Drawn beside the
 * level profile, on the same mm axis from the headstock.
 */
export function WearProfilePlot({ series, xMaxMm, title = 'Way wear' }: { series: BedWearSeries; xMaxMm?: number; title?: string }) {
  const xs = [...series.points.map((p) => p.x), series.carriageBindsAtMm ?? 0, xMaxMm ?? 0];
  const xMax = Math.max(...xs, 1);
  const yMaxWear = Math.max(...series.points.map((p) => p.y), 1);
  const yStep = niceStep(yMaxWear, 4);
  const yMax = Math.ceil(yMaxWear / yStep) * yStep;
  const xStep = niceStep(xMax, 4);
  const sx = (x: number) => PAD.left + (x / xMax) * (WIDTH - PAD.left - PAD.right);
  // Wear is drawn downward from the top line: 0 at the top, deepest wear lowest.
  const sy = (wear: number) => PAD.top + (wear / yMax) * (HEIGHT - PAD.top - PAD.bottom);
  const path = series.points.map((p, i) => `${i ? 'L' : 'M'}${sx(p.x).toFixed(1)},${sy(p.y).toFixed(1)}`).join(' ');
  const yTicks = Array.from({ length: Math.round(yMax / yStep) + 1 }, (_, i) => i * yStep);
  const xTicks = Array.from({ length: Math.floor(xMax / xStep) + 1 }, (_, i) => i * xStep);
  return (
    <figure className="w-full" data-testid="wear-profile">
      <svg viewBox={`0 0 ${WIDTH} ${HEIGHT}`} role="img" aria-label={`${title}: wear below the thickest station along the bed`} className="h-auto w-full">
        {yTicks.map((y) => (
          <g key={`y${y}`}>
            <line x1={PAD.left} x2={WIDTH - PAD.right} y1={sy(y)} y2={sy(y)} className={y === 0 ? 'stroke-line-strong' : 'stroke-line'} strokeWidth="1" />
            <text x={PAD.left - 6} y={sy(y) + 4} textAnchor="end" className="figures fill-ink-soft text-[11px]">
              {y}
            </text>
          </g>
        ))}
        {xTicks.map((x) => (
          <text key={`x${x}`} x={sx(x)} y={HEIGHT - PAD.bottom + 16} textAnchor="middle" className="figures fill-ink-soft text-[11px]">
            {x}
          </text>
        ))}
        <text x={PAD.left} y={HEIGHT - 4} className="fill-ink-soft text-[11px]">
          mm from the headstock · wear in µm
        </text>
        {series.points.length > 1 ? <path d={path} fill="none" className="stroke-copper" strokeWidth="2.5" /> : null}
        {series.points.map((p) => (
          <rect key={`p${p.x}`} x={sx(p.x) - 4} y={sy(p.y) - 4} width="8" height="8" className="fill-copper" />
        ))}
        {series.carriageBindsAtMm !== null ? (
          <g>
            <line x1={sx(series.carriageBindsAtMm)} x2={sx(series.carriageBindsAtMm)} y1={PAD.top} y2={HEIGHT - PAD.bottom} className="stroke-ink" strokeWidth="1.5" strokeDasharray="4 3" />
            {/* Label on the side with room, so it never runs off the plot at the tailstock end. */}
            <text
              x={sx(series.carriageBindsAtMm) + (series.carriageBindsAtMm > xMax / 2 ? -4 : 4)}
              y={PAD.top + 10}
              textAnchor={series.carriageBindsAtMm > xMax / 2 ? 'end' : 'start'}
              className="fill-ink text-[11px]"
            >
              carriage binds
            </text>
          </g>
        ) : null}
      </svg>
      <figcaption className="text-sm text-ink-soft">
        {title}: squares = way thickness stations (wear below the thickest); dashed line = where the locked carriage binds.
      </figcaption>
    </figure>
  );
}
