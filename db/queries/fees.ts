import 'server-only';
import { and, asc, eq } from 'drizzle-orm';
import { inspectionFees, MACHINE_TYPES, SIZE_CLASSES } from '@/db/schema';
import type { Database } from '@/db/client';

type Reader = Pick<Database, 'select'>;
type Writer = Pick<Database, 'insert'>;

export type MachineType = (typeof MACHINE_TYPES)[number];
export type SizeClass = (typeof SIZE_CLASSES)[number];

/** Every fee an admin has set, by machine type and size class. */
export async function listInspectionFees(reader: Reader) {
  return reader.select().from(inspectionFees).orderBy(asc(inspectionFees.machineType), asc(inspectionFees.sizeClass));
}

/** The fee a buyer pays for a report on a machine of this type and size, or null when none is set. */
export async function findInspectionFee(reader: Reader, machineType: MachineType, sizeClass: SizeClass) {
  const [row] = await reader
    .select({ amountMinor: inspectionFees.amountMinor, currency: inspectionFees.currency })
    .from(inspectionFees)
    .where(and(eq(inspectionFees.machineType, machineType), eq(inspectionFees.sizeClass, sizeClass)))
    .limit(1);
  return row ?? null;
}

/** Sets one fee; the unique key on (type, size class) makes this an upsert. */
export async function saveInspectionFee(
  writer: Writer,
  fee: { machineType: MachineType; sizeClass: SizeClass; amountMinor: number; currency: string; updatedById: string },
) {
  await writer
    .insert(inspectionFees)
    .values(fee)
    .onDuplicateKeyUpdate({ set: { amountMinor: fee.amountMinor, currency: fee.currency, updatedById: fee.updatedById, updatedAt: new Date() } });
}
