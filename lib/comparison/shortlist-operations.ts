import 'server-only';
import {
  addShortlistItems,
  comparableMachineIds,
  deleteShortlist as removeShortlist,
  findShortlistByName,
  insertShortlist,
  isShortlistOwner,
  removeShortlistItem,
} from '@/db/queries/shortlists';
import { db } from '@/db/client';
import { defineOperation, type Actor, type Transaction } from '@/lib/auth/operation';
import { AppError } from '@/lib/errors';
import { addToShortlistSchema, createShortlistSchema, deleteShortlistSchema, removeFromShortlistSchema } from '@/lib/validation/shortlist';

// A dealer's shortlists: named selections from the comparison table. Only the owner may see or change one.

const ownsShortlist = ({ actor, input }: { actor: Actor | null; input: { shortlistId: number } }) => isShortlistOwner(db, input.shortlistId, actor!.id);

async function onlyComparable(tx: Transaction, machineIds: number[]) {
  const known = await comparableMachineIds(tx, machineIds);
  const unknown = machineIds.filter((id) => !known.has(id));
  if (unknown.length > 0) throw new AppError('invalid_input', undefined, { machineIds: [`No released report for machine ${unknown.join(', ')}`] });
  return [...new Set(machineIds)];
}

export const createShortlist = defineOperation({
  name: 'shortlist.create',
  entityType: 'shortlist',
  access: 'compare.use',
  input: createShortlistSchema,
  async run({ actor, input, tx }) {
    const machineIds = await onlyComparable(tx, input.machineIds);
    if (await findShortlistByName(tx, actor!.id, input.name)) throw new AppError('invalid_input', undefined, { name: ['You already have a shortlist of that name'] });
    const id = await insertShortlist(tx, actor!.id, input.name);
    await addShortlistItems(tx, id, machineIds);
    return { data: { id, name: input.name, machines: machineIds.length }, entityId: id, detail: { machines: machineIds.length } };
  },
});

export const addToShortlist = defineOperation({
  name: 'shortlist.add',
  entityType: 'shortlist',
  access: 'compare.use',
  input: addToShortlistSchema,
  authorize: ownsShortlist,
  async run({ input, tx }) {
    const machineIds = await onlyComparable(tx, input.machineIds);
    await addShortlistItems(tx, input.shortlistId, machineIds);
    return { data: { id: input.shortlistId, added: machineIds.length }, entityId: input.shortlistId, detail: { machineIds } };
  },
});

export const removeFromShortlist = defineOperation({
  name: 'shortlist.remove',
  entityType: 'shortlist',
  access: 'compare.use',
  input: removeFromShortlistSchema,
  authorize: ownsShortlist,
  async run({ input, tx }) {
    await removeShortlistItem(tx, input.shortlistId, input.machineId);
    return { data: { id: input.shortlistId }, entityId: input.shortlistId, detail: { machineId: input.machineId } };
  },
});

export const deleteShortlist = defineOperation({
  name: 'shortlist.delete',
  entityType: 'shortlist',
  access: 'compare.use',
  input: deleteShortlistSchema,
  authorize: ownsShortlist,
  async run({ input, tx }) {
    await removeShortlist(tx, input.shortlistId);
    return { data: { id: input.shortlistId }, entityId: input.shortlistId };
  },
});
