// The checklists' items and the areas that may be left uninspected, without their survey-format
// schemas, so a screen can list them without loading the validator (condition-findings.ts builds
// the schemas from these).

export const HIDDEN_DAMAGE_ITEMS = [
  { id: 'freshPaintOverFiller', label: 'Fresh paint over filler' },
  { id: 'welds', label: 'Welds or brazed repairs' },
  { id: 'nonOriginalHandles', label: 'Non-original handles or levers' },
  { id: 'chippedCastings', label: 'Chipped castings' },
  { id: 'crashMarks', label: 'Crash marks (chuck jaws, compound, ways)' },
  { id: 'crackedChuck', label: 'Cracked chuck' },
] as const;

export const DEAL_BREAKER_ITEMS = [
  { id: 'crackedCasting', label: 'Cracked casting (bed, headstock, apron or gearbox)' },
  { id: 'growlingSpindleBearings', label: 'Growling spindle bearings' },
  { id: 'brokenGearTeeth', label: 'Broken gear teeth' },
  { id: 'motorCannotRunOnSupply', label: 'Motor cannot run on the stated supply' },
] as const;

export type HiddenDamageId = (typeof HIDDEN_DAMAGE_ITEMS)[number]['id'];
export type NotInspectedArea = (typeof NOT_INSPECTED_AREAS)[number];
export type DealBreakerId = (typeof DEAL_BREAKER_ITEMS)[number]['id'];

export const NOT_INSPECTED_AREAS = [
  'lubrication',
  'gearboxAndFeeds',
  'drive',
  'bedAndWays',
  'spindle',
  'slidesAndScrews',
  'tailstock',
  'testCuts',
  'electricalAndSafety',
  'accessories',
  'powerRun',
] as const;
