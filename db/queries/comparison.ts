import 'server-only';
import { and, asc, desc, eq, fillPlaceholders, gt, gte, inArray, isNull, like, lt, lte, or, sql, type AnyColumn, type SQL, type SQLWrapper } from 'drizzle-orm';
import { buyerShopProfiles, comparisonEntries as e, reportAccessGrants, reports, reportSettings, shortlistItems, shortlists } from '@/db/schema';
import { perDatabase, type Database } from '@/db/client';
import type { ComparisonPage, ComparisonRow, LandedCostPart } from '@/lib/comparison/comparison-row';
import { dealBreakersInWords } from '@/lib/comparison/deal-breaker-labels';
import { landedCostAssumptions } from '@/lib/comparison/landed-cost-basis';
import { CONVERTER_SIZING_FACTOR, DEMO_CONVERTER_COSTS, VOLTAGE_TOLERANCE, type SupplySpec } from '@/lib/decision/phase-converter';
import { DEFAULT_VALIDITY_DAYS, reportCurrency, type ReportCurrency } from '@/lib/decision/report-currency';
import { SUBSYSTEMS } from '@/lib/scoring/subsystems';
import { SUBSYSTEM_KEY_LIST, SUBSYSTEM_KEYS, type ComparisonFilters, type ComparisonQuery, type SortColumn, type SubsystemKey } from '@/lib/validation/comparison-query';
import { containsPattern } from './like-pattern';

// The one query behind the comparison table: the API's pages, the CSV export and the benchmark's
// bare-SQL measurement all build it here, so what is measured is what is served. It reads
// comparison_entries, the narrow copy of every current released report (see its schema file).

type Reader = Pick<Database, 'select' | 'selectDistinct'>;

/**
 * Which reports' details (value, price ÷ value, repair estimate, checks) this reader may see:
 * coordinators all; anyone else the inspections they hold an unrevoked grant for, any version.
 */
export type DetailVisibility = { all: true } | { all: false; inspectionIds: number[] };

/** The inspections this reader holds an unrevoked grant for, as a query of its own. */
async function grantedInspectionIds(reader: Reader, readerId: string): Promise<number[]> {
  const rows = await reader
    .selectDistinct({ inspectionId: reports.inspectionId })
    .from(reportAccessGrants)
    .innerJoin(reports, eq(reports.id, reportAccessGrants.reportId))
    .where(and(eq(reportAccessGrants.userId, readerId), isNull(reportAccessGrants.revokedAt)));
  return rows.map((r) => r.inspectionId);
}

/**
 * Everything about the reader the table's figures depend on: which reports' details they see, their
 * shop supply (for the phase converter in the landed cost), how long reports stay current, and now.
 */
export type ComparisonViewer = { id: string; visibility: DetailVisibility; shop: SupplySpec | null; validityDays: number; now: Date };

/** Ids as GROUP_CONCAT lists them, or null when the list does not hold exactly `expected` whole ids (cut at group_concat_max_len). */
function parseIdList(list: string | null, expected: number): number[] | null {
  const ids = list ? list.split(',').map(Number) : [];
  return ids.length === expected && ids.every(Number.isSafeInteger) ? ids : null;
}

/** The viewer's settings, and for anyone but coordinators their grants; prepared once per database. */
function viewerStatement(reader: Reader, withGrants: boolean) {
  const readerId = sql.placeholder('reader');
  const granted = sql`from ${reportAccessGrants} inner join ${reports} on ${reports.id} = ${reportAccessGrants.reportId} where ${reportAccessGrants.userId} = ${readerId} and ${reportAccessGrants.revokedAt} is null`;
  return reader
    .select({
      validityDays: sql<number | null>`(select ${reportSettings.validityDays} from ${reportSettings} where ${reportSettings.id} = 1)`.mapWith(Number),
      supplyVoltage: sql<number | null>`(select ${buyerShopProfiles.supplyVoltage} from ${buyerShopProfiles} where ${buyerShopProfiles.userId} = ${readerId})`,
      supplyPhases: sql<number | null>`(select ${buyerShopProfiles.supplyPhases} from ${buyerShopProfiles} where ${buyerShopProfiles.userId} = ${readerId})`,
      grantedIds: withGrants ? sql<string | null>`(select group_concat(distinct ${reports.inspectionId}) ${granted})` : sql<string | null>`null`,
      grantedCount: withGrants ? sql<number>`(select count(distinct ${reports.inspectionId}) ${granted})`.mapWith(Number) : sql<number>`0`.mapWith(Number),
    })
    .from(sql`(select 1) as one`)
    .prepare();
}
const viewerStatements = perDatabase((reader: Reader) => ({ seesAll: viewerStatement(reader, false), granted: viewerStatement(reader, true) }));

