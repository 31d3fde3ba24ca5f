import 'server-only';
import { auditEvents } from '@/db/schema';
import type { Database } from '@/db/client';

export type AuditEntry = {
  actorId: string | null;
  actorRole: string | null;
  action: string;
  entityType: string;
  entityId?: string | number | null;
  outcome?: 'ok' | 'denied' | 'invalid' | 'failed';
  detail?: Record<string, unknown>;
  ipAddress?: string | null;
};

type Writer = Pick<Database, 'insert'>;

/** Appends one audit event; pass the transaction so the event commits with the change. */
export async function recordAudit(writer: Writer, entry: AuditEntry) {
  await writer.insert(auditEvents).values({
    actorId: entry.actorId,
    actorRole: entry.actorRole,
    action: entry.action,
    entityType: entry.entityType,
    entityId: entry.entityId === undefined || entry.entityId === null ? null : String(entry.entityId),
    outcome: entry.outcome ?? 'ok',
    detail: entry.detail ?? null,
    ipAddress: entry.ipAddress ?? null,
  });
}
