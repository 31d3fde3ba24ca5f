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
  // A plain loop: this runs for every check of every survey. NaN matches no edge and lands in the last band.
  for (const b of BAND_TABLE) if (q <= b.upToQ) return b;
  return BAND_TABLE[BAND_TABLE.length - 1]!;
}

/** Each band's label in lower case for running text, made once rather than for every sentence. */
const LOWER_CASE_LABELS: ReadonlyMap<BandDefinition, string> = new Map(BAND_TABLE.map((b) => [b, b.label.toLowerCase()]));

/** A band's label in lower case ("in limit"), as the summaries use it. */
export function bandWords(band: BandDefinition): string {
  return LOWER_CASE_LABELS.get(band) ?? band.label.toLowerCase();
}

/** The label of the band q falls in, in lower case. */
export function bandWordsFor(q: number): string {
  return bandWords(bandFor(q));
}

const BAND_RANKS: ReadonlyMap<string, number> = new Map(CHECK_BANDS.map((band, rank) => [band, rank]));

/** Position of a band from sharp (0) to unfit (4); -1 for a name that is not a band. */
export function bandRank(band: CheckBand): number {
  return BAND_RANKS.get(band) ?? -1;
}