/**
 * The reader's settings and grants in one round trip (the table asks for them on every page): the
 * two single-row settings and the granted inspections as a GROUP_CONCAT list with its count beside
 * it, so a list cut short by the server's length limit is noticed and read again in full.
 */
export async function loadComparisonViewer(reader: Reader, actor: { id: string; role: string }, now = new Date()): Promise<ComparisonViewer> {
  const seesAll = actor.role === 'admin';
  const [row] = await viewerStatements(reader)[seesAll ? 'seesAll' : 'granted'].execute({ reader: actor.id });
  let visibility: DetailVisibility = { all: true };
  if (!seesAll) {
    const listed = parseIdList(row?.grantedIds ?? null, row?.grantedCount ?? 0);
    visibility = { all: false, inspectionIds: listed ?? (await grantedInspectionIds(reader, actor.id)) };
  }
  const phases = row?.supplyPhases === null || row?.supplyPhases === undefined ? null : Number(row.supplyPhases);
  const shop = row && row.supplyVoltage !== null && (phases === 1 || phases === 3) ? { voltage: Number(row.supplyVoltage), phases: phases as 1 | 3 } : null;
  return { id: actor.id, visibility, shop, validityDays: row?.validityDays || DEFAULT_VALIDITY_DAYS, now };
}

/**
 * The phase converter this reader's shop needs for each machine, in SQL, following assessSupply in
 * lib/decision/phase-converter.ts: no shop supply or no nameplate → not known (NULL); a three-phase
 * machine on a single-phase shop → the first converter size covering 1.5 × the motor (NULL when the
 * motor is not known, beyond the sizes, or priced in another currency); otherwise the machine runs
 * (0) when the voltages agree within 10 %, and is not known when they differ.
 */
function converterExpression(shop: SupplySpec | null, b: Bindings): SQL {
  if (!shop) return sql`null`;
  const sizes = [...DEMO_CONVERTER_COSTS].sort((a, b) => a.upToKw - b.upToKw);
  const converterCost = sql`case ${sql.join(
    sizes.map((size) => sql`when ${e.motorKw} * ${CONVERTER_SIZING_FACTOR} <= ${size.upToKw} then (case when ${e.priceCurrency} = ${size.cost.currency} then ${size.cost.amountMinor} end)`),
    sql` `,
  )} end`;
  // A three-phase shop serves single-phase machines at phase-to-neutral voltage (400 V lines give 230 V).
  const singlePhaseVoltage = shop.phases === 3 ? Math.round(shop.voltage / Math.sqrt(3)) : shop.voltage;
  const shopVoltage = sql`(case when ${e.supplyPhases} = 1 then ${b.bind('shop.singlePhaseVoltage', singlePhaseVoltage)} else ${b.bind('shop.voltage', shop.voltage)} end)`;
  return sql`(case
    when ${e.supplyPhases} is null then null
    when ${e.supplyPhases} = 3 and ${b.bind('shop.phases', shop.phases)} = 1 then (case when ${e.motorKw} is null then null else ${converterCost} end)
    when abs(${e.supplyVoltage} - ${shopVoltage}) <= ${VOLTAGE_TOLERANCE} * greatest(${e.supplyVoltage}, ${shopVoltage}) then 0
  end)`;
}

