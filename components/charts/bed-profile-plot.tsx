import type { PlotSeries } from '@/lib/scoring';

export type BedProfileSeries = NonNullable<PlotSeries['bedProfile']>;

const WIDTH = 360;
const HEIGHT = 220;
const PAD = { left: 46, right: 12, top: 14, bottom: 36 };

/** Round step for axis ticks: 1, 2 or 5 × a power of ten. */
function niceStep(span: number, ticks: number) {
  const raw = span / ticks;
  const power = 10 ** Math.floor(Math.log10(raw || 1));
  return [1, 2, 5, 10].map((m) => m * power).find((step) => step >= raw) ?? power * 10;
}

/**
 * The bed's height profile from level readings (µm along mm), with the end-point chord and the
 * least-squares line it is judged against. Plain SVG so the survey, the review screen and the PDF
 * draw the same picture. Heights are exaggerated — the axis says by how much in µm.
 */
export function BedProfilePlot({ series, title = 'Bed profile' }: { series: BedProfileSeries; title?: string }) {
  const xs = series.points.map((p) => p.x);
  const ys = [...series.points, ...series.endPointLine, ...series.leastSquaresLine].map((p) => p.y);
  const xMax = Math.max(...xs, 1);
  const yStep = niceStep(Math.max(...ys) - Math.min(...ys) || 2, 4);
  const yMin = Math.floor(Math.min(...ys, 0) / yStep) * yStep;
  const yMax = Math.ceil(Math.max(...ys, 0) / yStep) * yStep || yStep;
  const xStep = niceStep(xMax, 4);
  const sx = (x: number) => PAD.left + (x / xMax) * (WIDTH - PAD.left - PAD.right);
  const sy = (y: number) => PAD.top + ((yMax - y) / (yMax - yMin || 1)) * (HEIGHT - PAD.top - PAD.bottom);
  const line = (points: readonly { x: number; y: number }[]) => points.map((p, i) => `${i ? 'L' : 'M'}${sx(p.x).toFixed(1)},${sy(p.y).toFixed(1)}`).join(' ');
  const yTicks = Array.from({ length: Math.round((yMax - yMin) / yStep) + 1 }, (_, i) => yMin + i * yStep);
  const xTicks = Array.from({ length: Math.floor(xMax / xStep) + 1 }, (_, i) => i * xStep);

  return (
    <figure className="w-full">
      <svg viewBox={`0 0 ${WIDTH} ${HEIGHT}`} role="img" aria-label={`${title}: measured profile with end-point and least-squares reference lines`} className="h-auto w-full">
        {yTicks.map((y) => (
          <g key={`y${y}`}>
            <line x1={PAD.left} x2={WIDTH - PAD.right} y1={sy(y)} y2={sy(y)} className={y === 0 ? 'stroke-line-strong' : 'stroke-line'} strokeWidth="1" />
            <text x={PAD.left - 6} y={sy(y) + 4} textAnchor="end" className="figures fill-ink-soft text-[11px]">
              {Number(y.toFixed(3))}
            </text>
          </g>
        ))}
        {xTicks.map((x) => (
          <text key={`x${x}`} x={sx(x)} y={HEIGHT - PAD.bottom + 16} textAnchor="middle" className="figures fill-ink-soft text-[11px]">
            {Number(x.toFixed(1))}
          </text>
        ))}
        <text x={4} y={PAD.top - 2} className="fill-ink-soft text-[11px]">µm</text>
        <text x={WIDTH - PAD.right} y={HEIGHT - 4} textAnchor="end" className="fill-ink-soft text-[11px]">
          mm from the headstock end
        </text>
        <path d={line(series.leastSquaresLine)} className="stroke-ink-faint" strokeWidth="1.5" strokeDasharray="6 4" fill="none" />
        <path d={line(series.endPointLine)} className="stroke-ink-soft" strokeWidth="1.5" strokeDasharray="2 3" fill="none" />
        <path d={line(series.points)} className="stroke-copper" strokeWidth="2.5" fill="none" strokeLinejoin="round" />
        {series.points.map((p) => (
          <circle key={p.x} cx={sx(p.x)} cy={sy(p.y)} r="3.5" className="fill-copper" />
        ))}
      </svg>
      <figcaption className="mt-1 flex flex-wrap gap-x-4 gap-y-1 text-sm text-ink-soft">
        <span className="inline-flex items-center gap-1.5">
          <svg aria-hidden="true" width="22" height="8"><path d="M0 4h22" className="stroke-copper" strokeWidth="2.5" /></svg>
          Measured
        </span>
        <span className="inline-flex items-center gap-1.5">
          <svg aria-hidden="true" width="22" height="8"><path d="M0 4h22" className="stroke-ink-soft" strokeWidth="1.5" strokeDasharray="2 3" /></svg>
          End-point line
        </span>
        <span className="inline-flex items-center gap-1.5">
          <svg aria-hidden="true" width="22" height="8"><path d="M0 4h22" className="stroke-ink-faint" strokeWidth="1.5" strokeDasharray="6 4" /></svg>
          Least-squares line
        </span>
      </figcaption>
    </figure>
  );
}
