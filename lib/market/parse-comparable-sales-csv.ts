import Papa from 'papaparse';
import { comparableSaleSchema, type ComparableSale } from '@/lib/validation/comparable-sale';

export const MAX_IMPORT_ROWS = 5_000;

/** CSV headers Waygrade reads, and the field each fills. Headers are matched without case, spaces or units. */
const HEADERS: Record<string, keyof ComparableSale> = {
  description: 'description',
  swing: 'swingMm',
  swingmm: 'swingMm',
  swingoverbedmm: 'swingMm',
  betweencentres: 'betweenCentresMm',
  betweencentresmm: 'betweenCentresMm',
  year: 'yearBuilt',
  yearbuilt: 'yearBuilt',
  condition: 'condition',
  salekind: 'saleKind',
  kind: 'saleKind',
  price: 'price',
  currency: 'currency',
  soldon: 'soldOn',
  datesold: 'soldOn',
  region: 'region',
  source: 'source',
};
export const TEMPLATE_HEADERS = ['description', 'swing_mm', 'between_centres_mm', 'year_built', 'condition', 'sale_kind', 'price', 'currency', 'sold_on', 'region', 'source'];

const normalise = (header: string) => header.toLowerCase().replace(/\(.*?\)/g, '').replace(/[^a-z]/g, '');

export type CsvRejection = { line: number; errors: string[] };
export type CsvParseResult = { accepted: Array<{ line: number; sale: ComparableSale }>; rejected: CsvRejection[]; problems: string[] };

/**
 * Reads comparable sales from CSV text, validating row by row: good rows are accepted, each bad one
 * is reported with its line number (as a spreadsheet counts, header = line 1) and every reason.
 */
export function parseComparableSalesCsv(text: string): CsvParseResult {
  const parsed = Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ''), { header: true, skipEmptyLines: 'greedy', transformHeader: (h) => h.trim() });
  const columns = (parsed.meta.fields ?? []).map((field) => ({ field, key: HEADERS[normalise(field)] }));
  const problems: string[] = [];
  const unknown = columns.filter((c) => !c.key).map((c) => c.field);
  if (unknown.length) problems.push(`Columns not read: ${unknown.join(', ')}`);
  const present = new Set(columns.map((c) => c.key));
  const missing = (['description', 'swingMm', 'saleKind', 'price', 'soldOn'] as const).filter((key) => !present.has(key));
  if (missing.length) {
    return { accepted: [], rejected: [], problems: [...problems, `The file needs the columns ${TEMPLATE_HEADERS.join(', ')}; missing: ${missing.join(', ')}`] };
  }
  if (parsed.data.length > MAX_IMPORT_ROWS) {
    return { accepted: [], rejected: [], problems: [...problems, `The file has ${parsed.data.length} rows; import at most ${MAX_IMPORT_ROWS} at a time`] };
  }

  const rowErrors = new Map<number, string[]>();
  for (const error of parsed.errors) {
    if (error.row !== undefined) rowErrors.set(error.row, [...(rowErrors.get(error.row) ?? []), error.message]);
  }
  const accepted: CsvParseResult['accepted'] = [];
  const rejected: CsvRejection[] = [];
  parsed.data.forEach((raw, index) => {
    const line = index + 2;
    const fields = Object.fromEntries(columns.filter((c) => c.key).map((c) => [c.key, raw[c.field]]));
    const result = comparableSaleSchema.safeParse(fields);
    const structural = rowErrors.get(index) ?? [];
    if (result.success && structural.length === 0) accepted.push({ line, sale: result.data });
    else {
      const reasons = result.success ? [] : result.error.issues.map((issue) => `${columns.find((c) => c.key === issue.path[0])?.field ?? String(issue.path[0])}: ${issue.message}`);
      rejected.push({ line, errors: [...structural, ...reasons] });
    }
  });
  return { accepted, rejected, problems };
}