/** The report figures a reader sees: the figure itself with details, NULL without. */
function detailExpressions(viewer: ComparisonViewer, b: Bindings) {
  const { visibility } = viewer;
  const visible = visibility.all
    ? sql`1`
    : visibility.inspectionIds.length === 0
      ? sql`0`
      : sql`${e.inspectionId} in (${sql.join(
          visibility.inspectionIds.map((id, i) => sql`${b.bind(`grant.${i}`, id)}`),
          sql`, `,
        )})`;
  const shown = (column: AnyColumn | SQL) => (visibility.all ? sql`${column}` : sql`case when ${visible} then ${column} end`);
  const value = shown(e.fairMarketValueMinor);
  const converter = converterExpression(viewer.shop, b);
  // Without a shop supply the converter is not known and the landed cost is the stored figure itself.
  const landed = viewer.shop ? shown(sql`(${e.landedBaseMinor} + coalesce(${converter}, 0))`) : shown(e.landedBaseMinor);
  return {
    visible: sql`${visible}`.mapWith(Number),
    value: value.mapWith(Number),
    repair: shown(e.repairEstimateMinor).mapWith(Number),
    landed: landed.mapWith(Number),
    converter: (viewer.shop ? shown(converter) : sql`null`).mapWith(Number),
    rigging: shown(e.riggingMinor).mapWith(Number),
    missingTooling: shown(e.missingToolingMinor).mapWith(Number),
    inclusions: shown(e.inclusionsValueMinor).mapWith(Number),
    dealBreakers: shown(e.dealBreakers),
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

/**
 * Columns whose figure grows as the stored value falls: days listed and report age are counted back
 * from now, so "fewest days first" reads the listing date (and the report id after it) newest first.
 */
const COUNTED_BACK: ReadonlySet<SortColumn> = new Set(['daysListed', 'reportAge']);

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
  landed: (_d, n, details) => n(details.landed),
  inclusions: (_d, n, details) => n(details.inclusions),
  dealBreakers: (d) => [d(e.dealBreakerCount)],
  // Given the flipped direction by orderFor: ascending days is descending dates.
  daysListed: (d) => [d(e.listedAt)],
  reportAge: (d) => [d(e.inspectedOn)],
  released: (d) => [d(e.releasedAt)],
};

const DAY_MS = 86_400_000;
/** Midnight UTC of the day `days` whole days before `now`'s day. */
const dayStartBefore = (now: Date, days: number) => new Date((Math.floor(now.getTime() / DAY_MS) - days) * DAY_MS);
const isoDate = (d: Date) => d.toISOString().slice(0, 10);
/** A DATETIME(3) value as the driver sends it, as Drizzle writes a Date for such a column. */
const datetimeText = (d: Date) => d.toISOString().replace('T', ' ').replace('Z', '');

const EURO = 100;

/** The numeric range filters, by the stem of their Min / Max keys. */
type RangeFilter = 'swing' | 'centres' | 'year' | 'confidence' | 'price' | 'value' | 'ratio' | 'repair' | 'landed' | 'inclusions';

/**
 * WHERE for a validated filter. Every value is a named placeholder whose value `b` keeps, so the
 * statement's text depends only on which filters are set (and how many choices each list has).
 */
function whereFor(filters: ComparisonFilters, details: Details, viewer: ComparisonViewer, b: Bindings): SQL | undefined {
  const conditions: Array<SQL | undefined> = [];
  // A range filter is the pair <name>Min / <name>Max, each its own placeholder.
  const range = (expression: SQLWrapper, name: RangeFilter, scale = 1) => {
    const low = filters[`${name}Min`];
    const high = filters[`${name}Max`];
    if (low !== undefined) conditions.push(gte(expression, b.bind(`${name}Min`, low * scale)));
    if (high !== undefined) conditions.push(lte(expression, b.bind(`${name}Max`, high * scale)));
  };
  const oneOf = (column: AnyColumn, name: string, values: readonly string[] | undefined) => {
    if (values) conditions.push(inArray(column, values.map((value, i) => b.bind(`${name}.${i}`, value))));
  };
  if (filters.q) {
    const pattern = b.bind('q', containsPattern(filters.q));
    conditions.push(or(like(e.maker, pattern), like(e.model, pattern), like(sql`concat(${e.maker}, ' ', ${e.model})`, pattern)));
  }
  oneOf(e.latheKind, 'kind', filters.kind);
  oneOf(e.region, 'region', filters.region);
  oneOf(e.overallCondition, 'condition', filters.condition);
  for (const id of SUBSYSTEMS) {
    const key = SUBSYSTEM_KEYS[id];
    oneOf(SUBSYSTEM_COLUMNS[key].grade, `grade.${key}`, filters[`grade.${key}`]);
  }
  range(e.swingMm, 'swing');
  range(e.betweenCentresMm, 'centres');
  range(e.yearBuilt, 'year');
  range(e.confidence, 'confidence', 0.01);
  range(e.askingPriceMinor, 'price', EURO);
  range(details.value, 'value', EURO);
  range(details.ratio, 'ratio');
  range(details.repair, 'repair', EURO);
  range(details.landed, 'landed', EURO);
  range(details.inclusions, 'inclusions', EURO);
  // The choice between = 0 and > 0 is part of the statement's text (see statementShape).
  if (filters.dealBreakers === 'none') conditions.push(eq(e.dealBreakerCount, 0));
  if (filters.dealBreakers === 'any') conditions.push(gt(e.dealBreakerCount, 0));
  // Days counted in whole UTC days as on the report page: "at least n days" is listed before the start
  // of the day n − 1 days ago; "at most n days" is listed on or after the start of the day n days ago.
  if (filters.daysListedMin !== undefined) conditions.push(lt(e.listedAt, b.bind('listedBefore', datetimeText(dayStartBefore(viewer.now, filters.daysListedMin - 1)))));
  if (filters.daysListedMax !== undefined) conditions.push(gte(e.listedAt, b.bind('listedSince', datetimeText(dayStartBefore(viewer.now, filters.daysListedMax)))));
  if (filters.reportAgeMin !== undefined) conditions.push(lte(e.inspectedOn, b.bind('inspectedBy', isoDate(dayStartBefore(viewer.now, filters.reportAgeMin)))));
  if (filters.reportAgeMax !== undefined) conditions.push(gte(e.inspectedOn, b.bind('inspectedSince', isoDate(dayStartBefore(viewer.now, filters.reportAgeMax)))));
  if (filters.releasedFrom) conditions.push(gte(e.releasedAt, b.bind('releasedFrom', datetimeText(new Date(`${filters.releasedFrom}T00:00:00Z`)))));
  if (filters.releasedTo) conditions.push(lt(e.releasedAt, b.bind('releasedBefore', datetimeText(new Date(Date.parse(`${filters.releasedTo}T00:00:00Z`) + DAY_MS)))));
  if (filters.shortlist !== undefined) {
    // A shortlist filters only for its owner; anyone else's id matches nothing.
    conditions.push(
      sql`${e.machineId} in (select ${shortlistItems.machineId} from ${shortlistItems} inner join ${shortlists} on ${shortlists.id} = ${shortlistItems.shortlistId} where ${shortlists.id} = ${b.bind('shortlist', filters.shortlist)} and ${shortlists.ownerId} = ${b.bind('reader', viewer.id)})`,
    );
  }
  return and(...conditions);
}

function orderFor(query: Pick<ComparisonQuery, 'sort' | 'dir'>, details: Details): SQL[] {
  const ascending = (query.dir === 'asc') !== COUNTED_BACK.has(query.sort);
  const direction = ascending ? asc : desc;
  // Nullable figures sort their blanks last in either direction, so hidden values never lead.
  const nullsLast: NullsLast = (expression) => [sql`${expression} is null`, direction(expression)];
  return [...SORTS[query.sort](direction, nullsLast, details), direction(e.reportId)];
}

/** What a row carries, in the order the query lists it. */
const ROW_FIELDS = [
  'reportId',
  'machineId',
  'maker',
  'model',
  'kind',
  'swingMm',
  'betweenCentresMm',
  'yearBuilt',
  'town',
  'region',
  'overallCondition',
  'overallScore',
  'overallProvisional',
  'confidence',
  'askingPriceMinor',
  'priceCurrency',
  'hasDetails',
  'fairMarketValueMinor',
  'priceToValue',
  'repairEstimateMinor',
  'valueCurrency',
  'releasedAt',
  'landedCostMinor',
  'riggingMinor',
  'converterMinor',
  'missingToolingMinor',
  'inclusionsValueMinor',
  'dealBreakerCount',
  'dealBreakers',
  'listedAt',
  'inspectedOn',
  ...SUBSYSTEM_KEY_LIST.flatMap((key) => [`${key}Score`, `${key}Grade`] as const),
] as const;
type RowField = (typeof ROW_FIELDS)[number];
type RawRow = Record<RowField, unknown>;

function rowColumns(details: Details): Record<RowField, AnyColumn | SQL> {
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
    overallProvisional: e.overallProvisional,
    confidence: e.confidence,
    askingPriceMinor: e.askingPriceMinor,
    priceCurrency: e.priceCurrency,
    hasDetails: details.visible,
    fairMarketValueMinor: details.value,
    priceToValue: details.ratio,
    repairEstimateMinor: details.repair,
    valueCurrency: e.valueCurrency,
    releasedAt: e.releasedAt,
    landedCostMinor: details.landed,
    riggingMinor: details.rigging,
    converterMinor: details.converter,
    missingToolingMinor: details.missingTooling,
    inclusionsValueMinor: details.inclusions,
    dealBreakerCount: e.dealBreakerCount,
    dealBreakers: details.dealBreakers,
    listedAt: e.listedAt,
    inspectedOn: e.inspectedOn,
    ...(Object.fromEntries(SUBSYSTEM_KEY_LIST.flatMap((key) => [[`${key}Score`, SUBSYSTEM_COLUMNS[key].score], [`${key}Grade`, SUBSYSTEM_COLUMNS[key].grade]])) as Record<
      `${SubsystemKey}${'Score' | 'Grade'}`,
      AnyColumn
    >),
  };
}

