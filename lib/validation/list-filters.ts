import { z } from 'zod';
import { ROLES } from '@/db/schema/users';

// Filters live in the URL; anything unexpected falls back to the default instead of failing the page.
const page = z.coerce.number().int().min(1).max(10_000).catch(1);
const optionalText = (max: number) =>
  z
    .string()
    .trim()
    .max(max)
    .optional()
    .catch(undefined)
    .transform((value) => value || undefined);

export const PEOPLE_SORTS = ['name', 'email', 'role', 'created'] as const;
export const ACCOUNT_STATES = ['active', 'unconfirmed', 'deactivated'] as const;

export const peopleFiltersSchema = z.object({
  q: optionalText(120),
  role: z.enum(ROLES).optional().catch(undefined),
  state: z.enum(ACCOUNT_STATES).optional().catch(undefined),
  sort: z.enum(PEOPLE_SORTS).catch('created'),
  dir: z.enum(['asc', 'desc']).catch('desc'),
  page,
});
export type PeopleFilters = z.output<typeof peopleFiltersSchema>;

const isoDay = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/)
  .optional()
  .catch(undefined)
  .transform((value) => value || undefined);

export const auditFiltersSchema = z.object({
  actor: optionalText(254),
  entity: optionalText(40),
  entityId: optionalText(64),
  from: isoDay,
  to: isoDay,
  page,
});
export type AuditFilters = z.output<typeof auditFiltersSchema>;

/** A list of machines (the reports catalogue, a seller's machines): a maker or model to look for, and the page. */
export const machineSearchSchema = z.object({ q: optionalText(100), page });
export type MachineSearch = z.output<typeof machineSearchSchema>;
