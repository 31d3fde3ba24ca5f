import { boolean, date, decimal, index, int, mysqlEnum, mysqlTable, smallint, varchar } from 'drizzle-orm/mysql-core';
import { minorUnits, timestamp } from './columns';
import { LATHE_KINDS } from './machines';
import { CONDITION_GRADES } from './reports';

const subsystemScore = (key: string) => smallint(`${key}_score`);
const subsystemGrade = (key: string) => mysqlEnum(`${key}_grade`, CONDITION_GRADES);

/**
 * The dealers' comparison table, one narrow row per current released report: the machine's listing
 * figures, the report's summary and its eight subsystem grades side by side. Kept by database
 * triggers on reports, machines and report_subsystem_scores (see the migration), so every path that
 * releases, corrects or withdraws a report keeps it right. It exists because a report row carries its
 * full scoring result (tens of KB): filtering and counting 10,000 of those through a join was the
 * slow part of the table, while this row is about 200 bytes.
 */
export const comparisonEntries = mysqlTable(
  'comparison_entries',
  {
    reportId: int('report_id').primaryKey(),
    inspectionId: int('inspection_id').notNull(),
    machineId: int('machine_id').notNull(),
    maker: varchar('maker', { length: 120 }).notNull(),
    model: varchar('model', { length: 120 }).notNull(),
    latheKind: mysqlEnum('lathe_kind', LATHE_KINDS).notNull(),
    swingMm: smallint('swing_mm').notNull(),
    betweenCentresMm: smallint('between_centres_mm').notNull(),
    yearBuilt: smallint('year_built'),
    town: varchar('town', { length: 120 }).notNull(),
    region: varchar('region', { length: 120 }).notNull(),
    askingPriceMinor: minorUnits('asking_price_minor'),
    priceCurrency: varchar('price_currency', { length: 3 }).notNull(),
    overallCondition: mysqlEnum('overall_condition', CONDITION_GRADES).notNull(),
    overallScore: smallint('overall_score').notNull(),
    /** The scoring result marks the grade provisional (too little measured for a firm grade). */
    overallProvisional: boolean('overall_provisional').notNull().default(false),
    confidence: decimal('confidence', { precision: 4, scale: 3 }).notNull(),
    fairMarketValueMinor: minorUnits('fair_market_value_minor'),
    repairEstimateMinor: minorUnits('repair_estimate_minor'),
    valueCurrency: varchar('value_currency', { length: 3 }).notNull(),
    releasedAt: timestamp('released_at'),
    bedScore: subsystemScore('bed'),
    bedGrade: subsystemGrade('bed'),
    spindleScore: subsystemScore('spindle'),
    spindleGrade: subsystemGrade('spindle'),
    gearboxScore: subsystemScore('gearbox'),
    gearboxGrade: subsystemGrade('gearbox'),
    slidesScore: subsystemScore('slides'),
    slidesGrade: subsystemGrade('slides'),
    tailstockScore: subsystemScore('tailstock'),
    tailstockGrade: subsystemGrade('tailstock'),
    driveScore: subsystemScore('drive'),
    driveGrade: subsystemGrade('drive'),
    electricalScore: subsystemScore('electrical'),
    electricalGrade: subsystemGrade('electrical'),
    accessoriesScore: subsystemScore('accessories'),
    accessoriesGrade: subsystemGrade('accessories'),
    // Decision figures that do not depend on who reads the table, kept by the same triggers from the
    // report, its survey, the listing, its moving sheet and its inclusions (see the migration).
    /** Deal-breakers in the scoring result: how many, and their ids in the result's order, comma-separated. */
    dealBreakerCount: smallint('deal_breaker_count').notNull().default(0),
    dealBreakers: varchar('deal_breakers', { length: 255 }).notNull().default(''),
    /** Inclusions in the listing's currency at their condition's share of replacement cost; NULL when none are listed. */
    inclusionsValueMinor: minorUnits('inclusions_value_minor'),
    /** Replacement cost of the inclusions listed as missing; NULL when none are listed (nothing known to be missing). */
    missingToolingMinor: minorUnits('missing_tooling_minor'),
    /** Rigging from the moving sheet's weight and access at the table's stated distance and demo rates; NULL without a moving sheet. */
    riggingMinor: minorUnits('rigging_minor'),
    /** Asking price + rigging + missing tooling + repairs, each where known: the landed cost before the reader's converter. */
    landedBaseMinor: minorUnits('landed_base_minor').notNull().default(0),
    /** Nameplate supply recorded in the survey and the motor power, for the converter the reader's shop needs. */
    supplyVoltage: smallint('supply_voltage'),
    supplyPhases: smallint('supply_phases'),
    motorKw: decimal('motor_kw', { precision: 5, scale: 2 }),
    listedAt: timestamp('listed_at').notNull(),
    inspectedOn: date('inspected_on', { mode: 'string' }).notNull(),
  },
  (t) => [
    // Sorting by these reads the index in order and stops at the page (measured with scripts/bench-table.ts).
    // Nullable figures sort blanks last and so always filesort, which over this narrow table stays cheap.
    index('comparison_entries_score_idx').on(t.overallScore),
    index('comparison_entries_released_idx').on(t.releasedAt),
    // Swing, the filter dealers set most, with condition and year: a swing range is an index range,
    // sorting by swing stops at the page, and the count of a size/condition/year filter reads the
    // index alone (halved the count's time and a price-sorted page's by 40 % on the bench data).
    index('comparison_entries_swing_condition_year_idx').on(t.swingMm, t.overallCondition, t.yearBuilt),
    index('comparison_entries_centres_idx').on(t.betweenCentresMm),
    index('comparison_entries_machine_idx').on(t.machineId),
    index('comparison_entries_inspection_idx').on(t.inspectionId),
    // The decision columns: days listed and report age sort and filter by these dates; deal-breakers
    // by count ("none" is count = 0); landed cost and inclusions value for readers who see them all.
    index('comparison_entries_listed_idx').on(t.listedAt),
    index('comparison_entries_inspected_idx').on(t.inspectedOn),
    // With the inspection day second, "no deal-breakers, inspected since …" counts from the index alone.
    index('comparison_entries_deal_breakers_inspected_idx').on(t.dealBreakerCount, t.inspectedOn),
    index('comparison_entries_landed_idx').on(t.landedBaseMinor),
    index('comparison_entries_inclusions_idx').on(t.inclusionsValueMinor),
  ],
);
