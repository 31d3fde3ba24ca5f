import 'server-only';
import { and, desc, eq, gte, like, lt, or, type SQL } from 'drizzle-orm';
import { db } from '@/db/client';
import { auditEvents, users } from '@/db/schema';
import type { AuditFilters } from '@/lib/validation/list-filters';
import { containsPattern } from './like-pattern';

export const AUDIT_PAGE_SIZE = 50;
const DAY_MS = 24 * 60 * 60 * 1000;

function auditWhere(filters: AuditFilters): SQL | undefined {
  const conditions: SQL[] = [];
  if (filters.actor) {
    // An id matches exactly; anything else is looked for in names and addresses.
    const pattern = containsPattern(filters.actor);
    conditions.push(or(eq(auditEvents.actorId, filters.actor), like(users.email, pattern), like(users.name, pattern))!);
  }
  if (filters.entity) conditions.push(eq(auditEvents.entityType, filters.entity));
  if (filters.entityId) conditions.push(eq(auditEvents.entityId, filters.entityId));
  // Days are whole UTC days, "to" included.
  if (filters.from) conditions.push(gte(auditEvents.createdAt, new Date(`${filters.from}T00:00:00Z`)));
  if (filters.to) conditions.push(lt(auditEvents.createdAt, new Date(new Date(`${filters.to}T00:00:00Z`).getTime() + DAY_MS)));
  return conditions.length ? and(...conditions) : undefined;
}

/** Newest first, one page; a page more than asked tells whether there is a next one. */
export async function listAuditEvents(filters: AuditFilters) {
  const rows = await db
    .select({
      id: auditEvents.id,
      createdAt: auditEvents.createdAt,
      actorId: auditEvents.actorId,
      actorName: users.name,
      actorEmail: users.email,
      actorRole: auditEvents.actorRole,
      action: auditEvents.action,
      entityType: auditEvents.entityType,
      entityId: auditEvents.entityId,
      outcome: auditEvents.outcome,
      detail: auditEvents.detail,
      ipAddress: auditEvents.ipAddress,
    })
    .from(auditEvents)
    .leftJoin(users, eq(users.id, auditEvents.actorId))
    .where(auditWhere(filters))
    .orderBy(desc(auditEvents.createdAt), desc(auditEvents.id))
    .limit(AUDIT_PAGE_SIZE + 1)
    .offset((filters.page - 1) * AUDIT_PAGE_SIZE);
  return { rows: rows.slice(0, AUDIT_PAGE_SIZE), hasMore: rows.length > AUDIT_PAGE_SIZE };
}

/** Entity types that occur in the log, for the filter's choices. */
export async function listAuditEntityTypes() {
  const rows = await db.select({ entityType: auditEvents.entityType }).from(auditEvents).groupBy(auditEvents.entityType).orderBy(auditEvents.entityType);
  return rows.map((row) => row.entityType);
}

/** The latest events about one account: what it did and what was done to it. */
export async function listAuditEventsAboutUser(userId: string, limit = 15) {
  return db
    .select({
      id: auditEvents.id,
      createdAt: auditEvents.createdAt,
      actorName: users.name,
      action: auditEvents.action,
      outcome: auditEvents.outcome,
      detail: auditEvents.detail,
    })
    .from(auditEvents)
    .leftJoin(users, eq(users.id, auditEvents.actorId))
    .where(or(eq(auditEvents.actorId, userId), and(eq(auditEvents.entityType, 'user'), eq(auditEvents.entityId, userId))))
    .orderBy(desc(auditEvents.createdAt), desc(auditEvents.id))
    .limit(limit);
}

export type AuditRow = Awaited<ReturnType<typeof listAuditEvents>>['rows'][number];