/**
 * A row as one JSON array built by MariaDB, in ROW_FIELDS order: mysql2 parses it natively, where
 * mapping some forty columns one by one through the ORM's decoders cost more than the query itself.
 * Client CPU per page of 50 at 16 connections: 0.43 ms as columns, 0.34 ms as JSON objects, 0.21 ms as
 * arrays (which also send the least). Numbers arrive as numbers, datetimes as their UTC text, NULL as null.
 */
function rowArray(details: Details) {
  const columns = rowColumns(details);
  return sql`json_array(${sql.join(
    ROW_FIELDS.map((field) => sql`${columns[field]}`),
    sql`, `,
  )})`.mapWith((value: unknown) => {
    // mysql2 parses a JSON column itself; text (a server that does not mark the column as JSON) is parsed here.
    const values = (typeof value === 'string' ? JSON.parse(value) : value) as unknown[];
    const row = {} as RawRow;
    ROW_FIELDS.forEach((field, i) => (row[field] = values[i]));
    return row;
  });
}

/**
 * "No deal-breakers" matches most machines (93 % of the benchmark's lathes), so its index narrows a
 * page little: left to itself the optimiser reads it and sorts thousands of rows, where reading the
 * sort column's index in order stops at the page (bare page query 8 ms → 0.5 ms for "no
 * deal-breakers, inspected in the last year, fewest days listed"). The count keeps the index: it
 * answers that count from the index alone.
 */
