import { fmt } from '../format-number';
import { money, type Money } from '../money';
import type { ValuationTables } from './valuation-tables';

/** Replacement cost new for a lathe of this type and size, from the tables, with its working. */
export function replacementCostNew(
  latheType: 'general-purpose' | 'toolroom',
  swingMm: number,
  distanceBetweenCentresMm: number,
  tables: ValuationTables,
): { cost: Money; basis: string } {
  const row = tables.replacementCostNew.find((r) => swingMm <= r.upToSwingMm) ?? tables.replacementCostNew[tables.replacementCostNew.length - 1]!;
  const typeFactor = latheType === 'toolroom' ? tables.toolroomFactor : 1;
  const extraMetres = Math.max(0, distanceBetweenCentresMm / 1000 - 1);
  const lengthFactor = 1 + tables.extraPerMetreBetweenCentresAbove1m * extraMetres;
  const cost = money(row.generalPurposeMinor * typeFactor * lengthFactor, tables.currency);
  const parts = [`${fmt(row.generalPurposeMinor / 100, 2)} ${tables.currency} for swing up to ${Number.isFinite(row.upToSwingMm) ? `${row.upToSwingMm} mm` : 'any size'}`];
  if (typeFactor !== 1) parts.push(`× ${typeFactor} toolroom`);
  if (lengthFactor !== 1) parts.push(`× ${fmt(lengthFactor, 3)} for ${fmt(extraMetres, 2)} m between centres beyond 1 m`);
  return { cost, basis: parts.join(' ') };
}
