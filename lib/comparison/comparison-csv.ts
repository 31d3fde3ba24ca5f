import Papa from 'papaparse';
import { LATHE_KIND_LABELS, type ComparisonRow } from './comparison-row';
import { SUBSYSTEM_TABLE, SUBSYSTEMS } from '@/lib/scoring/subsystems';
import { SUBSYSTEM_KEYS } from '@/lib/validation/comparison-query';

const euros = (minor: number | null) => (minor === null ? '' : (minor / 100).toFixed(2));

/**
 * The CSV columns, in the table's order, each header with its unit. Figures are plain numbers (no
 * thousands separators or currency signs) so a spreadsheet reads them as numbers; a blank means
 * "not measured" or "comes with the report".
 */
const CSV_COLUMNS: ReadonlyArray<[header: string, value: (row: ComparisonRow) => string | number]> = [
  ['Report id', (r) => r.reportId],
  ['Machine id', (r) => r.machineId],
  ['Maker', (r) => r.maker],
  ['Model', (r) => r.model],
  ['Type', (r) => LATHE_KIND_LABELS[r.kind]],
  ['Swing over bed (mm)', (r) => r.swingMm],
  ['Between centres (mm)', (r) => r.betweenCentresMm],
  ['Year built', (r) => r.yearBuilt ?? ''],
  ['Town', (r) => r.town],
  ['Region', (r) => r.region],
  ['Overall condition', (r) => r.overallCondition],
  ['Overall score (0-100)', (r) => r.overallScore],
  ['Grade firm or provisional', (r) => (r.overallProvisional ? 'provisional' : 'firm')],
  ...SUBSYSTEMS.map((id): [string, (r: ComparisonRow) => string] => [`${SUBSYSTEM_TABLE[id].label} grade`, (r) => r.subsystems[SUBSYSTEM_KEYS[id]].grade ?? '']),
  ['Confidence (%)', (r) => Math.round(r.confidence * 100)],
  ['Asking price', (r) => euros(r.askingPriceMinor)],
  ['Asking price currency', (r) => r.priceCurrency],
  ['Fair market value', (r) => euros(r.fairMarketValueMinor)],
  ['Price / value', (r) => (r.priceToValue === null ? '' : r.priceToValue.toFixed(2))],
  ['Repair estimate', (r) => euros(r.repairEstimateMinor)],
  ['Value currency', (r) => r.valueCurrency],
  // Landed cost and inclusions are in the asking price's currency, as on the report page.
  ['Landed cost (at least)', (r) => euros(r.landedCostMinor)],
  ['Landed cost parts not known', (r) => (r.hasDetails ? r.landedCostNotKnown.join('; ') : '')],
  ['Inclusions value', (r) => euros(r.inclusionsValueMinor)],
  ['Deal-breakers (count)', (r) => r.dealBreakerCount],
  ['Deal-breakers', (r) => r.dealBreakers.map((d) => d.label).join('; ')],
  ['Days listed', (r) => r.daysListed],
  ['Inspected on (UTC)', (r) => r.inspectedOn],
  ['Report age (days)', (r) => r.reportAgeDays],
  ['Report current until (UTC)', (r) => r.validUntil],
  ['Report stale', (r) => (r.stale ? 'stale' : 'current')],
  ['Report released (UTC)', (r) => r.releasedAt.slice(0, 10)],
  ['Details', (r) => (r.hasDetails ? 'bought' : 'summary only')],
];

/**
 * A text cell a spreadsheet could read as a formula: one whose first character is =, +, -, @, tab or
 * carriage return (OWASP's CSV Injection page), or a line feed, whatever follows. papaparse's own
 * `escapeFormulae: true` pattern (`/^[=+\-@\t\r].*$/`) needs the whole value on one line, so "=1+2"
 * followed by a line break went out unescaped. Such a cell is written with a leading apostrophe.
 */
export const FORMULA_START = /^[=+\-@\t\r\n]/;

export function comparisonCsv(rows: readonly ComparisonRow[]): string {
  return Papa.unparse(
    {
      fields: CSV_COLUMNS.map(([header]) => header),
      data: rows.map((row) => CSV_COLUMNS.map(([, value]) => value(row))),
    },
    // Formula escaping: a maker called "=cmd" must not run in a spreadsheet.
    { escapeFormulae: FORMULA_START, newline: '\r\n' },
  );
}