function pageIndexHint(query: Pick<ComparisonQuery, 'dealBreakers' | 'sort'>) {
  return query.dealBreakers === 'none' && query.sort !== 'dealBreakers' ? { ignoreIndex: DEAL_BREAKERS_INDEX } : undefined;
}
const DEAL_BREAKERS_INDEX = 'comparison_entries_deal_breakers_inspected_idx';

/**
 * The values of one request's statement under placeholder names, in the order the statement asks
 * for them. With every value a placeholder, the statement's text depends only on its shape (which
 * filters are set, the sort, the reader's kind of access), so it is built and prepared once per
 * shape and run with each request's values.
 */
class Bindings {
  readonly values: Record<string, unknown> = {};

  bind(name: string, value: unknown) {
    this.values[name] = value;
    return sql.placeholder(name);
  }
}

/** The WHERE and the figures a reader sees, with this request's values bound. */
function statementParts(query: ComparisonQuery, viewer: ComparisonViewer) {
  const b = new Bindings();
  const details = detailExpressions(viewer, b);
  const where = whereFor(query, details, viewer, b);
  return { b, details, where };
}

/**
 * What decides a statement's text beyond its placeholders' names: the sort, its direction, the
 * deal-breaker choice (= 0 or > 0) and whether the reader sees every report's details. Every other
 * choice (a filter set or not, how many kinds or grants, a shop supply or not) adds or leaves out
 * named placeholders, so the names in order complete the key.
 */
function statementShape(query: ComparisonQuery, viewer: ComparisonViewer, b: Bindings) {
  return `${query.sort} ${query.dir} ${query.dealBreakers ?? '-'} ${viewer.visibility.all ? 'all' : 'granted'} ${Object.keys(b.values).join(',')}`;
}

