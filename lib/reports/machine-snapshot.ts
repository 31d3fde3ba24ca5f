import { z } from 'zod';
import { LATHE_KINDS, MACHINE_TYPES, SIZE_CLASSES } from '@/db/schema/machines';
import { formatMm, formatMoney } from '@/lib/format';

/**
 * Everything a report states about its machine, copied from the listing when a version is released
 * and kept with it (reports.machine_snapshot): identity, sizes, supply, location and the listing
 * facts the report prints. The seller may go on editing the listing; the released version keeps this.
 */
export interface MachineSnapshot {
  machineType: (typeof MACHINE_TYPES)[number];
  latheKind: (typeof LATHE_KINDS)[number];
  maker: string;
  model: string;
  serialNumber: string | null;
  yearBuilt: number | null;
  swingMm: number;
  betweenCentresMm: number;
  spindleBoreMm: number | null;
  sizeClass: (typeof SIZE_CLASSES)[number];
  motorKw: number | null;
  supplyVoltage: number | null;
  supplyPhases: number | null;
  town: string;
  region: string;
  askingPriceMinor: number | null;
  currency: string;
  accessories: string | null;
}

const machineSnapshotSchema = z.object({
  machineType: z.enum(MACHINE_TYPES),
  latheKind: z.enum(LATHE_KINDS),
  maker: z.string(),
  model: z.string(),
  serialNumber: z.string().nullable(),
  yearBuilt: z.number().int().nullable(),
  swingMm: z.number().int(),
  betweenCentresMm: z.number().int(),
  spindleBoreMm: z.number().int().nullable(),
  sizeClass: z.enum(SIZE_CLASSES),
  motorKw: z.number().nullable(),
  supplyVoltage: z.number().int().nullable(),
  supplyPhases: z.number().int().nullable(),
  town: z.string(),
  region: z.string(),
  askingPriceMinor: z.number().int().nullable(),
  currency: z.string().length(3),
  accessories: z.string().nullable(),
}) satisfies z.ZodType<MachineSnapshot>;

/** A listing row as the database hands it back (motor power as decimal text). */
export type LiveMachine = Omit<MachineSnapshot, 'motorKw'> & { motorKw: number | string | null };

/** The snapshot of a listing as it stands: what release keeps. */
export function snapshotOf(machine: LiveMachine): MachineSnapshot {
  return machineSnapshotSchema.parse({ ...machine, motorKw: machine.motorKw === null ? null : Number(machine.motorKw) });
}

/** The stored copy, checked; null for drafts. MariaDB hands JSON columns back as text. */
export function parseMachineSnapshot(stored: unknown): MachineSnapshot | null {
  if (stored === null || stored === undefined) return null;
  const value = typeof stored === 'string' ? (JSON.parse(stored) as unknown) : stored;
  return machineSnapshotSchema.parse(value);
}

const latheKindWords = (kind: MachineSnapshot['latheKind']) => (kind === 'toolroom' ? 'toolroom centre lathe' : 'general-purpose centre lathe');
const orNotStated = (value: string | number | null) => (value === null || value === '' ? 'nothing' : String(value));

/** The facts a buyer reads in the report, each with its words; one list, so a new fact is one line. */
const STATED_FACTS: ReadonlyArray<{ key: keyof MachineSnapshot; label: string; words: (s: MachineSnapshot) => string }> = [
  { key: 'maker', label: 'Maker', words: (s) => s.maker },
  { key: 'model', label: 'Model', words: (s) => s.model },
  { key: 'serialNumber', label: 'Serial number', words: (s) => orNotStated(s.serialNumber) },
  { key: 'yearBuilt', label: 'Built', words: (s) => (s.yearBuilt === null ? 'not known' : String(s.yearBuilt)) },
  { key: 'latheKind', label: 'Type', words: (s) => latheKindWords(s.latheKind) },
  { key: 'swingMm', label: 'Swing over bed', words: (s) => formatMm(s.swingMm) },
  { key: 'betweenCentresMm', label: 'Between centres', words: (s) => formatMm(s.betweenCentresMm) },
  { key: 'spindleBoreMm', label: 'Spindle bore', words: (s) => formatMm(s.spindleBoreMm) },
  { key: 'motorKw', label: 'Motor', words: (s) => (s.motorKw === null ? 'not stated' : `${s.motorKw} kW`) },
  { key: 'supplyVoltage', label: 'Supply voltage', words: (s) => (s.supplyVoltage === null ? 'not stated' : `${s.supplyVoltage} V`) },
  { key: 'supplyPhases', label: 'Supply phases', words: (s) => (s.supplyPhases === null ? 'not stated' : `${s.supplyPhases}-phase`) },
  { key: 'town', label: 'Town', words: (s) => s.town },
  { key: 'region', label: 'Region', words: (s) => s.region },
  { key: 'askingPriceMinor', label: 'Asking price', words: (s) => (s.askingPriceMinor === null ? 'offers invited' : formatMoney(s.askingPriceMinor, s.currency)) },
  { key: 'accessories', label: 'Accessories', words: (s) => orNotStated(s.accessories) },
];

export type ChangedFact = { key: keyof MachineSnapshot; label: string; released: string; now: string; note: string };

/**
 * The facts the report states whose listing value differs today, each with the words a buyer sees:
 * the released value stays the report's; the note says what the listing says now. Two facts that
 * read the same in words (an asking price re-entered in another currency is not) count as unchanged.
 */
export function changedSinceReport(released: MachineSnapshot, live: MachineSnapshot): ChangedFact[] {
  return STATED_FACTS.flatMap(({ key, label, words }) => {
    const [then, now] = [words(released), words(live)];
    if (then === now) return [];
    return [{ key, label, released: then, now, note: `Listing now says ${now} — changed since the report` }];
  });
}

/** The note for one fact, or null when the listing still says what the report says. */
export function changeNoteFor(changes: readonly ChangedFact[], key: keyof MachineSnapshot): string | null {
  return changes.find((change) => change.key === key)?.note ?? null;
}
