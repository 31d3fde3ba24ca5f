import type { INCLUSION_KINDS } from '@/db/schema/machine-inclusions';

export const INCLUSION_KIND_LABELS: Record<(typeof INCLUSION_KINDS)[number], string> = {
  chuck: 'Chuck',
  faceplate: 'Faceplate',
  'steady-rest': 'Fixed steady',
  'travelling-rest': 'Travelling steady',
  'tool-post': 'Tool post',
  collets: 'Collets',
  dro: 'Digital readout (DRO)',
  manuals: 'Manuals',
  other: 'Other',
};