/** The page with its count as an uncorrelated subquery (MariaDB runs it once): one round trip. */
function pageStatement(reader: Reader, query: ComparisonQuery, { details, where }: ReturnType<typeof statementParts>) {
  const total = countStatement(reader, where);
  return reader
    .select({ row: rowArray(details), total: sql`(${total})`.mapWith(Number) })
    .from(e, pageIndexHint(query))
    .where(where)
    .orderBy(...orderFor(query, details))
    .limit(sql.placeholder('limit'))
    .offset(sql.placeholder('offset'));
}

function countStatement(reader: Reader, where: SQL | undefined) {
  return reader.select({ n: sql`count(*)`.mapWith(Number) }).from(e).where(where);
}

type PreparedPage = ReturnType<ReturnType<typeof pageStatement>['prepare']>;

/**
 * Prepared page statements by reader, then by shape. Building a statement (forty row fields, the
 * figures' CASE expressions, the filters) and rendering its SQL cost about as much CPU as running it;
 * a prepared one keeps its text and only takes new values. A shape stays on the connection pool it
 * was first prepared on: with read replicas, one replica per shape and process rather than per request.
 */
const preparedPages = perDatabase(() => new Map<string, PreparedPage>());
const PREPARED_SHAPES_KEPT = 500;

function preparedPage(reader: Reader, query: ComparisonQuery, viewer: ComparisonViewer, parts: ReturnType<typeof statementParts>): PreparedPage {
  const byShape = preparedPages(reader);
  const shape = statementShape(query, viewer, parts.b);
  let prepared = byShape.get(shape);
  if (!prepared) {
    prepared = pageStatement(reader, query, parts).prepare();
    // The oldest shape goes first once the bound is reached.
    if (byShape.size >= PREPARED_SHAPES_KEPT) byShape.delete(byShape.keys().next().value!);
    byShape.set(shape, prepared);
  }
  return prepared;
}

const pagingValues = (query: ComparisonQuery) => ({ limit: query.pageSize, offset: (query.page - 1) * query.pageSize });

/** The page statement's SQL with this request's values, for the benchmark to run bare and EXPLAIN. */
export function comparisonPageSql(reader: Reader, query: ComparisonQuery, viewer: ComparisonViewer): { sql: string; params: unknown[] } {
  const parts = statementParts(query, viewer);
  const statement = pageStatement(reader, query, parts).toSQL();
  return { sql: statement.sql, params: fillPlaceholders(statement.params, { ...parts.b.values, ...pagingValues(query) }) };
}

const nullableNumber = (value: unknown) => (value === null || value === undefined ? null : Number(value));
const DATETIME_MS = /^\d{4}-\d\d-\d\d \d\d:\d\d:\d\d\.\d{3}$/;
/** A DATETIME(3) as JSON_OBJECT writes it ("2026-03-01 09:30:00.000", stored in UTC) in ISO 8601, as toISOString writes it. */
function isoTimestamp(value: unknown): string | null {
  if (typeof value !== 'string') return null;
  return DATETIME_MS.test(value) ? `${value.slice(0, 10)}T${value.slice(11)}Z` : new Date(`${value.replace(' ', 'T')}Z`).toISOString();
}
/** The UTC day number (days since 1970-01-01) of a date or datetime's text. */
const utcDayOf = (text: string) => Date.UTC(Number(text.slice(0, 4)), Number(text.slice(5, 7)) - 1, Number(text.slice(8, 10))) / DAY_MS;

/**
 * How current each inspection date's report is, by date, validity and today: the table shows the
 * same few hundred dates on page after page, and the answer changes only with the day.
 */
const currencyByDay = new Map<string, ReportCurrency>();
function currencyOf(inspectedOn: string, viewer: ComparisonViewer): ReportCurrency {
  const key = `${inspectedOn}|${viewer.validityDays}|${Math.floor(viewer.now.getTime() / DAY_MS)}`;
  let currency = currencyByDay.get(key);
  if (!currency) {
    currency = reportCurrency(new Date(`${inspectedOn}T00:00:00Z`), viewer.now, viewer.validityDays);
    if (currencyByDay.size >= 20_000) currencyByDay.clear();
    currencyByDay.set(key, currency);
  }
  return currency;
}

