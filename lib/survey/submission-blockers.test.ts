import { describe, expect, it } from 'vitest';
import nearNew from '@/lib/scoring/examples/near-new.json';
import type { DraftSurvey } from './draft-survey-schema';
import { draftSurveySchema } from './draft-survey-schema';
import { MANDATORY_ITEMS } from './mandatory-items';
import { submissionBlockers } from './submission-blockers';

const complete = nearNew as DraftSurvey;
const bare: DraftSurvey = { surveyFormatVersion: 1, machineType: 'centre-lathe' };

describe('submissionBlockers', () => {
  it('finds nothing missing in a complete survey with a photo', () => {
    expect(submissionBlockers(complete, { photoCount: 1 })).toEqual([]);
  });

  it('lists every mandatory item of an empty survey once, in the on-site order', () => {
    const blockers = submissionBlockers(bare, { photoCount: 0 });
    expect(blockers.map((b) => b.text)).toEqual(expect.arrayContaining(MANDATORY_ITEMS.map((item) => item.label)));
    expect(blockers.filter((b) => b.text.startsWith('Swing over bed'))).toHaveLength(1);
    expect(blockers[0]!.section).toBe('identity');
    expect(blockers[blockers.length - 1]!.section).toBe('electricalAndSafety');
  });

  it.each([
    ['the photo', { photoCount: 0 }, complete, 'At least one photo of the machine'],
    ['the emergency stop', { photoCount: 1 }, { ...complete, electricalAndSafety: { ...complete.electricalAndSafety, emergencyStop: undefined } }, 'Emergency stop'],
    ['the tailstock readings', { photoCount: 1 }, { ...complete, tailstock: {} }, 'Tailstock alignment: both indicator readings and the distance'],
  ] as const)('blocks a survey without %s', (_what, context, survey, text) => {
    expect(submissionBlockers(JSON.parse(JSON.stringify(survey)) as DraftSurvey, context).map((b) => b.text)).toContain(text);
  });

  it('names a group of readings begun but not finished', () => {
    const survey = { ...complete, testCuts: { twoCollar: { setup: 'between-centres', diameterNearHeadstock: { value: 25, unit: 'mm' } } } } as DraftSurvey;
    const texts = submissionBlockers(survey, { photoCount: 1 }).filter((b) => b.section === 'testCuts').map((b) => b.text);
    expect(texts).toContain('Two-collar test: diameter near the tailstock — missing');
    expect(texts).toContain('Two-collar test: distance between the collars — missing');
  });
});

describe('draftSurveySchema', () => {
  it.each([
    ['an unfinished two-collar test', { testCuts: { twoCollar: { diameterNearHeadstock: { value: 25, unit: 'mm' } } } }, true],
    ['a single level reading', { bedAndWays: { levelling: { longitudinalReadings: [0.5] } } }, true],
    ['a negative diameter', { testCuts: { twoCollar: { diameterNearHeadstock: { value: -25, unit: 'mm' } } } }, false],
    ['an unknown unit', { spindle: { noseRunout: { value: 0.01, unit: 'cm' } } }, false],
    ['an unknown member', { spindle: { runoutSomewhere: 1 } }, false],
  ])('judges a draft with %s', (_what, extra, valid) => {
    expect(draftSurveySchema.safeParse({ ...bare, ...extra }).success).toBe(valid);
  });
});
