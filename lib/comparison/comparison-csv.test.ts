import { describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import type { ComparisonRow } from './comparison-row';
import { comparisonCsv } from './comparison-csv';

const grade = { score: 80, grade: 'Very good' as const };
const row = (overrides: Partial<ComparisonRow> = {}): ComparisonRow => ({
  reportId: 7,
  machineId: 3,
  maker: 'Corvane',
  model: 'CL-330',
  kind: 'general_purpose',
  swingMm: 330,
  betweenCentresMm: 1000,
  yearBuilt: 1998,
  town: 'Kellbrook',
  region: 'Brenmark',
  overallCondition: 'Good',
  overallScore: 68,
  confidence: 0.954,
  askingPriceMinor: 640_000,
  priceCurrency: 'EUR',
  hasDetails: true,
  fairMarketValueMinor: 800_000,
  priceToValue: 0.8,
  repairEstimateMinor: 123_450,
  valueCurrency: 'EUR',
  releasedAt: '2026-03-04T16:00:00.000Z',
  subsystems: { bed: grade, spindle: grade, gearbox: grade, slides: grade, tailstock: grade, drive: grade, electrical: grade, accessories: { score: null, grade: null } },
  ...overrides,
});
const parse = (csv: string) => Papa.parse<Record<string, string>>(csv, { header: true }).data;

describe('comparisonCsv', () => {
  it('writes figures as plain numbers with their units in the headers', () => {
    const [line] = parse(comparisonCsv([row()]));
    expect(line).toMatchObject({
      'Swing over bed (mm)': '330',
      'Confidence (%)': '95',
      'Asking price': '6400.00',
      'Fair market value': '8000.00',
      'Price / value': '0.80',
      'Repair estimate': '1234.50',
      'Bed and ways grade': 'Very good',
      'Accessories grade': '',
      'Report released (UTC)': '2026-03-04',
      Details: 'bought',
    });
  });

  it('leaves the report’s figures blank for a report not bought', () => {
    const [line] = parse(comparisonCsv([row({ hasDetails: false, fairMarketValueMinor: null, priceToValue: null, repairEstimateMinor: null })]));
    expect([line!['Fair market value'], line!['Price / value'], line!['Repair estimate'], line!.Details]).toEqual(['', '', '', 'summary only']);
  });

  it('keeps a maker that looks like a spreadsheet formula from running', () => {
    const [line] = parse(comparisonCsv([row({ maker: '=HYPERLINK("x")' })]));
    expect(line!.Maker).toMatch(/^'=/);
  });
});
