/**
 * Tailstock alignment from an indicator run along a test bar between centres. The indicator sits on
 * the carriage at the front (operator side) of the bar; a larger reading means the bar surface is
 * nearer the operator. The difference of the two readings is the horizontal offset of the
 * tailstock end relative to the headstock end over the distance travelled.
 */
export type TailstockMove = 'toward-operator' | 'away-from-operator' | 'none';

export interface TailstockAlignment {
  /** Offset of the tailstock end, mm; positive = toward the operator. */
  offsetMm: number;
  overMm: number;
  /** Which way to move the tailstock body (set-over screws) to bring the centres into line. */
  move: TailstockMove;
  moveByMm: number;
}

export function tailstockAlignmentFromIndicator(
  readingNearHeadstockMm: number,
  readingNearTailstockMm: number,
  distanceMm: number,
): TailstockAlignment {
  const offsetMm = readingNearTailstockMm - readingNearHeadstockMm;
  return {
    offsetMm,
    overMm: distanceMm,
    move: offsetMm > 0 ? 'away-from-operator' : offsetMm < 0 ? 'toward-operator' : 'none',
    moveByMm: Math.abs(offsetMm),
  };
}
