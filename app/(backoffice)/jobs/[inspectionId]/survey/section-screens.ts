import type { ComponentType } from 'react';
import type { SurveySectionId } from '@/lib/survey/survey-sections';
import type { SurveyForm } from './fields/survey-form';
import { AccessoriesSection } from './sections/accessories-section';
import { BedSection } from './sections/bed-section';
import { DriveSection } from './sections/drive-section';
import { ElectricalSection } from './sections/electrical-section';
import { GearboxSection } from './sections/gearbox-section';
import { HiddenDamageSection } from './sections/hidden-damage-section';
import { PowerRunSection } from './sections/power-run-section';
import { IdentitySection } from './sections/identity-section';
import { LubricationSection } from './sections/lubrication-section';
import { SlidesSection } from './sections/slides-section';
import { SpindleSection } from './sections/spindle-section';
import { TailstockSection } from './sections/tailstock-section';
import { TestCutsSection } from './sections/test-cuts-section';
import { withThermalState } from './with-thermal-state';

/** The screen for each survey section; measured sections carry their cold/warm control. */
export const SECTION_SCREENS: Readonly<Record<SurveySectionId, ComponentType<{ form: SurveyForm }>>> = {
  identity: IdentitySection,
  hiddenDamage: HiddenDamageSection,
  lubrication: LubricationSection,
  powerRun: PowerRunSection,
  gearboxAndFeeds: withThermalState(GearboxSection, 'gearboxAndFeeds'),
  drive: withThermalState(DriveSection, 'drive'),
  bedAndWays: withThermalState(BedSection, 'bedAndWays'),
  spindle: withThermalState(SpindleSection, 'spindle'),
  slidesAndScrews: withThermalState(SlidesSection, 'slidesAndScrews'),
  tailstock: withThermalState(TailstockSection, 'tailstock'),
  testCuts: withThermalState(TestCutsSection, 'testCuts'),
  electricalAndSafety: ElectricalSection,
  accessories: AccessoriesSection,
};

/** Where each section keeps its data in the survey (identity spans the machine and the instruments). */
export const SECTION_DATA_KEYS: Readonly<Record<SurveySectionId, readonly string[]>> = {
  identity: ['machine', 'instruments'],
  hiddenDamage: ['hiddenDamage', 'dealBreakers'],
  lubrication: ['lubrication'],
  powerRun: ['powerRun'],
  gearboxAndFeeds: ['gearboxAndFeeds'],
  drive: ['drive'],
  bedAndWays: ['bedAndWays'],
  spindle: ['spindle'],
  slidesAndScrews: ['slidesAndScrews'],
  tailstock: ['tailstock'],
  testCuts: ['testCuts'],
  electricalAndSafety: ['electricalAndSafety'],
  accessories: ['accessories'],
};
