import { z } from 'zod';

const machineIds = z
  .array(z.coerce.number().int().positive(), { error: 'Choose machines from the table' })
  .min(1, 'Choose at least one machine')
  .max(200, 'A shortlist holds at most 200 machines at a time');
const shortlistId = z.coerce.number().int().positive('Not a shortlist');

export const createShortlistSchema = z.object({
  name: z.string().trim().min(1, 'Give the shortlist a name').max(80, 'At most 80 characters'),
  machineIds,
});
export const addToShortlistSchema = z.object({ shortlistId, machineIds });
export const removeFromShortlistSchema = z.object({ shortlistId, machineId: z.coerce.number().int().positive() });
export const deleteShortlistSchema = z.object({ shortlistId });
