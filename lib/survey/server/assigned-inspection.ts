import 'server-only';
import { db } from '@/db/client';
import { isInspectionAssignedTo } from '@/db/queries/surveys';
import type { Actor } from '@/lib/auth/operation';

/** The survey of an inspection is the business of the inspector it is assigned to, and no one else's. */
export async function isAssignedInspector({ actor, input }: { actor: Actor | null; input: { inspectionId: number } }) {
  if (!actor || actor.role !== 'inspector') return false;
  return isInspectionAssignedTo(db, input.inspectionId, actor.id);
}
