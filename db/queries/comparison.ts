import 'server-only';
import { and, asc, desc, eq, gte, inArray, isNull, like, lt, lte, or, sql, type AnyColumn, type SQL, type SQLWrapper } from 'drizzle-orm';
import { comparisonEntries as e, reportAccessGrants, reports, shortlistItems, shortlists } from '@/db/schema';
import type { Database } from '@/db/client';
import type { ComparisonPage, ComparisonRow } from '@/lib/comparison/comparison-row';
import { SUBSYSTEMS } from '@/lib/scoring/subsystems';
import { SUBSYSTEM_KEYS, type ComparisonFilters, type ComparisonQuery, type SortColumn, type SubsystemKey } from '@/lib/validation/comparison-query';

// The one query behind the comparison table: the API's pages, the CSV export and the benchmark's
// bare-SQL measurement all build it here, so what is measured is what is served. It reads
// comparison_entries, the narrow copy of every current released report (see its schema file).

type Reader = Pick<Database, 'select' | 'selectDistinct'>;

/**
 * Which reports' details (value, price ÷ value, repair estimate, checks) this reader may see:
 * coordinators all; anyone else the inspections they hold an unrevoked grant for, any version.
 */
export type DetailVisibility = { all: true } | { all: false; inspectionIds: number[] };

export async function loadDetailVisibility(reader: Reader, actor: { id: string; role: string }): Promise<DetailVisibility> {
  if (actor.role === 'admin') return { all: true };
  const rows = await reader
    .selectDistinct({ inspectionId: reports.inspectionId })
    .from(reportAccessGrants)
    .innerJoin(reports, eq(reports.id, reportAccessGrants.reportId))
    .where(and(eq(reportAccessGrants.userId, actor.id), isNull(reportAccessGrants.revokedAt)));
  return { all: false, inspectionIds: rows.map((r) => r.inspectionId) };
}

/** The report figures a reader sees: the figure itself with details, NULL without. */
function detailExpressions(visibility: DetailVisibility) {
  const visible = visibility.all
    ? sql`1`
    : visibility.inspectionIds.length === 0
      ? sql`0`
      : sql`${e.inspectionId} in (${sql.join(
          visibility.inspectionIds.map((id) => sql`${id}`),
          sql`, `,
        )})`;
  const shown = (column: AnyColumn) => (visibility.all ? sql`${column}` : sql`case when ${visible} then ${column} end`);
  const value = shown(e.fairMarketValueMinor);
  return {
    visible: sql`${visible}`.mapWith(Number),
    value: value.mapWith(Number),
    repair: shown(e.repairEstimateMinor).mapWith(Number),
    // Only like for like: a price in another currency than the value gives no ratio.
    ratio: sql`case when ${e.priceCurrency} = ${e.valueCurrency} then round(${e.askingPriceMinor} / nullif(${value}, 0), 3) end`.mapWith(Number),
  };
}
type Details = ReturnType<typeof detailExpressions>;

/** Each subsystem's score and grade columns, by the URL key. */
const SUBSYSTEM_COLUMNS: Record<SubsystemKey, { score: AnyColumn; grade: AnyColumn }> = {
  bed: { score: e.bedScore, grade: e.bedGrade },
  spindle: { score: e.spindleScore, grade: e.spindleGrade },
  gearbox: { score: e.gearboxScore, grade: e.gearboxGrade },
  slides: { score: e.slidesScore, grade: e.slidesGrade },
  tailstock: { score: e.tailstockScore, grade: e.tailstockGrade },
  drive: { score: e.driveScore, grade: e.driveGrade },
  electrical: { score: e.electricalScore, grade: e.electricalGrade },
  accessories: { score: e.accessoriesScore, grade: e.accessoriesGrade },
};

type Direction = typeof asc;
type NullsLast = (expression: SQLWrapper) => SQL[];

