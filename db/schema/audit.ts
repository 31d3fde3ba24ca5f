import { bigint, index, json, mysqlTable, varchar } from 'drizzle-orm/mysql-core';
import { createdAt, userId } from './columns';

/** Append-only record of who did what to which entity. */
export const auditEvents = mysqlTable(
  'audit_events',
  {
    id: bigint('id', { mode: 'number' }).autoincrement().primaryKey(),
    actorId: userId('actor_id'),
    actorRole: varchar('actor_role', { length: 20 }),
    action: varchar('action', { length: 80 }).notNull(),
    entityType: varchar('entity_type', { length: 40 }).notNull(),
    entityId: varchar('entity_id', { length: 64 }),
    outcome: varchar('outcome', { length: 20 }).notNull().default('ok'),
    detail: json('detail'),
    ipAddress: varchar('ip_address', { length: 64 }),
    createdAt: createdAt(),
  },
  (t) => [
    index('audit_events_actor_idx').on(t.actorId, t.createdAt),
    index('audit_events_entity_idx').on(t.entityType, t.entityId, t.createdAt),
    index('audit_events_created_idx').on(t.createdAt),
  ],
);
