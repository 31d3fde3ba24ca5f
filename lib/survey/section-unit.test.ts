import { describe, expect, it } from 'vitest';
import { sectionUnitOf, withSectionUnit } from './section-unit';
import { setAt } from './survey-paths';
import { scorableDraft } from './scorable-draft';
import nearNew from '@/lib/scoring/examples/near-new.json';
import type { DraftSurvey } from './draft-survey-schema';

describe('section units', () => {
  it.each([
    [{ noseRunout: { value: 0.0004, unit: 'in' } }, 'in'],
    [{ noseRunout: { value: 0.4, unit: 'thou' } }, 'in'],
    [{ noseRunout: { value: 0.01, unit: 'mm' } }, 'mm'],
    [{ temperatureRise: { value: 12, unit: 'K' } }, 'mm'],
    [undefined, 'mm'],
  ])('reads the unit family of %j as %s', (section, unit) => {
    expect(sectionUnitOf(section)).toBe(unit);
  });

  it('re-tags lengths and leaves other quantities alone', () => {
    const section = { noseRunout: { value: 0.01, unit: 'mm' }, temperatureRise: { value: 12, unit: 'K' }, far: { runout: { value: 0.02, unit: 'mm' } } };
    expect(withSectionUnit(section, 'in')).toEqual({ noseRunout: { value: 0.01, unit: 'in' }, temperatureRise: { value: 12, unit: 'K' }, far: { runout: { value: 0.02, unit: 'in' } } });
  });
});

describe('setAt', () => {
  it('removes a cleared value and the group it leaves empty', () => {
    expect(setAt({ spindle: { noseRunout: { value: 1, unit: 'mm' } } }, ['spindle', 'noseRunout'], undefined)).toEqual({});
  });

  it('writes into a list and removes an entry from it', () => {
    const list = setAt({}, ['accessories', 0], { kind: 'faceplate' });
    expect(list).toEqual({ accessories: [{ kind: 'faceplate' }] });
    expect(setAt(list, ['accessories', 0], undefined)).toEqual({});
  });
});

describe('scorableDraft', () => {
  it('sets aside an unfinished group and keeps the finished ones', () => {
    const draft = JSON.parse(JSON.stringify(nearNew)) as DraftSurvey;
    delete draft.testCuts!.twoCollar!.collarDistance;
    const scorable = scorableDraft(draft);
    expect(scorable?.testCuts?.twoCollar).toBeUndefined();
    expect(scorable?.testCuts?.facing).toEqual(nearNew.testCuts.facing);
  });

  it('gives up while the machine size is missing', () => {
    const draft = JSON.parse(JSON.stringify(nearNew)) as DraftSurvey;
    delete draft.machine!.swingOverBed;
    expect(scorableDraft(draft)).toBeNull();
  });
});
