/**
 * Slide backlash: either measured directly (indicator on the slide) or counted in dial divisions
 * turned before the slide moves. Cross-slide dials are often engraved in diameter, in which case
 * the slide moves half the engraved value per division.
 */
export type BacklashInput =
  | { method: 'length'; backlashMm: number }
  | { method: 'dial'; divisions: number; graduationMm: number; readsDiameter: boolean };

export function backlashMm(input: BacklashInput): number {
  if (input.method === 'length') return input.backlashMm;
  return input.divisions * input.graduationMm * (input.readsDiameter ? 0.5 : 1);
}
