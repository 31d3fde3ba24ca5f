// The invented demo marketplace: the Brenmark valley and its neighbours. No real firms or people.

export const WORKSHOPS = [
  { name: 'Kellbrook Precision Turning', town: 'Kellbrook', region: 'Brenmark', postcode: 'BK3 7LA' },
  { name: 'Marrowgate Tool & Die', town: 'Marrowgate', region: 'Brenmark', postcode: 'BK9 2PE' },
  { name: 'Fennick Cross Engineering', town: 'Fennick Cross', region: 'Lower Tessa', postcode: 'LT4 1RD' },
  { name: 'Ravelstone Works', town: 'Ravelstone', region: 'Lower Tessa', postcode: 'LT8 6NB' },
  { name: 'Orrin Quay Marine Services', town: 'Orrin Quay', region: 'Saltmarch', postcode: 'SM2 5QT' },
  { name: 'Tessmoor Technical College', town: 'Tessmoor', region: 'Lower Tessa', postcode: 'LT1 9CA' },
  { name: 'Quayside Machinery Brokers', town: 'Orrin Quay', region: 'Saltmarch', postcode: 'SM2 8HX' },
  { name: 'Dunholt Used Tools', town: 'Dunholt', region: 'Brenmark', postcode: 'BK5 4JW' },
  { name: 'Tolland Prototype Shop', town: 'Ashfold', region: 'Saltmarch', postcode: 'SM7 3EF' },
  { name: 'Pryce Restoration Garage', town: 'Kellbrook', region: 'Brenmark', postcode: 'BK3 9TT' },
  { name: 'Ostholt College Workshops', town: 'Ostholt', region: 'Lower Tessa', postcode: 'LT6 2AB' },
  { name: 'Waygrade Inspection Office', town: 'Marrowgate', region: 'Brenmark', postcode: 'BK9 1AA' },
] as const;

/** Invented makers and models with their sizes (mm), motor power (kW) and weight on the shortest bed (kg). */
export const LATHE_MODELS = [
  { maker: 'Corvane', model: 'CL-280', kind: 'general_purpose', swingMm: 280, centres: [500, 750], boreMm: 26, motorKw: 1.1, phases: 1, weightKg: 320 },
  { maker: 'Corvane', model: 'CL-330', kind: 'general_purpose', swingMm: 330, centres: [750, 1000], boreMm: 38, motorKw: 2.2, phases: 3, weightKg: 640 },
  { maker: 'Tallis & Wren', model: 'Model 13', kind: 'general_purpose', swingMm: 330, centres: [600, 1000], boreMm: 35, motorKw: 1.5, phases: 3, weightKg: 760 },
  { maker: 'Tallis & Wren', model: 'Model 17 Toolroom', kind: 'toolroom', swingMm: 430, centres: [750], boreMm: 41, motorKw: 3, phases: 3, weightKg: 1450 },
  { maker: 'Oldreth', model: 'T400', kind: 'general_purpose', swingMm: 400, centres: [1000, 1500], boreMm: 52, motorKw: 5.5, phases: 3, weightKg: 1850 },
  { maker: 'Oldreth', model: 'T560', kind: 'general_purpose', swingMm: 560, centres: [1500, 2000, 3000], boreMm: 80, motorKw: 7.5, phases: 3, weightKg: 3100 },
  { maker: 'Vantor', model: 'Meridian 360', kind: 'general_purpose', swingMm: 360, centres: [1000], boreMm: 42, motorKw: 3, phases: 3, weightKg: 1300 },
  { maker: 'Kessmark', model: 'KZ-250 Toolroom', kind: 'toolroom', swingMm: 250, centres: [500], boreMm: 26, motorKw: 0.75, phases: 1, weightKg: 470 },
  { maker: 'Ambrell', model: 'Series 5/460', kind: 'general_purpose', swingMm: 460, centres: [1000, 1500], boreMm: 58, motorKw: 5.5, phases: 3, weightKg: 2300 },
  { maker: 'Ambrell', model: 'Series 9/850', kind: 'general_purpose', swingMm: 850, centres: [3000], boreMm: 105, motorKw: 15, phases: 3, weightKg: 7600 },
] as const;

export const ACCESSORY_SETS = [
  '3-jaw chuck 160 mm, 4-jaw chuck 200 mm, faceplate, fixed and travelling steadies, quick-change tool post',
  '3-jaw chuck 200 mm, faceplate, fixed steady, 4-way tool post, 2-axis DRO, maker’s manual',
  '3-jaw chuck 125 mm, collet closer with 5C collets, quick-change tool post, coolant pump',
  '4-jaw chuck 250 mm, faceplate, fixed steady, taper-turning attachment',
  '3-jaw chuck 160 mm, 4-way tool post, thread-dial indicator, change gears complete',
] as const;

