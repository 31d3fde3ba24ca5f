import { index, int, mysqlTable, varchar } from 'drizzle-orm/mysql-core';
import { createdAt, userId } from './columns';
import { inspections } from './inspections';
import { machines } from './machines';
import { users } from './users';

/** An uploaded photo of a listing or of a survey section, with its processed sizes. */
export const photos = mysqlTable(
  'photos',
  {
    id: int('id').autoincrement().primaryKey(),
    machineId: int('machine_id').references(() => machines.id),
    inspectionId: int('inspection_id').references(() => inspections.id),
    // Survey section the photo belongs to (e.g. "bed"), null for listing photos.
    section: varchar('section', { length: 40 }),
    caption: varchar('caption', { length: 300 }),
    fileKey: varchar('file_key', { length: 200 }).notNull(),
    originalUrl: varchar('original_url', { length: 500 }).notNull(),
    displayKey: varchar('display_key', { length: 200 }),
    thumbKey: varchar('thumb_key', { length: 200 }),
    widthPx: int('width_px'),
    heightPx: int('height_px'),
    bytes: int('bytes'),
    uploadedById: userId('uploaded_by_id').references(() => users.id),
    createdAt: createdAt(),
  },
  (t) => [index('photos_machine_idx').on(t.machineId), index('photos_inspection_idx').on(t.inspectionId, t.section)],
);
