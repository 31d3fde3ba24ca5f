import { describe, expect, it } from 'vitest';
import nearNew from '@/lib/scoring/examples/near-new.json';
import { latheSurveySchema, scoreSurvey } from '@/lib/scoring';
import { sectionThermalState, surveyThermalStates, WARM_AFTER_MINUTES } from './thermal-state';

const started = '2026-03-10T08:00:00.000Z';
const at = (minutes: number) => new Date(Date.parse(started) + minutes * 60_000).toISOString();

// The warm-up threshold is common practice (the half hour the temperature-rise check runs for), no published source.
describe('sectionThermalState', () => {
  it.each([
    ['read before the spindle was started', { startState: 'cold', minutesRunBeforeReadings: 40, startedAt: started }, { measuredAt: at(-20) }, 'cold', 'power-run-clock', 0],
    ['read 10 min after a cold start', { startState: 'cold', minutesRunBeforeReadings: 40, startedAt: started }, { measuredAt: at(10) }, 'cold', 'power-run-clock', 10],
    ['read exactly at the threshold', { startState: 'cold', minutesRunBeforeReadings: 0, startedAt: started }, { measuredAt: at(WARM_AFTER_MINUTES) }, 'warm', 'power-run-clock', 30],
    ['read 29 min 59 s after a cold start', { startState: 'cold', minutesRunBeforeReadings: 0, startedAt: started }, { measuredAt: new Date(Date.parse(at(30)) - 1000).toISOString() }, 'cold', 'power-run-clock', 29],
    ['without a clock, 45 min run before the readings', { startState: 'cold', minutesRunBeforeReadings: 45 }, { measuredAt: at(5) }, 'warm', 'power-run-minutes', 45],
    ['without a clock, 5 min run before the readings', { startState: 'cold', minutesRunBeforeReadings: 5 }, undefined, 'cold', 'power-run-minutes', 5],
    ['a machine already warm at the start', { startState: 'warm', minutesRunBeforeReadings: 0, startedAt: started }, { measuredAt: at(1) }, 'warm', 'started-warm', 1],
    ['the inspector’s own state over the log', { startState: 'cold', minutesRunBeforeReadings: 0, startedAt: started }, { measuredAt: at(90), machineState: 'cold' }, 'cold', 'inspector', 90],
    ['the inspector’s warm with no log at all', undefined, { machineState: 'warm' }, 'warm', 'inspector', null],
    ['the section’s own machineState as the inspector’s word', { startState: 'cold', minutesRunBeforeReadings: 0 }, undefined, 'warm', 'inspector', 0, 'warm'],
  ] as const)('decides %s', (_what, powerRun, thermal, state, source, minutesRun, ownState?: 'warm') => {
    const result = sectionThermalState('spindle', { noseRunout: { value: 0.004, unit: 'mm' }, thermal, machineState: ownState }, powerRun);
    expect(result.state).toBe(state);
    expect(result.source).toBe(source);
    expect(result.minutesRun).toBe(minutesRun);
  });

  it('says the state is not known without a power-run log or the inspector’s word', () => {
    const result = sectionThermalState('bedAndWays', { visualWear: 1 }, undefined);
    expect(result).toMatchObject({ state: null, source: 'not-known' });
    expect(result.explanation).toMatch(/not known/);
  });

  it('says when the power-run log lacks the state at the start', () => {
    const result = sectionThermalState('spindle', { liftPlay: { value: 0.02, unit: 'mm' } }, { startedAt: started });
    expect(result).toMatchObject({ state: null, source: 'not-known' });
    expect(result.explanation).toBe('The power-run log does not say whether the machine was cold or warm at the start');
  });

  it('explains a clock decision with both times', () => {
    const result = sectionThermalState('tailstock', { thermal: { measuredAt: at(42) } }, { startState: 'cold', minutesRunBeforeReadings: 0, startedAt: started });
    expect(result.explanation).toBe("Measured at 08:42 UTC (inspector's time), 42 min after the spindle was started cold at 08:00 UTC (warm from 30 min)");
  });

  it('goes by the power-run log, not by when notes were typed up', () => {
    // The log says 10 min run before the readings (cold by the 30 min rule, common practice); the
    // readings were typed four hours later. The typing clock must not make the section warm.
    const result = sectionThermalState('spindle', { noseRunout: { value: 0.004, unit: 'mm' }, thermal: { readingsAt: at(240) } }, { startState: 'cold', minutesRunBeforeReadings: 10, startedAt: started });
    expect(result).toMatchObject({ state: 'cold', source: 'power-run-minutes', minutesRun: 10 });
  });
});

describe('surveyThermalStates', () => {
  it('lists only measured sections that hold readings, in the order of work', () => {
    const states = surveyThermalStates({
      powerRun: { startState: 'cold', minutesRunBeforeReadings: 0, startedAt: started },
      bedAndWays: { visualWear: 1, thermal: { measuredAt: at(-30) } },
      spindle: { noseRunout: { value: 0.004, unit: 'mm' }, thermal: { measuredAt: at(50) } },
      tailstock: { thermal: { measuredAt: at(60) } },
      lubrication: { leaks: 0 },
    });
    expect(states.map((s) => [s.section, s.state])).toEqual([
      ['bedAndWays', 'cold'],
      ['spindle', 'warm'],
    ]);
  });
});

describe('thermal records in the survey format', () => {
  const withThermal = JSON.parse(JSON.stringify(nearNew)) as Record<string, Record<string, unknown>>;
  withThermal.powerRun = { ...(withThermal.powerRun ?? { startState: 'cold', minutesRunBeforeReadings: 35 }), startedAt: started };
  withThermal.spindle!.thermal = { readingsAt: at(40), measuredAt: at(40), machineState: 'warm' };
  withThermal.bedAndWays!.thermal = { measuredAt: at(-10) };

  it('accepts the optional records and rejects a state outside cold and warm', () => {
    expect(latheSurveySchema.safeParse(withThermal).success).toBe(true);
    const wrong = JSON.parse(JSON.stringify(withThermal)) as typeof withThermal;
    wrong.spindle!.thermal = { machineState: 'hot' };
    expect(latheSurveySchema.safeParse(wrong).success).toBe(false);
  });

  it('leaves every scoring result unchanged', () => {
    const without = JSON.parse(JSON.stringify(withThermal)) as typeof withThermal;
    delete without.spindle!.thermal;
    delete without.bedAndWays!.thermal;
    delete (without.powerRun as Record<string, unknown>).startedAt;
    expect(scoreSurvey(withThermal)).toEqual(scoreSurvey(without));
  });
});
