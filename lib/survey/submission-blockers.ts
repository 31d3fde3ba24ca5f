import { latheSurveySchema } from '@/lib/scoring';
import type { DraftSurvey } from './draft-survey-schema';
import { missingMandatoryItems } from './mandatory-items';
import { findingsNeedingPhotos } from './hidden-damage';
import { powerRunRecorded, safetyGateConfirmed } from './safety-gate';
import { SURVEY_SECTION_IDS, sectionById, type SurveySectionId } from './survey-sections';

/**
 * Everything that stops a survey from being submitted, as the inspector reads it, grouped by the
 * screen to go back to: mandatory items not filled in, and groups of readings begun but not
 * finished (the second collar diameter without the first, a belt without its pulleys).
 */
export interface SubmissionBlocker {
  section: SurveySectionId;
  text: string;
}

// Friendlier names for members the survey format nests; anything else is shown by its path.
const PATH_WORDS: Readonly<Record<string, string>> = {
  machine: 'Machine',
  instruments: 'Instruments',
  levelling: 'Bed levelling',
  belt: 'Belt drive',
  twoCollar: 'Two-collar test',
  facing: 'Facing test',
  alignmentIndicator: 'Tailstock alignment',
  testBarRunoutFar: 'Test bar run-out away from the nose',
  parallelismVertical: 'Spindle to carriage, vertical',
  parallelismHorizontal: 'Spindle to carriage, horizontal',
  crossSlideBacklash: 'Cross-slide backlash',
  topSlideBacklash: 'Top-slide backlash',
  oilSample: 'Oil sample',
  particlesPerMl: 'Particle counts',
  supply: 'Supply',
  noiseBySpeedRange: 'Noise by speed range',
  swingOverBed: 'swing over bed',
  distanceBetweenCentres: 'distance between centres',
  stationSpacing: 'distance between stations',
  centreDistance: 'distance between pulley centres',
  driverPulleyDiameter: 'motor pulley diameter',
  drivenPulleyDiameter: 'driven pulley diameter',
  diameterNearHeadstock: 'diameter near the headstock',
  diameterNearTailstock: 'diameter near the tailstock',
  collarDistance: 'distance between the collars',
  readingNearHeadstock: 'reading near the headstock',
  readingNearTailstock: 'reading near the tailstock',
  distance: 'distance travelled',
  distanceFromNose: 'distance from the nose',
  runout: 'run-out',
  deviation: 'deviation',
  over: 'length travelled',
  centreDeviation: 'deviation at the centre',
  diameter: 'diameter',
  setup: 'how the work was held',
  graduation: 'dial graduation',
  divisions: 'dial divisions',
  readsDiameter: 'whether the dial reads diameter',
  backlash: 'backlash',
  condition: 'condition',
  kind: 'kind',
  range: 'speed range name',
  voltage: 'voltage',
  phases: 'phases',
  frequencyHz: 'frequency',
  reason: 'why not',
  area: 'area',
  startState: 'machine cold or warm at the start',
  minutesRunBeforeReadings: 'minutes run before the readings',
  machineState: 'cold or warm',
  stations: 'Way thickness',
  thickness: 'thickness',
  distanceFromHeadstock: 'distance from the headstock',
  bindsAtFromHeadstock: 'where the locked carriage binds',
};

function sectionOfPath(path: readonly PropertyKey[]): SurveySectionId {
  const head = String(path[0] ?? '');
  return (SURVEY_SECTION_IDS as readonly string[]).includes(head) ? (head as SurveySectionId) : 'identity';
}

function describePath(path: readonly PropertyKey[]): string {
  const words = path
    .slice(1)
    .filter((part) => typeof part === 'string' && part !== 'value' && part !== 'unit')
    .map((part) => PATH_WORDS[String(part)] ?? String(part));
  const numbered = path.find((part) => typeof part === 'number');
  const where = typeof numbered === 'number' ? ` (entry ${numbered + 1})` : '';
  return `${words.join(': ') || sectionById(sectionOfPath(path))?.title || 'Survey'}${where}`;
}

export interface SubmissionContext {
  photoCount: number;
  /** Photos kept for each survey section, by section id. */
  sectionPhotoCounts?: Readonly<Partial<Record<string, number>>>;
}

export function submissionBlockers(survey: DraftSurvey, context: SubmissionContext): SubmissionBlocker[] {
  const missing = missingMandatoryItems(survey, context);
  const blockers: SubmissionBlocker[] = missing.map((item) => ({ section: item.section, text: item.label }));
  // Every "yes" on the hidden-damage list or the deal-breakers needs a photo of its own as evidence.
  const yes = findingsNeedingPhotos(survey);
  const photos = context.sectionPhotoCounts?.hiddenDamage ?? 0;
  if (yes.length > photos) {
    blockers.push({
      section: 'hiddenDamage',
      text: `A photo for every “yes”: ${yes.length} answered yes (${yes.join(', ')}), ${photos} ${photos === 1 ? 'photo' : 'photos'} in this section`,
    });
  }
  if (powerRunRecorded(survey) && !safetyGateConfirmed(survey)) {
    blockers.push({ section: 'powerRun', text: 'Safety gate: confirm every item before the power run' });
  }
  const covered = missing.flatMap((item) => item.covers ?? []);
  const strict = latheSurveySchema.safeParse(survey);
  if (!strict.success) {
    const seen = new Set<string>();
    for (const issue of strict.error.issues) {
      const dotted = issue.path.map(String).join('.');
      if (covered.some((path) => dotted === path || dotted.startsWith(`${path}.`))) continue;
      const text = `${describePath(issue.path)} — ${issue.code === 'invalid_type' ? 'missing' : issue.message.toLowerCase()}`;
      if (seen.has(text)) continue;
      seen.add(text);
      blockers.push({ section: sectionOfPath(issue.path), text });
    }
  }
  const order = (id: SurveySectionId) => SURVEY_SECTION_IDS.indexOf(id);
  return blockers.sort((a, b) => order(a.section) - order(b.section));
}
