/**
 * Grading bands for one check, from q = measured deviation / permissible value. Band names are
 * Waygrade's own words. Edges: q ≤ 0.5 comfortably inside the new-machine limit; ≤ 1 inside it;
 * ≤ 2 outside it but fit for general work; ≤ 4 worn enough to limit the work it can do; beyond
 * that unfit until repaired. The edges are a Waygrade rule (common practice) in the spirit of used
 * machines commonly being accepted at up to about twice the new-machine limits.
 */
export const CHECK_BANDS = ['sharp', 'in-limit', 'serviceable', 'worn', 'unfit'] as const;
export type CheckBand = (typeof CHECK_BANDS)[number];

export interface BandDefinition {
  band: CheckBand;
  label: string;
  /** Largest q in this band (inclusive). */
  upToQ: number;
  meaning: string;
}

export const BAND_TABLE: readonly BandDefinition[] = [
  { band: 'sharp', label: 'Sharp', upToQ: 0.5, meaning: 'within half the new-machine limit' },
  { band: 'in-limit', label: 'In limit', upToQ: 1, meaning: 'within the new-machine limit' },
  { band: 'serviceable', label: 'Serviceable', upToQ: 2, meaning: 'outside the new-machine limit, fit for general work' },
  { band: 'worn', label: 'Worn', upToQ: 4, meaning: 'worn enough to limit the work it can do; repair advised' },
  { band: 'unfit', label: 'Unfit', upToQ: Number.POSITIVE_INFINITY, meaning: 'not fit for use until repaired' },
];

export function bandFor(q: number): BandDefinition {
  return BAND_TABLE.find((b) => q <= b.upToQ) ?? BAND_TABLE[BAND_TABLE.length - 1]!;
}

export function bandRank(band: CheckBand): number {
  return CHECK_BANDS.indexOf(band);
}
