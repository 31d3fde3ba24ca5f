/**
 * Whether the machine was cold or warm while each measured section's readings were taken.
 * Run-out, play, noise and the level of a bed all move as a headstock and its oil warm, so every
 * reading is read with its thermal state beside it. The inspector's own cold/warm for a section
 * wins; otherwise the state follows from stated times only: the power-run log (the state at the
 * start, when the spindle was started, the minutes run before the readings) and the inspector's
 * own time for the section (`measuredAt`). When a reading was typed (`readingsAt`) is a record of
 * entry, never the time of measurement: notes typed up after the visit must not turn a cold
 * reading warm or contradict the log.
 */

export type MachineState = 'cold' | 'warm';

/** Survey sections whose readings move with temperature, in the on-site order of work. */
export const THERMAL_SECTION_KEYS = ['gearboxAndFeeds', 'drive', 'bedAndWays', 'spindle', 'slidesAndScrews', 'tailstock', 'testCuts'] as const;
export type ThermalSectionKey = (typeof THERMAL_SECTION_KEYS)[number];

/**
 * Minutes of running after which a machine started cold counts as warm: the half hour at mid speed
 * the temperature-rise check runs for (common practice; full thermal stability takes longer).
 */
export const WARM_AFTER_MINUTES = 30;

/** How the state was decided. */
export type ThermalSource = 'inspector' | 'started-warm' | 'power-run-clock' | 'power-run-minutes' | 'not-known';

export interface SectionThermalState {
  section: ThermalSectionKey;
  state: MachineState | null;
  source: ThermalSource;
  /** The reason, in words, for the review screen, the report page and the PDF. */
  explanation: string;
  /** Minutes the spindle had run when the readings were taken, where known. */
  minutesRun: number | null;
  readingsAt: string | null;
}

export const MACHINE_STATE_WORDS: Record<MachineState, string> = { cold: 'Cold', warm: 'Warm' };

interface ThermalRecord {
  measuredAt?: unknown;
  machineState?: unknown;
}
interface PowerRunRecord {
  startState?: unknown;
  minutesRunBeforeReadings?: unknown;
  startedAt?: unknown;
}

const isState = (v: unknown): v is MachineState => v === 'cold' || v === 'warm';
const asRecord = (v: unknown): Record<string, unknown> | null => (v && typeof v === 'object' && !Array.isArray(v) ? (v as Record<string, unknown>) : null);
const asTime = (v: unknown): number | null => {
  if (typeof v !== 'string') return null;
  const t = Date.parse(v);
  return Number.isFinite(t) ? t : null;
};

/** "09:52 UTC" for the explanation; the date is the inspection's. */
function clock(ms: number): string {
  return `${new Date(ms).toISOString().slice(11, 16)} UTC`;
}

function minutesWord(minutes: number): string {
  return `${minutes} min`;
}

/** The state of one section, from its own record and the survey's power-run log. */
export function sectionThermalState(section: ThermalSectionKey, sectionData: unknown, powerRun: unknown): SectionThermalState {
  const thermal = (asRecord(asRecord(sectionData)?.thermal) ?? {}) as ThermalRecord;
  // The inspector's stated time for the section; the typing clock (readingsAt) is not read here.
  const readingsAtMs = asTime(thermal.measuredAt);
  const readingsAt = readingsAtMs === null ? null : new Date(readingsAtMs).toISOString();
  const run = (asRecord(powerRun) ?? {}) as PowerRunRecord;
  const startedAtMs = asTime(run.startedAt);
  const clockMinutes = startedAtMs !== null && readingsAtMs !== null ? Math.floor((readingsAtMs - startedAtMs) / 60_000) : null;
  const minutesRun = clockMinutes !== null ? Math.max(0, clockMinutes) : typeof run.minutesRunBeforeReadings === 'number' ? run.minutesRunBeforeReadings : null;
  const base = { section, minutesRun, readingsAt };

  // The section's own machineState (format v1.1 on the spindle, tailstock and test cuts) is the inspector's word too.
  const ownState = isState(thermal.machineState) ? thermal.machineState : asRecord(sectionData)?.machineState;
  if (isState(ownState)) {
    return { ...base, state: ownState, source: 'inspector', explanation: `Set by the inspector as ${ownState}` };
  }
  if (!isState(run.startState)) {
    const explanation = asRecord(powerRun)
      ? 'The power-run log does not say whether the machine was cold or warm at the start'
      : 'No power-run log, so not known whether the machine was cold or warm';
    return { ...base, state: null, source: 'not-known', explanation };
  }
  if (run.startState === 'warm') {
    return { ...base, state: 'warm', source: 'started-warm', explanation: 'The machine was already warm when first started on the day (power-run log)' };
  }
  if (clockMinutes !== null && startedAtMs !== null && readingsAtMs !== null) {
    if (clockMinutes < 0) {
      return { ...base, state: 'cold', source: 'power-run-clock', explanation: `Measured at ${clock(readingsAtMs)} (inspector's time), before the spindle was first started at ${clock(startedAtMs)}` };
    }
    const state: MachineState = clockMinutes >= WARM_AFTER_MINUTES ? 'warm' : 'cold';
    return {
      ...base,
      state,
      source: 'power-run-clock',
      explanation: `Measured at ${clock(readingsAtMs)} (inspector's time), ${minutesWord(clockMinutes)} after the spindle was started cold at ${clock(startedAtMs)} (warm from ${WARM_AFTER_MINUTES} min)`,
    };
  }
  if (typeof run.minutesRunBeforeReadings === 'number') {
    const minutes = run.minutesRunBeforeReadings;
    const state: MachineState = minutes >= WARM_AFTER_MINUTES ? 'warm' : 'cold';
    return {
      ...base,
      state,
      source: 'power-run-minutes',
      explanation: `Started cold and run ${minutesWord(minutes)} before the readings (power-run log; warm from ${WARM_AFTER_MINUTES} min)`,
    };
  }
  return { ...base, state: 'cold', source: 'power-run-minutes', explanation: 'Started cold; the minutes run before the readings were not logged' };
}

/** True when the section holds readings of its own (its thermal record alone does not count). */
function hasReadings(sectionData: unknown): boolean {
  const record = asRecord(sectionData);
  return record !== null && Object.keys(record).some((key) => key !== 'thermal' && key !== 'machineState' && record[key] !== undefined);
}

/** The thermal state of every measured section that holds readings, in the order of work. */
export function surveyThermalStates(survey: unknown): SectionThermalState[] {
  const record = asRecord(survey) ?? {};
  return THERMAL_SECTION_KEYS.filter((key) => hasReadings(record[key])).map((key) => sectionThermalState(key, record[key], record.powerRun));
}

export function isThermalSection(key: unknown): key is ThermalSectionKey {
  return typeof key === 'string' && (THERMAL_SECTION_KEYS as readonly string[]).includes(key);
}
