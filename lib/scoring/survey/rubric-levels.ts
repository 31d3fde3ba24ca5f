// The rubrics' words and the fixed lists of states, without their survey-format schemas, so a
// screen can show them without loading the validator (rubrics.ts builds the schemas from these).

/**
 * Defined rubrics for the rated (not measured) items of the survey. The words are Waygrade's own;
 * each level describes what the inspector sees so two inspectors rate alike. The ratio each level
 * maps to for grading lives in grading/rubric-ratios.ts.
 */
export interface RubricLevel {
  rating: number;
  label: string;
  meaning: string;
}

export interface Rubric {
  id: string;
  title: string;
  levels: readonly RubricLevel[];
}

export const WEAR_RUBRIC: Rubric = {
  id: 'wear',
  title: 'Visible wear',
  levels: [
    { rating: 0, label: 'as new', meaning: 'no visible wear; original scraping or grinding marks intact' },
    { rating: 1, label: 'light', meaning: 'light wear, no effect on work; adjustment left' },
    { rating: 2, label: 'marked', meaning: 'marked wear or scoring that affects accuracy; still adjustable' },
    { rating: 3, label: 'severe', meaning: 'deep scoring, steps or no adjustment left; needs repair' },
  ],
};

export const NOISE_RUBRIC: Rubric = {
  id: 'noise',
  title: 'Running noise',
  levels: [
    { rating: 0, label: 'quiet', meaning: 'quiet, even sound in every speed' },
    { rating: 1, label: 'even hum', meaning: 'audible but even gear hum or whine' },
    { rating: 2, label: 'uneven', meaning: 'uneven, rising under load, or occasional knock' },
    { rating: 3, label: 'grinding', meaning: 'grinding, rhythmic knocking or howling' },
  ],
};

export const OIL_CONDITION_RUBRIC: Rubric = {
  id: 'oil-condition',
  title: 'Oil colour and sludge',
  levels: [
    { rating: 0, label: 'clear', meaning: 'clear or amber, no deposits' },
    { rating: 1, label: 'darkened', meaning: 'darkened but fluid, no sludge' },
    { rating: 2, label: 'dirty', meaning: 'dark with sludge in corners or grooves' },
    { rating: 3, label: 'spent', meaning: 'black, milky (water) or heavy sludge; blocked screen' },
  ],
};

export const DEBRIS_RUBRIC: Rubric = {
  id: 'debris',
  title: 'Metal debris (oil, drain plug, magnet)',
  levels: [
    { rating: 0, label: 'none', meaning: 'no metal seen' },
    { rating: 1, label: 'fine paste', meaning: 'fine grey paste on the magnet only (normal running-in)' },
    { rating: 2, label: 'flakes', meaning: 'visible flakes or slivers' },
    { rating: 3, label: 'chips', meaning: 'chips, pieces of teeth or bearing parts' },
  ],
};

export const LEAK_RUBRIC: Rubric = {
  id: 'leaks',
  title: 'Oil leaks',
  levels: [
    { rating: 0, label: 'dry', meaning: 'dry seals and joints' },
    { rating: 1, label: 'weeping', meaning: 'film of oil at a seal, no drips' },
    { rating: 2, label: 'dripping', meaning: 'drips during or after running' },
    { rating: 3, label: 'running', meaning: 'oil runs out; level drops noticeably in a day' },
  ],
};

export const FILTER_SCREEN_RUBRIC: Rubric = {
  id: 'filter-screen',
  title: 'Oil filter screen',
  levels: [
    { rating: 0, label: 'clean', meaning: 'mesh clean and whole' },
    { rating: 1, label: 'light deposit', meaning: 'light deposit, oil passes freely' },
    { rating: 2, label: 'partly blocked', meaning: 'sludge or fibres over part of the mesh' },
    { rating: 3, label: 'blocked or torn', meaning: 'mesh blocked, torn or missing' },
  ],
};

export const BELT_RUBRIC: Rubric = {
  id: 'belt',
  title: 'Belt condition',
  levels: [
    { rating: 0, label: 'supple', meaning: 'supple, sides matt and even, no cracks' },
    { rating: 1, label: 'light glazing', meaning: 'light glazing or fine surface crazing' },
    { rating: 2, label: 'cracked', meaning: 'cracks across the underside, shiny glazed sides or frayed edges' },
    { rating: 3, label: 'failing', meaning: 'cracked through, pieces missing or cords showing' },
  ],
};

export const CABLE_RUBRIC: Rubric = {
  id: 'cables',
  title: 'Cables and glands',
  levels: [
    { rating: 0, label: 'sound', meaning: 'sheaths supple and whole, glands tight, strain relief in place' },
    { rating: 1, label: 'aged', meaning: 'sheaths stiff or scuffed, nothing cut' },
    { rating: 2, label: 'damaged', meaning: 'sheath cut or cracked, a gland loose or strain relief missing' },
    { rating: 3, label: 'exposed', meaning: 'inner insulation or conductors showing, or cable pulled from its gland' },
  ],
};

export const DIAL_RUBRIC: Rubric = {
  id: 'dials',
  title: 'Feed dials',
  levels: [
    { rating: 0, label: 'clear and firm', meaning: 'figures clear, dial holds its setting' },
    { rating: 1, label: 'worn figures', meaning: 'figures worn but readable; dial holds its setting' },
    { rating: 2, label: 'slipping', meaning: 'dial slips or figures hard to read' },
    { rating: 3, label: 'broken', meaning: 'dial broken, missing or unreadable' },
  ],
};

/** Every rated item has its own words: ways and slides on the wear scale, a belt or a cable on its own. */
export const ALL_RUBRICS = [
  WEAR_RUBRIC,
  NOISE_RUBRIC,
  OIL_CONDITION_RUBRIC,
  DEBRIS_RUBRIC,
  LEAK_RUBRIC,
  FILTER_SCREEN_RUBRIC,
  BELT_RUBRIC,
  CABLE_RUBRIC,
  DIAL_RUBRIC,
] as const;

/** State of a safety device or function: seen working, present but faulty, or not fitted. */
export const DEVICE_STATES = ['works', 'faulty', 'missing'] as const;
export type DeviceState = (typeof DEVICE_STATES)[number];

/** Oil level at a sight glass or dipstick. */
export const OIL_LEVELS = ['correct', 'low', 'empty', 'overfull'] as const;
export type OilLevel = (typeof OIL_LEVELS)[number];
