import { CONDITION_SCALE } from '@/lib/scoring/grading/condition-scale';

export type GradeSeries = { letter: string; name: string; scores: Array<number | null> };

const ROW = 18;
const GAP = 14;
const LABEL_W = 170;
const WIDTH = 640;
const PAD_RIGHT = 40;
const TOP = 40;
// Each machine keeps its own fill pattern and letter, so the bars read without colour.
const FILLS = ['fill-ink', 'fill-copper', 'fill-band-fair', 'fill-ink-faint'];

/**
 * Subsystem grades of 2–4 machines as grouped bars on the 0–100 score, with the condition scale's
 * grade edges drawn behind them. Every bar carries its machine's letter and its score.
 */
export function SubsystemGradesChart({ subsystems, series }: { subsystems: string[]; series: GradeSeries[] }) {
  const groupHeight = series.length * ROW + GAP;
  const height = TOP + subsystems.length * groupHeight + 10;
  const x = (score: number) => LABEL_W + (score / 100) * (WIDTH - LABEL_W - PAD_RIGHT);
  return (
    <figure className="max-w-3xl">
      <svg viewBox={`0 0 ${WIDTH} ${height}`} className="w-full" role="img" aria-labelledby="grades-chart-title">
        <title id="grades-chart-title">Subsystem scores of {series.map((s) => `${s.letter}: ${s.name}`).join(', ')}</title>
        {CONDITION_SCALE.filter((g) => g.fromScore > 0).map((g, i) => (
          <g key={g.grade}>
            <line x1={x(g.fromScore)} x2={x(g.fromScore)} y1={i % 2 ? TOP - 20 : TOP - 6} y2={height - 6} className="stroke-line-strong" strokeDasharray="3 3" />
            {/* Alternate heights: the upper grade edges sit close together. */}
            <text x={x(g.fromScore) + 3} y={i % 2 ? TOP - 20 : TOP - 8} className="fill-ink-soft text-[10px]">
              {g.grade} ≥{g.fromScore}
            </text>
          </g>
        ))}
        {subsystems.map((label, i) => {
          const y0 = TOP + i * groupHeight;
          return (
            <g key={label}>
              <text x={0} y={y0 + (series.length * ROW) / 2 + 4} className="fill-ink text-[13px] font-medium">
                {label}
              </text>
              {series.map((s, j) => {
                const score = s.scores[i] ?? null;
                const y = y0 + j * ROW;
                return (
                  <g key={s.letter}>
                    {score === null ? (
                      <text x={x(0) + 4} y={y + ROW - 5} className="fill-ink-faint text-[11px]">
                        {s.letter}: not measured
                      </text>
                    ) : (
                      <>
                        <rect x={x(0)} y={y + 2} width={Math.max(x(score) - x(0), 1)} height={ROW - 5} className={FILLS[j % FILLS.length]} rx="2" />
                        <text x={x(score) + 4} y={y + ROW - 5} className="fill-ink text-[11px] font-semibold">
                          {s.letter} {score}
                        </text>
                      </>
                    )}
                  </g>
                );
              })}
            </g>
          );
        })}
      </svg>
      <figcaption className="mt-2 flex flex-wrap gap-x-4 gap-y-1 text-sm text-ink-soft">
        {series.map((s, j) => (
          <span key={s.letter} className="inline-flex items-center gap-1.5">
            <svg aria-hidden="true" width="14" height="10">
              <rect width="14" height="10" rx="2" className={FILLS[j % FILLS.length]} />
            </svg>
            <span className="font-semibold text-ink">{s.letter}</span> {s.name}
          </span>
        ))}
        <span>Score 0–100; dashed lines are where each grade begins.</span>
      </figcaption>
    </figure>
  );
}
