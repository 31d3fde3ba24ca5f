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
  overallProvisional: false,
  confidence: 0.954,
  askingPriceMinor: 640_000,
  priceCurrency: 'EUR',
  hasDetails: true,
  fairMarketValueMinor: 800_000,
  priceToValue: 0.8,
  repairEstimateMinor: 123_450,
  valueCurrency: 'EUR',
  releasedAt: '2026-03-04T16:00:00.000Z',
  landedCostMinor: 863_950,
  landedCostNotKnown: ['phase converter'],
  inclusionsValueMinor: 43_000,
  dealBreakerCount: 2,
  dealBreakers: [
    { id: 'crackedCasting', label: 'Cracked casting (bed, headstock, apron or gearbox)' },
    { id: 'brokenGearTeeth', label: 'Broken gear teeth' },
  ],
  daysListed: 41,
  inspectedOn: '2026-02-20',
  reportAgeDays: 120,
  validUntil: '2026-05-21',
  stale: true,
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

  it('writes the decision columns: landed cost with its unknown parts, deal-breakers in words, days and report currency', () => {
    const [line] = parse(comparisonCsv([row()]));
    expect(line).toMatchObject({
      'Landed cost (at least)': '8639.50',
      'Landed cost parts not known': 'phase converter',
      'Inclusions value': '430.00',
      'Deal-breakers (count)': '2',
      'Deal-breakers': 'Cracked casting (bed, headstock, apron or gearbox); Broken gear teeth',
      'Days listed': '41',
      'Report age (days)': '120',
      'Report current until (UTC)': '2026-05-21',
      'Report stale': 'stale',
    });
  });

  it('says whether the grade is firm or provisional beside it', () => {
    const [firm, provisional] = parse(comparisonCsv([row(), row({ overallProvisional: true })]));
    expect(firm).toMatchObject({ 'Overall condition': 'Good', 'Grade firm or provisional': 'firm' });
    expect(provisional).toMatchObject({ 'Overall condition': 'Good', 'Grade firm or provisional': 'provisional' });
  });

  it('leaves the report’s figures blank for a report not bought', () => {
    const [line] = parse(
      comparisonCsv([row({ hasDetails: false, fairMarketValueMinor: null, priceToValue: null, repairEstimateMinor: null, landedCostMinor: null, landedCostNotKnown: [], inclusionsValueMinor: null, dealBreakers: [] })]),
    );
    expect([line!['Fair market value'], line!['Price / value'], line!['Repair estimate'], line!['Landed cost (at least)'], line!['Inclusions value'], line!['Deal-breakers'], line!.Details]).toEqual([
      '',
      '',
      '',
      '',
      '',
      '',
      'summary only',
    ]);
    expect(line!['Deal-breakers (count)']).toBe('2');
  });

  it('keeps a maker that looks like a spreadsheet formula from running', () => {
    const [line] = parse(comparisonCsv([row({ maker: '=HYPERLINK("x")' })]));
    expect(line!.Maker).toMatch(/^'=/);
  });

  // Cells a spreadsheet may read as a formula start with =, +, -, @, tab or carriage return (OWASP,
  // "CSV Injection"); a leading line feed is escaped too (common practice: nothing is lost by it).
  it.each([
    ['=1+2\n'],
    ['=1+2\r\nsecond line'],
    ['@SUM(A1)\nx'],
    ['\n=cmd'],
    ['\t=x'],
    ['\r@x'],
    ['+1'],
    ['-2'],
    ['-2\n3'],
  ])('escapes the text cell %j on its first character, whatever follows', (value) => {
    const [line] = parse(comparisonCsv([row({ maker: value, model: value, town: value, region: value })]));
    for (const column of ['Maker', 'Model', 'Town', 'Region']) expect(line![column]).toBe(`'${value}`);
  });

  it.each([['Corvane'], ['Kellbrook'], ['CL-330'], ['A=B']])('leaves the ordinary text %j as it is', (value) => {
    const [line] = parse(comparisonCsv([row({ maker: value })]));
    expect(line!.Maker).toBe(value);
  });
});
