/**
 * The usual cautions for the hazardous steps of an inspection, in Waygrade's words. Each survey
 * section names the hazards its steps involve; the screen shows these before the inputs.
 */
export const HAZARDS = ['isolate', 'rotating', 'electrical', 'used-oil'] as const;
export type Hazard = (typeof HAZARDS)[number];

export interface SafetyCaution {
  hazard: Hazard;
  title: string;
  points: readonly string[];
}

export const SAFETY_CAUTIONS: Readonly<Record<Hazard, SafetyCaution>> = {
  isolate: {
    hazard: 'isolate',
    title: 'Isolate before opening covers',
    points: [
      'Switch off at the isolator, lock it off and keep the key before opening a cover, guard or cabinet.',
      'Check the spindle cannot be started: press start with the isolator locked off.',
    ],
  },
  rotating: {
    hazard: 'rotating',
    title: 'Rotating chuck and work',
    points: [
      'No gloves, loose sleeves, ties or jewellery near rotating work; tie back long hair.',
      'Take the chuck key out of the chuck every time, before anything is started.',
      'Stand clear of the chuck when starting; stop the spindle before measuring or reaching in.',
    ],
  },
  electrical: {
    hazard: 'electrical',
    title: 'Electrical tests by a qualified person only',
    points: [
      'Earth continuity and insulation tests are done by a qualified person with a suitable tester.',
      'Insulation testing is done with the machine isolated; test voltage can damage electronics such as a digital readout.',
    ],
  },
  'used-oil': {
    hazard: 'used-oil',
    title: 'Used oil',
    points: [
      'Wear oil-resistant gloves for draining and sampling (never near rotating work); wash skin contact off.',
      'Collect used oil and rags for proper disposal; do not pour oil away.',
    ],
  },
};

/** Shown with every set of cautions: Waygrade's survey does not override the rules of the site. */
export const SAFETY_DEFERRAL =
  'Local codes, the maker’s instructions and licensed practice come first; stop if a step cannot be done safely and note why.';
