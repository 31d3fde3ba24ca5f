import { describe, expect, it } from 'vitest';
import nearNew from './examples/near-new.json';
import { latheSurveySchema } from './survey/lathe-survey';
import { scoreSurvey } from './score-survey';

const clone = <T>(v: T): T => structuredClone(v);

describe('deal-breakers in the scoring result', () => {
  it('lists a recorded broken gear tooth on a machine that otherwise measures Excellent, and holds it at Poor', () => {
    const survey = { ...clone(nearNew), dealBreakers: { brokenGearTeeth: { present: true, note: 'Two teeth missing on the 60T change gear' } } };
    const r = scoreSurvey(survey);
    expect(scoreSurvey(nearNew).overall.condition).toBe('Excellent');
    expect(r.overall.condition).toBe('Poor');
    expect(r.dealBreakers).toEqual([
      { id: 'brokenGearTeeth', label: 'Broken gear teeth', evidence: 'Two teeth missing on the 60T change gear', photoRequired: true },
    ]);
  });

  it('leaves out items answered "no"', () => {
    const survey = { ...clone(nearNew), dealBreakers: { crackedCasting: { present: false }, growlingSpindleBearings: { present: true } } };
    expect(scoreSurvey(survey).dealBreakers.map((d) => d.id)).toEqual(['growlingSpindleBearings']);
  });

  it('returns none for a survey in format v1 without the new members', () => {
    expect(scoreSurvey(nearNew).dealBreakers).toEqual([]);
  });
});

describe('what was not inspected', () => {
  it('lists the areas set aside with the inspector\'s reason before the unmeasured checks', () => {
    const survey = clone(nearNew) as Record<string, unknown>;
    delete survey.testCuts;
    survey.notInspected = [{ area: 'testCuts', reason: 'No stock to cut; seller declined' }];
    const r = scoreSurvey(survey);
    expect(r.notInspected[0]).toEqual({ id: 'area:testCuts', label: 'Test cuts', reason: 'No stock to cut; seller declined' });
    expect(r.notInspected.map((n) => n.id)).toContain('two-collar-test');
  });
});

describe('bed wear series', () => {
  it('turns way thickness into wear in µm from the thickest station and keeps the carriage-lock distance', () => {
    const survey = clone(nearNew) as unknown as Record<string, Record<string, unknown>>;
    survey.bedAndWays = {
      ...survey.bedAndWays,
      carriageLockTest: { bindsAtFromHeadstock: { value: 420, unit: 'mm' } },
      wayThickness: {
        stations: [
          { distanceFromHeadstock: { value: 0, unit: 'mm' }, thickness: { value: 24.96, unit: 'mm' } },
          { distanceFromHeadstock: { value: 300, unit: 'mm' }, thickness: { value: 24.94, unit: 'mm' } },
          { distanceFromHeadstock: { value: 600, unit: 'mm' }, thickness: { value: 25.0, unit: 'mm' } },
        ],
      },
    };
    const wear = scoreSurvey(survey).plots.bedWear;
    // Arithmetic: 25.00 − 24.96 = 0.04 mm = 40 µm; 25.00 − 24.94 = 60 µm.
    expect(wear?.points).toEqual([
      { x: 0, y: 40 },
      { x: 300, y: 60 },
      { x: 600, y: 0 },
    ]);
    expect(wear?.carriageBindsAtMm).toBe(420);
  });
});

describe('survey format additions', () => {
  it('accepts a power run whose ranges each record cold or warm', () => {
    const survey = { ...clone(nearNew), powerRun: { startState: 'cold', minutesRunBeforeReadings: 30, ranges: [{ range: 'low', machineState: 'warm', noise: 1 }] } };
    expect(latheSurveySchema.safeParse(survey).success).toBe(true);
  });

  it('refuses a power-run range without its cold or warm state', () => {
    const survey = { ...clone(nearNew), powerRun: { startState: 'cold', minutesRunBeforeReadings: 30, ranges: [{ range: 'low', noise: 1 }] } };
    expect(latheSurveySchema.safeParse(survey).success).toBe(false);
  });

  it('states the power run in the notices', () => {
    const survey = { ...clone(nearNew), powerRun: { startState: 'cold', minutesRunBeforeReadings: 25 } };
    expect(scoreSurvey(survey).notices).toContain('Power run: the machine was cold at the start and ran 25 min before the readings were taken.');
  });
});
