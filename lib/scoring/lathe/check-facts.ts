import type { CheckEvaluation, CheckNature } from '../check-definition';
import type { NotInspectedArea } from '../survey/checklist-items';

/**
 * For each lathe check: the survey area its readings come from (what "not inspected" and "section
 * left out" act on) and its nature. Adjustment and service are not wear (Waygrade rule, common
 * practice): a tailstock set over, oil of the wrong grade or low, a blocked screen, a slack belt —
 * an hour's work puts them right, so they are priced and listed as set-up and service items and
 * weigh lightly in the grade. Everything else is condition: wear, damage and safety devices.
 */
export const LATHE_CHECK_FACTS: Readonly<Record<string, { area: NotInspectedArea; nature: CheckNature }>> = {
  accessories: { area: 'accessories', nature: 'condition' },
  'bed-straightness': { area: 'bedAndWays', nature: 'condition' },
  'bed-local-straightness': { area: 'bedAndWays', nature: 'condition' },
  'bed-twist': { area: 'bedAndWays', nature: 'condition' },
  'bed-visual-wear': { area: 'bedAndWays', nature: 'condition' },
  'bed-step-near-chuck': { area: 'bedAndWays', nature: 'condition' },
  'carriage-wear': { area: 'bedAndWays', nature: 'condition' },
  'belt-condition': { area: 'drive', nature: 'condition' },
  'belt-tension': { area: 'drive', nature: 'set-up' },
  'motor-noise': { area: 'drive', nature: 'condition' },
  'emergency-stop': { area: 'electricalAndSafety', nature: 'condition' },
  'chuck-guard-interlock': { area: 'electricalAndSafety', nature: 'condition' },
  'brake-function': { area: 'electricalAndSafety', nature: 'condition' },
  'brake-stopping-time': { area: 'electricalAndSafety', nature: 'condition' },
  'earth-continuity': { area: 'electricalAndSafety', nature: 'condition' },
  'insulation-resistance': { area: 'electricalAndSafety', nature: 'condition' },
  covers: { area: 'electricalAndSafety', nature: 'condition' },
  cables: { area: 'electricalAndSafety', nature: 'condition' },
  'gearbox-oil-level': { area: 'gearboxAndFeeds', nature: 'service' },
  'gearbox-drain-debris': { area: 'gearboxAndFeeds', nature: 'condition' },
  'gear-noise': { area: 'gearboxAndFeeds', nature: 'condition' },
  'feeds-engage': { area: 'gearboxAndFeeds', nature: 'condition' },
  'thread-ranges-engage': { area: 'gearboxAndFeeds', nature: 'condition' },
  'half-nut': { area: 'gearboxAndFeeds', nature: 'condition' },
  'feed-clutch': { area: 'gearboxAndFeeds', nature: 'condition' },
  'headstock-oil-level': { area: 'lubrication', nature: 'service' },
  'headstock-oil-condition': { area: 'lubrication', nature: 'service' },
  'headstock-metal-particles': { area: 'lubrication', nature: 'condition' },
  'oil-pump': { area: 'lubrication', nature: 'condition' },
  'oil-filter-screen': { area: 'lubrication', nature: 'service' },
  'oil-leaks': { area: 'lubrication', nature: 'condition' },
  'oil-cleanliness': { area: 'lubrication', nature: 'condition' },
  'oil-viscosity': { area: 'lubrication', nature: 'service' },
  'oil-water': { area: 'lubrication', nature: 'condition' },
  'cross-slide-backlash': { area: 'slidesAndScrews', nature: 'condition' },
  'top-slide-backlash': { area: 'slidesAndScrews', nature: 'condition' },
  'leadscrew-end-play': { area: 'slidesAndScrews', nature: 'condition' },
  'slide-wear': { area: 'slidesAndScrews', nature: 'condition' },
  dials: { area: 'slidesAndScrews', nature: 'condition' },
  'facing-test': { area: 'testCuts', nature: 'condition' },
  'spindle-nose-runout': { area: 'spindle', nature: 'condition' },
  'test-bar-runout-nose': { area: 'spindle', nature: 'condition' },
  'test-bar-runout-far': { area: 'spindle', nature: 'condition' },
  'spindle-axial-slip': { area: 'spindle', nature: 'condition' },
  'spindle-lift-play': { area: 'spindle', nature: 'condition' },
  'spindle-parallelism-vertical': { area: 'spindle', nature: 'condition' },
  'spindle-parallelism-horizontal': { area: 'spindle', nature: 'condition' },
  'spindle-temperature-rise': { area: 'spindle', nature: 'condition' },
  'spindle-vibration': { area: 'spindle', nature: 'condition' },
  'tailstock-alignment': { area: 'tailstock', nature: 'set-up' },
  // Between centres the collars' difference is the tailstock set-over (a set-up item, see
  // latheCheckNature); in the chuck it points to headstock alignment or bed wear.
  'two-collar-test': { area: 'testCuts', nature: 'condition' },
  'centre-height': { area: 'tailstock', nature: 'condition' },
  'quill-condition': { area: 'tailstock', nature: 'condition' },
  'quill-lock': { area: 'tailstock', nature: 'condition' },
};

/** A check's nature, given its details: a two-collar cut between centres measures the set-over. */
export function latheCheckNature(checkId: string, details: CheckEvaluation['details']): CheckNature {
  if (checkId === 'two-collar-test' && details?.setup === 'between-centres') return 'set-up';
  return LATHE_CHECK_FACTS[checkId]?.nature ?? 'condition';
}
