import { SURVEY_SECTIONS, type SurveySectionId } from './survey-sections';

/** A section counts as started once it holds any value; identity once the nameplate date is set. */
const STARTED: Readonly<Record<SurveySectionId, (survey: Record<string, unknown>) => boolean>> = {
  identity: (s) => Boolean(s.machine),
  hiddenDamage: (s) => hasAny(s.hiddenDamage) || hasAny(s.dealBreakers),
  lubrication: (s) => hasAny(s.lubrication),
  powerRun: (s) => hasAny(s.powerRun),
  gearboxAndFeeds: (s) => hasAny(s.gearboxAndFeeds),
  drive: (s) => hasAny(s.drive),
  bedAndWays: (s) => hasAny(s.bedAndWays),
  spindle: (s) => hasAny(s.spindle),
  slidesAndScrews: (s) => hasAny(s.slidesAndScrews),
  tailstock: (s) => hasAny(s.tailstock),
  testCuts: (s) => hasAny(s.testCuts),
  electricalAndSafety: (s) => hasAny(s.electricalAndSafety),
  accessories: (s) => Array.isArray(s.accessories) && s.accessories.length > 0,
};

function hasAny(value: unknown): boolean {
  return Boolean(value) && typeof value === 'object' && Object.keys(value as object).length > 0;
}

export function sectionsStarted(survey: unknown): SurveySectionId[] {
  const record = survey && typeof survey === 'object' ? (survey as Record<string, unknown>) : {};
  return SURVEY_SECTIONS.filter((section) => STARTED[section.id](record)).map((section) => section.id);
}
