import { describe, expect, it } from 'vitest';
import nearNew from '@/lib/scoring/examples/near-new.json';
import type { DraftSurvey } from './draft-survey-schema';
import { draftSurveySchema } from './draft-survey-schema';
import { safetyGateConfirmed } from './safety-gate';
import { submissionBlockers } from './submission-blockers';

const complete = nearNew as DraftSurvey;
const gate = { guardsOn: true, chuckKeyOut: true, workAndChuckSecure: true, emergencyStopAndBrakeTested: true, earthChecked: true };
const withBrokenGear = { ...complete, dealBreakers: { brokenGearTeeth: { present: true, note: 'Chipped teeth on the 40T gear' } } } as DraftSurvey;
const hiddenTexts = (survey: DraftSurvey, hiddenDamagePhotos: number) =>
  submissionBlockers(survey, { photoCount: 1 + hiddenDamagePhotos, sectionPhotoCounts: { identity: 1, hiddenDamage: hiddenDamagePhotos } })
    .filter((b) => b.section === 'hiddenDamage')
    .map((b) => b.text);

describe('photos for every "yes" on the hidden-damage list and the deal-breakers', () => {
  it('blocks a deal-breaker answered yes without a photo', () => {
    expect(hiddenTexts(withBrokenGear, 0)).toEqual(['A photo for every “yes”: 1 answered yes (Broken gear teeth), 0 photos in this section']);
  });

  it('lets it through once the section holds a photo', () => {
    expect(hiddenTexts(withBrokenGear, 1)).toEqual([]);
  });

  it('asks for one photo per yes, counting hidden damage and deal-breakers together', () => {
    const survey = { ...withBrokenGear, hiddenDamage: { welds: { present: true }, crashMarks: { present: false } } } as DraftSurvey;
    expect(hiddenTexts(survey, 1)).toHaveLength(1);
    expect(hiddenTexts(survey, 2)).toEqual([]);
  });

  it('asks for nothing when every answer is no', () => {
    const survey = { ...complete, hiddenDamage: { welds: { present: false } }, dealBreakers: { crackedCasting: { present: false } } } as DraftSurvey;
    expect(hiddenTexts(survey, 0)).toEqual([]);
  });
});

describe('safety gate before the power run', () => {
  const run = { startState: 'cold', minutesRunBeforeReadings: 20 } as const;

  it('blocks a power-run log recorded without the gate confirmed', () => {
    const blockers = submissionBlockers({ ...complete, powerRun: run } as DraftSurvey, { photoCount: 1 });
    expect(blockers).toContainEqual({ section: 'powerRun', text: 'Safety gate: confirm every item before the power run' });
  });

  it('blocks when one item is left unticked', () => {
    const survey = { ...complete, powerRun: run, safetyGate: { ...gate, earthChecked: false } } as DraftSurvey;
    expect(safetyGateConfirmed(survey)).toBe(false);
    expect(submissionBlockers(survey, { photoCount: 1 }).map((b) => b.section)).toContain('powerRun');
  });

  it('finds nothing missing once every item is confirmed', () => {
    const survey = { ...complete, powerRun: run, safetyGate: gate } as DraftSurvey;
    expect(safetyGateConfirmed(survey)).toBe(true);
    expect(submissionBlockers(survey, { photoCount: 1 })).toEqual([]);
  });
});

describe('draft format for the new survey members', () => {
  it.each([
    ['a power run without its ranges yet', { powerRun: { startState: 'warm' } }, true],
    ['a thickness station without its thickness yet', { bedAndWays: { wayThickness: { stations: [{ distanceFromHeadstock: { value: 0, unit: 'mm' } }] } } }, true],
    ['a hidden-damage item outside the list', { hiddenDamage: { rust: { present: true } } }, false],
    ['a power-run state other than cold or warm', { powerRun: { startState: 'hot' } }, false],
  ])('judges a draft with %s', (_what, extra, valid) => {
    expect(draftSurveySchema.safeParse({ surveyFormatVersion: 1, machineType: 'centre-lathe', ...extra }).success).toBe(valid);
  });
});
