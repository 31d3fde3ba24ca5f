/**
 * Subsystems a machine is graded by, with their weight in the overall condition. Weights reflect
 * what a buyer pays for in a manual lathe — the bed and spindle carry the accuracy and are the
 * costly parts to restore (Waygrade rule, common practice).
 */
export const SUBSYSTEMS = [
  'bed-and-ways',
  'spindle-and-headstock',
  'gearbox-and-feeds',
  'slides-and-screws',
  'tailstock',
  'drive',
  'electrical-and-safety',
  'accessories',
] as const;
export type SubsystemId = (typeof SUBSYSTEMS)[number];

export const SUBSYSTEM_TABLE: Readonly<Record<SubsystemId, { label: string; weight: number }>> = {
  'bed-and-ways': { label: 'Bed and ways', weight: 0.24 },
  'spindle-and-headstock': { label: 'Spindle and headstock', weight: 0.24 },
  'gearbox-and-feeds': { label: 'Gearbox and feeds', weight: 0.12 },
  'slides-and-screws': { label: 'Slides and screws', weight: 0.12 },
  tailstock: { label: 'Tailstock', weight: 0.1 },
  drive: { label: 'Drive', weight: 0.05 },
  'electrical-and-safety': { label: 'Electrical and safety', weight: 0.08 },
  accessories: { label: 'Accessories', weight: 0.05 },
};
