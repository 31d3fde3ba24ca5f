import 'server-only';
import { and, count, eq, inArray, sql } from 'drizzle-orm';
import { comparisonEntries, shortlistItems, shortlists } from '@/db/schema';
import type { Database } from '@/db/client';

type Reader = Pick<Database, 'select' | 'selectDistinct'>;
type Writer = Pick<Database, 'select' | 'selectDistinct' | 'insert' | 'delete' | 'update'>;

/** A person's shortlists with how many machines each holds, by name. */
export async function listShortlists(reader: Reader, ownerId: string) {
  return reader
    .select({ id: shortlists.id, name: shortlists.name, machines: count(shortlistItems.machineId) })
    .from(shortlists)
    .leftJoin(shortlistItems, eq(shortlistItems.shortlistId, shortlists.id))
    .where(eq(shortlists.ownerId, ownerId))
    .groupBy(shortlists.id)
    .orderBy(shortlists.name);
}

export async function isShortlistOwner(reader: Reader, shortlistId: number, ownerId: string) {
  const [row] = await reader.select({ id: shortlists.id }).from(shortlists).where(and(eq(shortlists.id, shortlistId), eq(shortlists.ownerId, ownerId))).limit(1);
  return Boolean(row);
}

export async function findShortlistByName(reader: Reader, ownerId: string, name: string) {
  const [row] = await reader.select({ id: shortlists.id }).from(shortlists).where(and(eq(shortlists.ownerId, ownerId), eq(shortlists.name, name))).limit(1);
  return row ?? null;
}

/** Of these machines, the ones with a current released report: the only ones a shortlist may hold. */
export async function comparableMachineIds(reader: Reader, machineIds: readonly number[]) {
  if (machineIds.length === 0) return new Set<number>();
  const rows = await reader.selectDistinct({ id: comparisonEntries.machineId }).from(comparisonEntries).where(inArray(comparisonEntries.machineId, [...machineIds]));
  return new Set(rows.map((r) => r.id));
}

export async function insertShortlist(writer: Writer, ownerId: string, name: string) {
  const [row] = await writer.insert(shortlists).values({ ownerId, name }).$returningId();
  return row!.id;
}

/** Adds machines; one already on the list stays as it was. */
export async function addShortlistItems(writer: Writer, shortlistId: number, machineIds: readonly number[]) {
  if (machineIds.length === 0) return;
  await writer
    .insert(shortlistItems)
    .values(machineIds.map((machineId) => ({ shortlistId, machineId })))
    .onDuplicateKeyUpdate({ set: { machineId: sql`${shortlistItems.machineId}` } });
  await writer.update(shortlists).set({ updatedAt: new Date() }).where(eq(shortlists.id, shortlistId));
}

export async function removeShortlistItem(writer: Writer, shortlistId: number, machineId: number) {
  await writer.delete(shortlistItems).where(and(eq(shortlistItems.shortlistId, shortlistId), eq(shortlistItems.machineId, machineId)));
}

export async function deleteShortlist(writer: Writer, shortlistId: number) {
  await writer.delete(shortlistItems).where(eq(shortlistItems.shortlistId, shortlistId));
  await writer.delete(shortlists).where(eq(shortlists.id, shortlistId));
}
