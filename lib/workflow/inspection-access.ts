import 'server-only';
import { and, eq } from 'drizzle-orm';
import { db, type Database } from '@/db/client';
import { inspections, machines } from '@/db/schema';
import type { Actor } from '@/lib/auth/operation';
import { AppError } from '@/lib/errors';
import { mayTransition } from '@/lib/roles';
import type { InspectionStatus } from '@/db/schema/inspections';

type Reader = Pick<Database, 'select'>;

/** True when the actor owns the machine (sellers) or is a coordinator. */
export async function ownsMachine(actor: Actor | null, machineId: number) {
  if (!actor) return false;
  if (actor.role === 'admin') return true;
  const [row] = await db.select({ id: machines.id }).from(machines).where(and(eq(machines.id, machineId), eq(machines.sellerId, actor.id)));
  return Boolean(row);
}

/** True when the actor may act on this inspection: its seller, its assigned inspector, or a coordinator. */
export async function takesPartIn(actor: Actor | null, inspectionId: number) {
  if (!actor) return false;
  if (actor.role === 'admin') return true;
  const [row] = await db
    .select({ sellerId: machines.sellerId, inspectorId: inspections.inspectorId })
    .from(inspections)
    .innerJoin(machines, eq(machines.id, inspections.machineId))
    .where(eq(inspections.id, inspectionId));
  if (!row) return false;
  return actor.role === 'seller' ? row.sellerId === actor.id : actor.role === 'inspector' ? row.inspectorId === actor.id : false;
}

/** Loads an inspection for update (row lock) and checks the move is allowed for this role. */
export async function lockInspectionForTransition(tx: Reader, inspectionId: number, actor: Actor, to: InspectionStatus) {
  const [row] = await tx
    .select()
    .from(inspections)
    .where(eq(inspections.id, inspectionId))
    .for('update');
  if (!row) throw new AppError('not_found');
  if (!mayTransition(actor.role, row.status, to)) {
    throw new AppError('conflict', `This inspection is ${row.status.replace('_', ' ')}; it cannot move to ${to.replace('_', ' ')} now.`);
  }
  return row;
}
