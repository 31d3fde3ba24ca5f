import 'server-only';
import { listComparisonRowsForExport, loadComparisonViewer, MAX_EXPORT_ROWS } from '@/db/queries/comparison';
import { defineOperation } from '@/lib/auth/operation';
import { AppError } from '@/lib/errors';
import { comparisonQuerySchema } from '@/lib/validation/comparison-query';
import { comparisonCsv } from './comparison-csv';

/** Every machine matching the table's current filter, in its order, as CSV (bounded). */
export const exportComparison = defineOperation({
  name: 'compare.export',
  entityType: 'comparison',
  access: 'compare.use',
  input: comparisonQuerySchema,
  auditSuccess: false,
  readOnly: true,
  async run({ actor, input, tx }) {
    const viewer = await loadComparisonViewer(tx, actor!);
    const rows = await listComparisonRowsForExport(tx, input, viewer);
    if (rows.length > MAX_EXPORT_ROWS) {
      const message = `More than ${MAX_EXPORT_ROWS.toLocaleString('en-GB')} machines match this filter. Narrow it before exporting.`;
      throw new AppError('invalid_input', message, { _: [message] });
    }
    return { data: { csv: comparisonCsv(rows), rows: rows.length } };
  },
});
