import type { InspectionStatus } from '@/db/schema/inspections';

/** Waygrade's words for each inspection status, as sellers and coordinators read them. */
export const INSPECTION_STATUS_LABELS: Record<InspectionStatus, string> = {
  requested: 'Requested',
  booked: 'Booked',
  on_site: 'Inspector on site',
  in_review: 'In review',
  released: 'Report released',
  cancelled: 'Cancelled',
};
