import { ACCESSORY_CHECKS } from './accessory-checks';
import { BED_CHECKS } from './bed-checks';
import { DRIVE_CHECKS } from './drive-checks';
import { ELECTRICAL_CHECKS } from './electrical-checks';
import { GEARBOX_CHECKS } from './gearbox-checks';
import type { LatheCheck } from './lathe-check';
import { LUBRICATION_CHECKS } from './lubrication-checks';
import { SLIDE_CHECKS } from './slide-checks';
import { SPINDLE_CHECKS } from './spindle-checks';
import { TAILSTOCK_CHECKS } from './tailstock-checks';

/** Every check of a centre-lathe survey, in the on-site order of work. */
export const LATHE_CHECKS: readonly LatheCheck[] = [
  ...LUBRICATION_CHECKS,
  ...GEARBOX_CHECKS,
  ...DRIVE_CHECKS,
  ...BED_CHECKS,
  ...SPINDLE_CHECKS,
  ...SLIDE_CHECKS,
  ...TAILSTOCK_CHECKS,
  ...ELECTRICAL_CHECKS,
  ...ACCESSORY_CHECKS,
];
