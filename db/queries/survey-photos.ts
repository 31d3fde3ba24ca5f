import 'server-only';
import { and, asc, count, eq } from 'drizzle-orm';
import { photos } from '@/db/schema';
import type { Database } from '@/db/client';

type Reader = Pick<Database, 'select'>;
type Writer = Pick<Database, 'insert'>;

export type SurveyPhotoRow = typeof photos.$inferSelect;

export async function insertSurveyPhoto(writer: Writer, values: typeof photos.$inferInsert) {
  const [row] = await writer.insert(photos).values(values).$returningId();
  return row!.id;
}

export async function listSurveyPhotos(reader: Reader, inspectionId: number, section?: string) {
  return reader
    .select()
    .from(photos)
    .where(section ? and(eq(photos.inspectionId, inspectionId), eq(photos.section, section)) : eq(photos.inspectionId, inspectionId))
    .orderBy(asc(photos.createdAt), asc(photos.id));
}

export async function countSurveyPhotos(reader: Reader, inspectionId: number) {
  const [row] = await reader.select({ total: count() }).from(photos).where(eq(photos.inspectionId, inspectionId));
  return row?.total ?? 0;
}

/** Photos kept for each section of one survey, by section id. */
export async function countSurveyPhotosBySection(reader: Reader, inspectionId: number): Promise<Record<string, number>> {
  const rows = await reader.select({ section: photos.section, total: count() }).from(photos).where(eq(photos.inspectionId, inspectionId)).groupBy(photos.section);
  return Object.fromEntries(rows.filter((r) => r.section !== null).map((r) => [r.section!, r.total]));
}
