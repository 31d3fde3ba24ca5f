/**
 * Way wear from micrometer readings of the way thickness at stations along the bed. The thickest
 * station is taken as the least-worn reference (under the carriage's rarely used far end), so the wear
 * at each station is how much thinner it is than that: a bed worn near the chuck shows a hollow
 * at the headstock end of the profile. Common practice: the thickest point stands in for the
 * original thickness, which is unknown on a used machine.
 */
export interface WayWearPoint {
  xMm: number;
  wearMm: number;
}

export interface WayWear {
  points: WayWearPoint[];
  maxWearMm: number;
  maxWearAtMm: number;
}

export function wayWearProfile(stations: readonly { xMm: number; thicknessMm: number }[]): WayWear | null {
  if (stations.length < 2) return null;
  const sorted = [...stations].sort((a, b) => a.xMm - b.xMm);
  const reference = Math.max(...sorted.map((s) => s.thicknessMm));
  const points = sorted.map((s) => ({ xMm: s.xMm, wearMm: reference - s.thicknessMm }));
  let worst = points[0]!;
  for (const p of points) if (p.wearMm > worst.wearMm) worst = p;
  return { points, maxWearMm: worst.wearMm, maxWearAtMm: worst.xMm };
}
