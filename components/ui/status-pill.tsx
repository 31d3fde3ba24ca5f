import type { InspectionStatus } from '@/db/schema/inspections';
import { INSPECTION_STATUS_LABELS } from '@/lib/inspection-status';

// Each status has its own mark so it reads without colour.
const STATUS_STYLE: Record<InspectionStatus | 'none', { mark: string; className: string }> = {
  none: { mark: '○', className: 'border-line-strong text-ink-soft' },
  requested: { mark: '◔', className: 'border-ink-faint text-ink' },
  booked: { mark: '◑', className: 'border-copper text-copper-dark' },
  on_site: { mark: '◕', className: 'border-copper text-copper-dark' },
  in_review: { mark: '◕', className: 'border-band-fair text-band-fair' },
  released: { mark: '●', className: 'border-band-true text-band-true' },
  cancelled: { mark: '✕', className: 'border-line-strong text-ink-faint' },
};

export function StatusPill({ status }: { status: InspectionStatus | null | undefined }) {
  const key = status ?? 'none';
  const style = STATUS_STYLE[key];
  return (
    <span className={`inline-flex items-center gap-1.5 rounded-full border px-3 py-0.5 text-sm font-medium ${style.className}`}>
      <span aria-hidden="true">{style.mark}</span>
      {status ? INSPECTION_STATUS_LABELS[status] : 'No inspection yet'}
    </span>
  );
}