/** ORDER BY for every sortable column: the allow-list's other half. */
const SORTS: Record<SortColumn, (direction: Direction, nullsLast: NullsLast, details: Details) => SQL[]> = {
  machine: (d) => [d(e.maker), d(e.model)],
  kind: (d) => [d(e.latheKind)],
  swing: (d) => [d(e.swingMm)],
  centres: (d) => [d(e.betweenCentresMm)],
  year: (_d, n) => n(e.yearBuilt),
  location: (d) => [d(e.region), d(e.town)],
  condition: (d) => [d(e.overallScore)],
  ...(Object.fromEntries(Object.entries(SUBSYSTEM_COLUMNS).map(([key, c]) => [key, (_d: Direction, n: NullsLast) => n(c.score)])) as Record<
    SubsystemKey,
    (d: Direction, n: NullsLast) => SQL[]
  >),
  confidence: (d) => [d(e.confidence)],
  price: (_d, n) => n(e.askingPriceMinor),
  value: (_d, n, details) => n(details.value),
  ratio: (_d, n, details) => n(details.ratio),
  repair: (_d, n, details) => n(details.repair),
  released: (d) => [d(e.releasedAt)],
};

const EURO = 100;

/** WHERE for a validated filter; every value is a bound parameter. */
function whereFor(filters: ComparisonFilters, details: Details, readerId: string): SQL | undefined {
  const conditions: Array<SQL | undefined> = [];
  const range = (expression: SQLWrapper, low: number | undefined, high: number | undefined, scale = 1) => {
    if (low !== undefined) conditions.push(gte(expression, low * scale));
    if (high !== undefined) conditions.push(lte(expression, high * scale));
  };
  if (filters.q) {
    const pattern = `%${filters.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    conditions.push(or(like(e.maker, pattern), like(e.model, pattern), like(sql`concat(${e.maker}, ' ', ${e.model})`, pattern)));
  }
  if (filters.kind) conditions.push(inArray(e.latheKind, filters.kind));
  if (filters.region) conditions.push(inArray(e.region, filters.region));
  if (filters.condition) conditions.push(inArray(e.overallCondition, filters.condition));
  for (const id of SUBSYSTEMS) {
    const key = SUBSYSTEM_KEYS[id];
    const wanted = filters[`grade.${key}`];
    if (wanted) conditions.push(inArray(SUBSYSTEM_COLUMNS[key].grade, wanted));
  }
  range(e.swingMm, filters.swingMin, filters.swingMax);
  range(e.betweenCentresMm, filters.centresMin, filters.centresMax);
  range(e.yearBuilt, filters.yearMin, filters.yearMax);
  range(e.confidence, filters.confidenceMin, filters.confidenceMax, 0.01);
  range(e.askingPriceMinor, filters.priceMin, filters.priceMax, EURO);
  range(details.value, filters.valueMin, filters.valueMax, EURO);
  range(details.ratio, filters.ratioMin, filters.ratioMax);
  range(details.repair, filters.repairMin, filters.repairMax, EURO);
  if (filters.releasedFrom) conditions.push(gte(e.releasedAt, new Date(`${filters.releasedFrom}T00:00:00Z`)));
  if (filters.releasedTo) conditions.push(lt(e.releasedAt, new Date(Date.parse(`${filters.releasedTo}T00:00:00Z`) + 86_400_000)));
  if (filters.shortlist !== undefined) {
    // A shortlist filters only for its owner; anyone else's id matches nothing.
    conditions.push(
      sql`${e.machineId} in (select ${shortlistItems.machineId} from ${shortlistItems} inner join ${shortlists} on ${shortlists.id} = ${shortlistItems.shortlistId} where ${shortlists.id} = ${filters.shortlist} and ${shortlists.ownerId} = ${readerId})`,
    );
  }
  return and(...conditions);
}

function orderFor(query: Pick<ComparisonQuery, 'sort' | 'dir'>, details: Details): SQL[] {
  const direction = query.dir === 'asc' ? asc : desc;
  // Nullable figures sort their blanks last in either direction, so hidden values never lead.
  const nullsLast: NullsLast = (expression) => [sql`${expression} is null`, direction(expression)];
  return [...SORTS[query.sort](direction, nullsLast, details), direction(e.reportId)];
}

function rowColumns(details: Details) {
  return {
    reportId: e.reportId,
    machineId: e.machineId,
    maker: e.maker,
    model: e.model,
    kind: e.latheKind,
    swingMm: e.swingMm,
    betweenCentresMm: e.betweenCentresMm,
    yearBuilt: e.yearBuilt,
    town: e.town,
    region: e.region,
    overallCondition: e.overallCondition,
    overallScore: e.overallScore,
    confidence: e.confidence,
    askingPriceMinor: e.askingPriceMinor,
    priceCurrency: e.priceCurrency,
    hasDetails: details.visible,
    fairMarketValueMinor: details.value,
    priceToValue: details.ratio,
    repairEstimateMinor: details.repair,
    valueCurrency: e.valueCurrency,
    releasedAt: e.releasedAt,
    ...Object.fromEntries(Object.entries(SUBSYSTEM_COLUMNS).flatMap(([key, c]) => [[`${key}Score`, c.score], [`${key}Grade`, c.grade]])),
  };
}

/** The page query and the count query, unexecuted: the API runs them; the benchmark also runs their SQL bare. */
export function buildComparisonQueries(reader: Reader, query: ComparisonQuery, visibility: DetailVisibility, readerId: string) {
  const details = detailExpressions(visibility);
  const where = whereFor(query, details, readerId);
  const page = reader
    .select(rowColumns(details))
    .from(e)
    .where(where)
    .orderBy(...orderFor(query, details))
    .limit(query.pageSize)
    .offset((query.page - 1) * query.pageSize);
  const total = reader.select({ n: sql`count(*)`.mapWith(Number) }).from(e).where(where);
  return { page, total };
}

function toRow(raw: Record<string, unknown>): ComparisonRow {
  const subsystems = Object.fromEntries(
    Object.keys(SUBSYSTEM_COLUMNS).map((key) => [key, { score: raw[`${key}Score`] ?? null, grade: raw[`${key}Grade`] ?? null }]),
  ) as ComparisonRow['subsystems'];
  const released = raw.releasedAt as Date | null;
  return {
    reportId: raw.reportId as number,
    machineId: raw.machineId as number,
    maker: raw.maker as string,
    model: raw.model as string,
    kind: raw.kind as ComparisonRow['kind'],
    swingMm: raw.swingMm as number,
    betweenCentresMm: raw.betweenCentresMm as number,
    yearBuilt: raw.yearBuilt as number | null,
    town: raw.town as string,
    region: raw.region as string,
    overallCondition: raw.overallCondition as ComparisonRow['overallCondition'],
    overallScore: raw.overallScore as number,
    confidence: Number(raw.confidence),
    askingPriceMinor: raw.askingPriceMinor as number | null,
    priceCurrency: raw.priceCurrency as string,
    hasDetails: Boolean(raw.hasDetails),
    fairMarketValueMinor: raw.fairMarketValueMinor as number | null,
    priceToValue: raw.priceToValue as number | null,
    repairEstimateMinor: raw.repairEstimateMinor as number | null,
    valueCurrency: raw.valueCurrency as string,
    releasedAt: (released ?? new Date(0)).toISOString(),
    subsystems,
  };
}

/** One page of the table with the number of machines matching the filter. */
export async function listComparisonRows(reader: Reader, query: ComparisonQuery, visibility: DetailVisibility, readerId: string): Promise<ComparisonPage> {
  const { page, total } = buildComparisonQueries(reader, query, visibility, readerId);
  const rows = await page;
  const [count] = await total;
  return { rows: rows.map((row) => toRow(row)), total: count?.n ?? 0, page: query.page, pageSize: query.pageSize };
}

/** Exports refuse filters wider than this rather than build a file no spreadsheet opens comfortably. */
export const MAX_EXPORT_ROWS = 20_000;

/** Every machine matching the filter in the table's order, up to MAX_EXPORT_ROWS plus one (to tell that it was cut). */
export async function listComparisonRowsForExport(reader: Reader, query: ComparisonQuery, visibility: DetailVisibility, readerId: string): Promise<ComparisonRow[]> {
  const details = detailExpressions(visibility);
  const rows = await reader
    .select(rowColumns(details))
    .from(e)
    .where(whereFor(query, details, readerId))
    .orderBy(...orderFor(query, details))
    .limit(MAX_EXPORT_ROWS + 1);
  return rows.map((row) => toRow(row));
}

/** Regions that have inspected machines, for the location filter's choices. */
export async function listComparisonRegions(reader: Reader): Promise<string[]> {
  const rows = await reader.selectDistinct({ region: e.region }).from(e).orderBy(e.region);
  return rows.map((r) => r.region);
}
