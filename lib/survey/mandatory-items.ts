import type { DraftSurvey } from './draft-survey-schema';
import type { SurveySectionId } from './survey-sections';

/**
 * What a survey must hold before it can be submitted: enough to identify the machine, every safety
 * function a buyer relies on, and the core accuracy checks the price turns on (bed levelling,
 * spindle run-out, tailstock alignment). Everything else may be left out when it cannot be done —
 * the report then states lower confidence. A Waygrade rule, from common inspection practice.
 */
export interface MandatoryItem {
  id: string;
  section: SurveySectionId;
  label: string;
  /** Survey paths this item stands for, so a schema complaint about them is not listed twice. */
  covers?: readonly string[];
  isPresent: (survey: DraftSurvey, context: { photoCount: number }) => boolean;
}

const has = (value: unknown) => value !== undefined && value !== null && value !== '';
const hasLength = (value: { value?: number; unit?: string } | undefined) => typeof value?.value === 'number' && has(value.unit);

export const MANDATORY_ITEMS: readonly MandatoryItem[] = [
  { id: 'inspected-on', section: 'identity', label: 'Date of the inspection', isPresent: (s) => has(s.inspectedOn) },
  { id: 'lathe-type', section: 'identity', label: 'Lathe type', covers: ['machine.latheType'], isPresent: (s) => has(s.machine?.latheType) },
  { id: 'maker', section: 'identity', label: 'Maker from the nameplate', isPresent: (s) => has(s.machine?.maker) },
  { id: 'swing', section: 'identity', label: 'Swing over bed', covers: ['machine.swingOverBed'], isPresent: (s) => hasLength(s.machine?.swingOverBed) },
  { id: 'centres', section: 'identity', label: 'Distance between centres', covers: ['machine.distanceBetweenCentres'], isPresent: (s) => hasLength(s.machine?.distanceBetweenCentres) },
  { id: 'level-sensitivity', section: 'identity', label: 'Level sensitivity per division', covers: ['instruments.levelSensitivity'], isPresent: (s) => typeof s.instruments?.levelSensitivity?.value === 'number' },
  { id: 'photo', section: 'identity', label: 'At least one photo of the machine', isPresent: (_s, c) => c.photoCount > 0 },
  {
    id: 'stand-load',
    section: 'bedAndWays',
    label: 'Load on the stand while levelling',
    isPresent: (s) => has(s.bedAndWays?.standLoadState),
  },
  { id: 'station-spacing', section: 'bedAndWays', label: 'Bed levelling: distance between stations', covers: ['bedAndWays.levelling.stationSpacing'], isPresent: (s) => hasLength(s.bedAndWays?.levelling?.stationSpacing) },
  {
    id: 'longitudinal-readings',
    section: 'bedAndWays',
    label: 'Bed levelling: at least 2 readings along the bed',
    covers: ['bedAndWays.levelling.longitudinalReadings'],
    isPresent: (s) => (s.bedAndWays?.levelling?.longitudinalReadings?.length ?? 0) >= 2,
  },
  {
    id: 'spindle-runout',
    section: 'spindle',
    label: 'Spindle run-out at the nose (nose or test bar)',
    isPresent: (s) => hasLength(s.spindle?.noseRunout) || hasLength(s.spindle?.testBarRunoutAtNose),
  },
  {
    id: 'tailstock-alignment',
    section: 'tailstock',
    label: 'Tailstock alignment: both indicator readings and the distance',
    covers: ['tailstock.alignmentIndicator'],
    isPresent: (s) => {
      const a = s.tailstock?.alignmentIndicator;
      return hasLength(a?.readingNearHeadstock) && hasLength(a?.readingNearTailstock) && hasLength(a?.distance);
    },
  },
  { id: 'emergency-stop', section: 'electricalAndSafety', label: 'Emergency stop', isPresent: (s) => has(s.electricalAndSafety?.emergencyStop) },
  { id: 'chuck-guard', section: 'electricalAndSafety', label: 'Chuck guard and interlock', isPresent: (s) => has(s.electricalAndSafety?.chuckGuardInterlock) },
  { id: 'brake', section: 'electricalAndSafety', label: 'Spindle brake', isPresent: (s) => has(s.electricalAndSafety?.brakeWorks) },
  { id: 'earth', section: 'electricalAndSafety', label: 'Protective-earth continuity', isPresent: (s) => typeof s.electricalAndSafety?.earthContinuity?.value === 'number' },
  {
    id: 'insulation',
    section: 'electricalAndSafety',
    label: 'Insulation resistance',
    isPresent: (s) => typeof s.electricalAndSafety?.insulationResistance?.value === 'number',
  },
];

export function missingMandatoryItems(survey: DraftSurvey, context: { photoCount: number }): MandatoryItem[] {
  return MANDATORY_ITEMS.filter((item) => !item.isPresent(survey, context));
}
