import 'server-only';
import { insertComparableSales } from '@/db/queries/comparable-sales';
import { defineOperation } from '@/lib/auth/operation';
import { AppError } from '@/lib/errors';
import { comparableSaleSchema, comparableSalesImportSchema } from '@/lib/validation/comparable-sale';
import { parseComparableSalesCsv } from './parse-comparable-sales-csv';

// Market data for the sales-comparison valuation: coordinators record comparable sales one at a
// time or import a spreadsheet. New sales count for reports scored from now on; released reports keep theirs.

export const recordComparableSale = defineOperation({
  name: 'market.sale.create',
  entityType: 'comparable_sale',
  access: 'market.manage',
  input: comparableSaleSchema,
  async run({ actor, input, tx }) {
    await insertComparableSales(tx, [input], actor!.id);
    return { data: { recorded: 1 }, detail: { description: input.description, swingMm: input.swingMm, price: input.price } };
  },
});

/**
 * Imports every valid row and reports the rejected ones by line. A file with no valid row is refused
 * as a whole (400) so nothing half-imports by accident; rows already on record are never touched.
 */
export const importComparableSales = defineOperation({
  name: 'market.sale.import',
  entityType: 'comparable_sale',
  access: 'market.manage',
  input: comparableSalesImportSchema,
  async run({ actor, input, tx }) {
    const { accepted, rejected, problems } = parseComparableSalesCsv(input.csv);
    if (accepted.length === 0) {
      const message = problems[0] ?? (rejected.length ? 'No row of the file could be imported; see the reasons by line.' : 'The file has no rows.');
      throw new AppError('invalid_input', message, {
        csv: [message],
        ...Object.fromEntries(rejected.slice(0, 200).map((r) => [`line ${r.line}`, r.errors])),
      });
    }
    const imported = await insertComparableSales(
      tx,
      accepted.map((a) => a.sale),
      actor!.id,
    );
    return { data: { imported, rejected, problems }, detail: { imported, rejected: rejected.length } };
  },
});
