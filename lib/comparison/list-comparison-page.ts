import 'server-only';
import { listComparisonRows, loadComparisonViewer } from '@/db/queries/comparison';
import { defineOperation } from '@/lib/auth/operation';
import { comparisonQuerySchema } from '@/lib/validation/comparison-query';

/** A page of the dealers' comparison table: summary grades of every released report, details of the ones bought. */
export const listComparisonPage = defineOperation({
  name: 'compare.list',
  entityType: 'comparison',
  access: 'compare.use',
  input: comparisonQuerySchema,
  auditSuccess: false,
  readOnly: true,
  async run({ actor, input, tx }) {
    const viewer = await loadComparisonViewer(tx, actor!);
    return { data: await listComparisonRows(tx, input, viewer) };
  },
});