function toRow(raw: RawRow, viewer: ComparisonViewer): ComparisonRow {
  const subsystems = Object.fromEntries(
    SUBSYSTEM_KEY_LIST.map((key) => [key, { score: raw[`${key}Score`], grade: raw[`${key}Grade`] }]),
  ) as ComparisonRow['subsystems'];
  const hasDetails = Boolean(raw.hasDetails);
  const priceCurrency = raw.priceCurrency as string;
  const repairsKnown = raw.repairEstimateMinor !== null && raw.valueCurrency === priceCurrency;
  const notKnown: LandedCostPart[] = hasDetails
    ? [
        ...(raw.askingPriceMinor === null ? (['asking price'] as const) : []),
        ...(raw.riggingMinor === null ? (['rigging'] as const) : []),
        ...(raw.converterMinor === null ? (['phase converter'] as const) : []),
        ...(raw.missingToolingMinor === null ? (['missing tooling'] as const) : []),
        ...(repairsKnown ? [] : (['repairs'] as const)),
      ]
    : [];
  const currency = currencyOf(String(raw.inspectedOn).slice(0, 10), viewer);
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
    overallProvisional: Boolean(Number(raw.overallProvisional)),
    confidence: Number(raw.confidence),
    askingPriceMinor: raw.askingPriceMinor as number | null,
    priceCurrency: raw.priceCurrency as string,
    hasDetails,
    fairMarketValueMinor: nullableNumber(raw.fairMarketValueMinor),
    priceToValue: nullableNumber(raw.priceToValue),
    repairEstimateMinor: nullableNumber(raw.repairEstimateMinor),
    valueCurrency: raw.valueCurrency as string,
    releasedAt: isoTimestamp(raw.releasedAt) ?? new Date(0).toISOString(),
    landedCostMinor: nullableNumber(raw.landedCostMinor),
    landedCostNotKnown: notKnown,
    inclusionsValueMinor: nullableNumber(raw.inclusionsValueMinor),
    dealBreakerCount: Number(raw.dealBreakerCount),
    dealBreakers: dealBreakersInWords(typeof raw.dealBreakers === 'string' && raw.dealBreakers !== '' ? raw.dealBreakers.split(',') : []),
    daysListed: Math.max(0, Math.floor(viewer.now.getTime() / DAY_MS) - utcDayOf(raw.listedAt as string)),
    inspectedOn: currency.inspectedOn,
    reportAgeDays: currency.ageDays,
    validUntil: currency.validUntil,
    stale: currency.stale,
    subsystems,
  };
}

/** One page of the table with the number of machines matching the filter. */
export async function listComparisonRows(reader: Reader, query: ComparisonQuery, viewer: ComparisonViewer): Promise<ComparisonPage> {
  const parts = statementParts(query, viewer);
  const rows = await preparedPage(reader, query, viewer, parts).execute({ ...parts.b.values, ...pagingValues(query) });
  // Past the last row the page carries no count: ask for it on its own.
  const matches = rows[0] ? rows[0].total : ((await countStatement(reader, parts.where).prepare().execute(parts.b.values))[0]?.n ?? 0);
  return { rows: rows.map(({ row }) => toRow(row, viewer)), total: matches, page: query.page, pageSize: query.pageSize, landedCostBasis: landedCostAssumptions(viewer.shop) };
}

/** Exports refuse filters wider than this rather than build a file no spreadsheet opens comfortably. */
export const MAX_EXPORT_ROWS = 20_000;

/** Every machine matching the filter in the table's order, up to MAX_EXPORT_ROWS plus one (to tell that it was cut). */
export async function listComparisonRowsForExport(reader: Reader, query: ComparisonQuery, viewer: ComparisonViewer): Promise<ComparisonRow[]> {
  const { b, details, where } = statementParts(query, viewer);
  const rows = await reader
    .select({ row: rowArray(details) })
    .from(e, pageIndexHint(query))
    .where(where)
    .orderBy(...orderFor(query, details))
    .limit(MAX_EXPORT_ROWS + 1)
    .prepare()
    .execute(b.values);
  return rows.map(({ row }) => toRow(row, viewer));
}

/** Regions that have inspected machines, for the location filter's choices. */
export async function listComparisonRegions(reader: Reader): Promise<string[]> {
  const rows = await reader.selectDistinct({ region: e.region }).from(e).orderBy(e.region);
  return rows.map((r) => r.region);
}
