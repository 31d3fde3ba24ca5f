import 'server-only';
import { eq, inArray } from 'drizzle-orm';
import { machines, reports } from '@/db/schema';
import { db, type Database } from '@/db/client';
import { parseMachineSnapshot, snapshotOf, type MachineSnapshot } from '@/lib/reports/machine-snapshot';

type Reader = Pick<Database, 'select'>;

/** The listing columns a report states, in the snapshot's shape. */
export const snapshotColumns = {
  machineType: machines.machineType,
  latheKind: machines.latheKind,
  maker: machines.maker,
  model: machines.model,
  serialNumber: machines.serialNumber,
  yearBuilt: machines.yearBuilt,
  swingMm: machines.swingMm,
  betweenCentresMm: machines.betweenCentresMm,
  spindleBoreMm: machines.spindleBoreMm,
  sizeClass: machines.sizeClass,
  motorKw: machines.motorKw,
  supplyVoltage: machines.supplyVoltage,
  supplyPhases: machines.supplyPhases,
  town: machines.town,
  region: machines.region,
  askingPriceMinor: machines.askingPriceMinor,
  currency: machines.currency,
  accessories: machines.accessories,
};

/** What the listing states today about one machine, as release would keep it; null when there is no such machine. */
export async function collectMachineSnapshot(reader: Reader, machineId: number): Promise<MachineSnapshot | null> {
  const [row] = await reader.select(snapshotColumns).from(machines).where(eq(machines.id, machineId)).limit(1);
  return row ? snapshotOf(row) : null;
}

/** The listings of several machines as they stand today, by machine id. */
export async function collectMachineSnapshots(reader: Reader, machineIds: readonly number[]): Promise<Map<number, MachineSnapshot>> {
  if (machineIds.length === 0) return new Map();
  const rows = await reader
    .select({ id: machines.id, ...snapshotColumns })
    .from(machines)
    .where(inArray(machines.id, [...machineIds]));
  return new Map(rows.map(({ id, ...row }) => [id, snapshotOf(row)]));
}

/** A report version's machine as sealed with it (null for a draft) beside the listing as it stands now. */
export async function findSealedAndLiveMachine(reportId: number, reader: Reader = db): Promise<{ sealed: MachineSnapshot | null; live: MachineSnapshot } | null> {
  const [row] = await reader
    .select({ sealed: reports.machineSnapshot, ...snapshotColumns })
    .from(reports)
    .innerJoin(machines, eq(machines.id, reports.machineId))
    .where(eq(reports.id, reportId))
    .limit(1);
  if (!row) return null;
  const { sealed, ...live } = row;
  return { sealed: parseMachineSnapshot(sealed), live: snapshotOf(live) };
}