/** Inspection fees by size class, in euro cents (invented). */
export const FEES = [
  { sizeClass: 'small', amountMinor: 39_000 },
  { sizeClass: 'medium', amountMinor: 49_000 },
  { sizeClass: 'large', amountMinor: 69_000 },
] as const;

export const SITE_NOTES = [
  'Ring the yard bell; the machine is in the back bay behind the saw.',
  'Forklift available on site. Three-phase isolator beside the machine.',
  'Access through the side gate on weekdays 7:30–16:00 only.',
  'Ground floor, roller door 3 m wide. Ask for the shop foreman.',
] as const;

export const CANCEL_REASONS = [
  'Machine sold privately before the visit.',
  'Seller withdrew the listing.',
  'Site not accessible on the booked date; seller will request again.',
] as const;

/**
 * Sellers' answers to the disclosure questions (invented). Supply voltage and phases are taken from
 * the machine itself when seeded; each answer set says something the report can set beside its findings.
 */
export const DISCLOSURES = [
  {
    knownFaults: '',
    repairsAndRebuilds: 'New V-belts and a headstock oil change last spring.',
    crashesOrDrops: '',
    usage: 'toolroom-or-maintenance',
    usageNotes: 'One operator; spares for the shop’s own presses.',
    included: 'Everything on the accessory list stays with the machine.',
    saleTerm: 'tested-under-power',
  },
  {
    knownFaults: 'Backlash in the cross-slide screw; the top-slide gib wants adjusting.',
    repairsAndRebuilds: '',
    crashesOrDrops: '',
    usage: 'production',
    usageNotes: 'Two shifts of small-batch shafts until last year.',
    included: 'Chucks and steadies as listed; the coolant tank is not included.',
    saleTerm: 'as-is',
  },
  {
    knownFaults: '',
    repairsAndRebuilds: 'Bed reground and carriage re-scraped by a rebuilder about ten years ago.',
    crashesOrDrops: '',
    usage: 'training',
    usageNotes: 'Apprentice workshop, light cuts only.',
    included: 'Everything on the accessory list stays with the machine.',
    saleTerm: 'reconditioned',
  },
  {
    knownFaults: '',
    repairsAndRebuilds: '',
    crashesOrDrops: 'The carriage ran into the chuck once; nothing was found wrong at the time.',
    usage: 'hobby',
    usageNotes: 'Weekend use in a home garage.',
    included: 'Only the 3-jaw chuck and the tool post; the rest is sold separately.',
    saleTerm: 'as-is',
  },
] as const;

/**
 * What comes with the machine, one set per answer set above (invented replacement costs, euro cents).
 * "missing" marks an item the machine should have and lacks, so its replacement is a cost to the buyer.
 */
export const INCLUSION_SETS = [
  [
    { kind: 'chuck', description: '3-jaw chuck, 160 mm', condition: 'good', replacementCostMinor: 42_000 },
    { kind: 'faceplate', description: 'Faceplate, 300 mm', condition: 'usable', replacementCostMinor: 18_000 },
    { kind: 'steady-rest', description: 'Fixed steady', condition: 'good', replacementCostMinor: 35_000 },
    { kind: 'tool-post', description: 'Quick-change tool post with 5 holders', condition: 'good', replacementCostMinor: 48_000 },
  ],
  [
    { kind: 'chuck', description: '3-jaw chuck, 200 mm', condition: 'usable', replacementCostMinor: 55_000 },
    { kind: 'steady-rest', description: 'Fixed steady', condition: 'worn', replacementCostMinor: 35_000 },
    { kind: 'travelling-rest', description: 'Travelling steady', condition: 'missing', replacementCostMinor: 28_000 },
    { kind: 'dro', description: 'Two-axis digital readout', condition: 'usable', replacementCostMinor: 90_000 },
  ],
  [
    { kind: 'chuck', description: '3-jaw chuck, 125 mm', condition: 'good', replacementCostMinor: 32_000 },
    { kind: 'collets', description: '5C collets, 20 sizes, with closer', condition: 'usable', replacementCostMinor: 60_000 },
    { kind: 'manuals', description: 'Maker’s manual and parts list', condition: 'good', replacementCostMinor: null },
  ],
  [
    { kind: 'chuck', description: '3-jaw chuck, 160 mm', condition: 'worn', replacementCostMinor: 42_000 },
    { kind: 'tool-post', description: '4-way tool post', condition: 'usable', replacementCostMinor: 15_000 },
  ],
] as const;
