/**
 * Asking price ÷ estimated value as a figure and a small bar against the 1.0 mark, so a dealer sees
 * at a glance which machines are offered under their value. The words carry it without colour.
 */
export function PriceValueGauge({ ratio }: { ratio: number | null }) {
  if (ratio === null) return <span className="text-sm text-ink-faint">no value</span>;
  // The bar spans 0–2×; the mark sits at 1×.
  const width = Math.min(ratio / 2, 1) * 100;
  const under = ratio < 0.95;
  const over = ratio > 1.05;
  return (
    <span className="inline-flex items-center gap-2" title={`Asking price is ${ratio.toFixed(2)} × the estimated fair market value`}>
      <span className="figures w-12 text-right font-medium">{ratio.toFixed(2)}×</span>
      <span aria-hidden="true" className="relative h-2 w-14 rounded-full bg-paper-sunken">
        <span className={`absolute inset-y-0 left-0 rounded-full ${under ? 'bg-band-true' : over ? 'bg-copper' : 'bg-ink-faint'}`} style={{ width: `${width}%` }} />
        <span className="absolute -inset-y-0.5 left-1/2 w-px bg-ink" />
      </span>
      <span className="text-xs text-ink-soft">{under ? 'under' : over ? 'over' : 'at'}</span>
    </span>
  );
}
