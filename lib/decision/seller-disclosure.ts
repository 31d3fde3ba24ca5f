/**
 * The seller's disclosure: defined questions answered at listing time. The sale terms are the
 * trade's own words and keep their usual meaning.
 */
export const SALE_TERMS = ['as-is', 'tested-under-power', 'reconditioned', 'rebuilt'] as const;
export type SaleTerm = (typeof SALE_TERMS)[number];

export const SALE_TERM_LABELS: Record<SaleTerm, string> = {
  'as-is': 'As-is',
  'tested-under-power': 'Tested under power',
  reconditioned: 'Reconditioned',
  rebuilt: 'Rebuilt',
};

export const USAGE_KINDS = ['production', 'toolroom-or-maintenance', 'training', 'hobby', 'not-known'] as const;
export type UsageKind = (typeof USAGE_KINDS)[number];

export const USAGE_LABELS: Record<UsageKind, string> = {
  production: 'Production work',
  'toolroom-or-maintenance': 'Toolroom or maintenance work',
  training: 'Training workshop',
  hobby: 'Hobby use',
  'not-known': 'Not known',
};

export interface SellerDisclosure {
  /** Empty means the seller answered "no known faults". */
  knownFaults: string;
  /** Empty means none known. */
  repairsAndRebuilds: string;
  /** Empty means none known. */
  crashesOrDrops: string;
  usage: UsageKind;
  usageNotes: string;
  supplyVoltage: number | null;
  supplyPhases: 1 | 3 | null;
  included: string;
  saleTerm: SaleTerm;
}
