import { z } from 'zod';
import { SALE_TERMS, USAGE_KINDS, type SellerDisclosure } from './seller-disclosure';
import { SITE_ACCESS, type SiteAccess } from './rigging-estimate';
import type { NameplateSupply } from './phase-converter';
import type { SectionThermalState } from '@/lib/survey/thermal-state';
import { THERMAL_SECTION_KEYS } from '@/lib/survey/thermal-state';

/**
 * What a report sets beside its findings, copied when the version is released so that the report
 * page and the signed PDF of that version show the same thing for ever, whatever the seller changes
 * in the listing afterwards: the disclosure answers, the facts behind the landed cost and the
 * thermal state of each measured section.
 */
export interface ReleaseFacts {
  disclosure: (SellerDisclosure & { answeredAt: string }) | null;
  landedCostBasis: {
    currency: string;
    askingPriceMinor: number | null;
    /** null when the seller listed no inclusions, so nothing is known to be missing. */
    missingToolingMinor: number | null;
    weightKg: number | null;
    siteAccess: SiteAccess | null;
    nameplate: NameplateSupply | null;
  };
  thermalStates: SectionThermalState[];
}

const disclosureSchema = z.object({
  knownFaults: z.string(),
  repairsAndRebuilds: z.string(),
  crashesOrDrops: z.string(),
  usage: z.enum(USAGE_KINDS),
  usageNotes: z.string(),
  supplyVoltage: z.number().nullable(),
  supplyPhases: z.union([z.literal(1), z.literal(3)]).nullable(),
  included: z.string(),
  saleTerm: z.enum(SALE_TERMS),
  answeredAt: z.iso.datetime(),
});

const releaseFactsSchema = z.object({
  disclosure: disclosureSchema.nullable(),
  landedCostBasis: z.object({
    currency: z.string().length(3),
    askingPriceMinor: z.number().int().nullable(),
    missingToolingMinor: z.number().int().nullable(),
    weightKg: z.number().nullable(),
    siteAccess: z.enum(SITE_ACCESS).nullable(),
    nameplate: z.object({ voltage: z.number(), phases: z.union([z.literal(1), z.literal(3)]), motorKw: z.number().nullable() }).nullable(),
  }),
  thermalStates: z.array(
    z.object({
      section: z.enum(THERMAL_SECTION_KEYS),
      state: z.enum(['cold', 'warm']).nullable(),
      source: z.enum(['inspector', 'started-warm', 'power-run-clock', 'power-run-minutes', 'not-known']),
      explanation: z.string(),
      minutesRun: z.number().nullable(),
      readingsAt: z.string().nullable(),
    }),
  ),
}) satisfies z.ZodType<ReleaseFacts>;

/**
 * The stored copy, checked; null for drafts and for versions released before copies were kept.
 * MariaDB hands JSON columns back as text.
 */
export function parseReleaseFacts(stored: unknown): ReleaseFacts | null {
  if (stored === null || stored === undefined) return null;
  const value = typeof stored === 'string' ? (JSON.parse(stored) as unknown) : stored;
  return releaseFactsSchema.parse(value);
}
