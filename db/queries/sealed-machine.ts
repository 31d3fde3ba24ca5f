import 'server-only';
import { sql, type AnyColumn, type SQL } from 'drizzle-orm';
import { machines, reports } from '@/db/schema';

type ReportsTable = { machineSnapshot: AnyColumn };

/**
 * Machine facts as a report version states them: the copy sealed with the version once it has left
 * draft (reports.machine_snapshot), the listing as it stands for a draft. For selects that join a
 * reports table (or its alias) to `machines`; a JSON null reads as SQL NULL, so a fact sealed as
 * empty stays empty whatever the listing says now.
 */
export function sealedMachineOf(report: ReportsTable = reports) {
  const pick = (key: string, live: AnyColumn): SQL => sql`IF(${report.machineSnapshot} IS NULL, ${live}, JSON_VALUE(${report.machineSnapshot}, ${sql.raw(`'$.${key}'`)}))`;
  const text = (key: string, live: AnyColumn) => pick(key, live) as SQL<string>;
  const nullableText = (key: string, live: AnyColumn) => pick(key, live) as SQL<string | null>;
  const number = (key: string, live: AnyColumn) => (pick(key, live) as SQL<number>).mapWith(Number);
  const nullableNumber = (key: string, live: AnyColumn) => (pick(key, live) as SQL<number | null>).mapWith((value: unknown) => (value === null ? null : Number(value)));
  return {
    maker: text('maker', machines.maker),
    model: text('model', machines.model),
    serialNumber: nullableText('serialNumber', machines.serialNumber),
    latheKind: pick('latheKind', machines.latheKind) as SQL<'general_purpose' | 'toolroom'>,
    yearBuilt: nullableNumber('yearBuilt', machines.yearBuilt),
    swingMm: number('swingMm', machines.swingMm),
    betweenCentresMm: number('betweenCentresMm', machines.betweenCentresMm),
    spindleBoreMm: nullableNumber('spindleBoreMm', machines.spindleBoreMm),
    motorKw: nullableNumber('motorKw', machines.motorKw),
    town: text('town', machines.town),
    region: text('region', machines.region),
  };
}
