import type { Hazard } from './safety-cautions';

/**
 * The survey screens in the on-site order of work (common practice): one screen a section. `key` is the
 * section's member in the survey format (null for the identity screen, which fills `machine`,
 * `instruments` and the date). `checks` are the scoring library's check ids whose bands the screen
 * shows beside its inputs.
 */
export const SURVEY_SECTION_IDS = [
  'identity',
  'hiddenDamage',
  'lubrication',
  'powerRun',
  'gearboxAndFeeds',
  'drive',
  'bedAndWays',
  'spindle',
  'slidesAndScrews',
  'tailstock',
  'testCuts',
  'electricalAndSafety',
  'accessories',
] as const;
export type SurveySectionId = (typeof SURVEY_SECTION_IDS)[number];

export interface SurveySection {
  id: SurveySectionId;
  title: string;
  /** What the inspector does here, in one line. */
  summary: string;
  hazards: readonly Hazard[];
  /** Whether the section has lengths read from an instrument, so a unit is chosen for it. */
  hasLengths: boolean;
  checks: readonly string[];
  photoHint: string;
}

export const SURVEY_SECTIONS: readonly SurveySection[] = [
  {
    id: 'identity',
    title: 'Machine and instruments',
    summary: 'Nameplate, size, supply and how the machine stands; the level and indicator you use.',
    hazards: [],
    hasLengths: true,
    checks: [],
    photoHint: 'The whole machine, and the nameplate close up.',
  },
  {
    id: 'hiddenDamage',
    title: 'Hidden damage and deal-breakers',
    summary: 'Walk round the machine: repairs and damage a seller may not mention, and the faults that end a deal.',
    hazards: [],
    hasLengths: false,
    checks: [],
    photoHint: 'One photo for every “yes”, close enough to see the damage.',
  },
  {
    id: 'lubrication',
    title: 'Headstock and lubrication',
    summary: 'Open the headstock cover: oil level and colour, metal, sludge, pump, filter, leaks.',
    hazards: ['isolate', 'used-oil'],
    hasLengths: false,
    checks: ['headstock-oil-level', 'headstock-oil-condition', 'headstock-metal-particles', 'oil-pump', 'oil-filter-screen', 'oil-leaks', 'oil-cleanliness', 'oil-viscosity', 'oil-water'],
    photoHint: 'Inside the headstock, the sight window, any sludge or metal.',
  },
  {
    id: 'powerRun',
    title: 'Power run',
    summary: 'Start the machine: cold or warm, minutes run before the readings, noise and housing temperature in each speed range.',
    hazards: ['rotating'],
    hasLengths: false,
    checks: [],
    photoHint: 'The thermometer on the headstock housing, the speed chart.',
  },
  {
    id: 'gearboxAndFeeds',
    title: 'Gearbox and feeds',
    summary: 'Sight glass and drain plug; noise in each speed range; every feed and thread range.',
    hazards: ['rotating', 'used-oil'],
    hasLengths: false,
    checks: ['gearbox-oil-level', 'gearbox-drain-debris', 'gear-noise', 'feeds-engage', 'thread-ranges-engage', 'half-nut', 'feed-clutch'],
    photoHint: 'Sight glass, drain-plug magnet, the gearbox levers.',
  },
  {
    id: 'drive',
    title: 'Drive',
    summary: 'Belt state and tension by mid-span deflection, motor noise.',
    hazards: ['isolate', 'rotating'],
    hasLengths: true,
    checks: ['belt-condition', 'belt-tension', 'motor-noise'],
    photoHint: 'Belts and pulleys with the cover off (machine isolated).',
  },
  {
    id: 'bedAndWays',
    title: 'Bed and ways',
    summary: 'Wear and the step near the chuck; level readings along and across the ways; carriage fit.',
    hazards: [],
    hasLengths: true,
    checks: ['bed-straightness', 'bed-local-straightness', 'bed-twist', 'bed-visual-wear', 'bed-step-near-chuck', 'carriage-wear'],
    photoHint: 'The ways near the chuck, the level on the bed.',
  },
  {
    id: 'spindle',
    title: 'Spindle',
    summary: 'Run-out at the nose and along a test bar, axial and lift play, warm-up and vibration.',
    hazards: ['rotating'],
    hasLengths: true,
    checks: ['spindle-nose-runout', 'test-bar-runout-nose', 'test-bar-runout-far', 'spindle-axial-slip', 'spindle-lift-play', 'spindle-parallelism-vertical', 'spindle-parallelism-horizontal', 'spindle-temperature-rise', 'spindle-vibration'],
    photoHint: 'The spindle nose, the indicator on the test bar.',
  },
  {
    id: 'slidesAndScrews',
    title: 'Slides and screws',
    summary: 'Backlash of the cross-slide and top-slide screws, leadscrew end play, slides and dials.',
    hazards: [],
    hasLengths: true,
    checks: ['cross-slide-backlash', 'top-slide-backlash', 'leadscrew-end-play', 'slide-wear', 'dials'],
    photoHint: 'Dials, slide dovetails, worn screws.',
  },
  {
    id: 'tailstock',
    title: 'Tailstock',
    summary: 'Alignment along a test bar between centres, centre height, quill and lock.',
    hazards: [],
    hasLengths: true,
    checks: ['tailstock-alignment', 'centre-height', 'quill-condition', 'quill-lock'],
    photoHint: 'The indicator on the bar between centres, the quill.',
  },
  {
    id: 'testCuts',
    title: 'Test cuts',
    summary: 'Two-collar test between centres and a facing cut.',
    hazards: ['rotating'],
    hasLengths: true,
    checks: ['two-collar-test', 'facing-test'],
    photoHint: 'The test piece with both collars, the faced surface.',
  },
  {
    id: 'electricalAndSafety',
    title: 'Electrical and safety',
    summary: 'Emergency stop, chuck guard, brake, earth continuity, insulation, covers and cables.',
    hazards: ['isolate', 'electrical', 'rotating'],
    hasLengths: false,
    checks: ['emergency-stop', 'chuck-guard-interlock', 'brake-function', 'brake-stopping-time', 'earth-continuity', 'insulation-resistance', 'covers', 'cables'],
    photoHint: 'The electrical cabinet (isolated), guards, damaged cables.',
  },
  {
    id: 'accessories',
    title: 'Accessories',
    summary: 'Chucks, faceplate, rests, tool post, readout, manuals and tooling that come with it.',
    hazards: [],
    hasLengths: false,
    checks: ['accessories'],
    photoHint: 'Everything that comes with the machine, laid out.',
  },
];

/**
 * Sections whose steps run the machine under power. They stay locked until the inspector has
 * confirmed the safety gate (guards, chuck key, work secure, emergency stop and brake, earth).
 */
export const POWER_ON_SECTIONS: readonly SurveySectionId[] = ['powerRun', 'gearboxAndFeeds', 'spindle', 'testCuts'];

export function sectionById(id: string): SurveySection | undefined {
  return SURVEY_SECTIONS.find((section) => section.id === id);
}
