/**
 * Motor power as found on nameplates: kW, or mechanical horsepower (550 ft·lbf/s = 745.69987 W,
 * the definition used on imperial nameplates) — canonical unit kW.
 */
export const POWER_UNITS = ['kW', 'hp'] as const;
export type PowerUnit = (typeof POWER_UNITS)[number];

export interface Power {
  value: number;
  unit: PowerUnit;
}

const KW_PER_POWER_UNIT: Readonly<Record<PowerUnit, number>> = {
  kW: 1,
  hp: 0.74569987158227022,
};

export function toKilowatts(power: Power): number {
  return power.value * KW_PER_POWER_UNIT[power.unit];
}
