import { describe, expect, it } from 'vitest';
import { MAX_IMPORT_ROWS, parseComparableSalesCsv } from './parse-comparable-sales-csv';

const HEADER = 'description,swing_mm,between_centres_mm,year_built,condition,sale_kind,price,currency,sold_on,region,source';

describe('parseComparableSalesCsv', () => {
  it('accepts good rows and reports each bad row with its line and reasons', () => {
    const csv = [
      HEADER,
      'Corvane CL-330 1998,330,1000,1998,Good,auction,8500,EUR,2025-03-14,Brenmark,Valley auction list',
      'Oldreth T400,four hundred,,1985,Good,private,6200,EUR,2025-04-01,,',
      'Kessmark KZ-250,250,500,1990,Shiny,swap,0,EUR,2031-01-01,,',
      '"Tallis & Wren Model 13, toolroom",330,,,,dealer_retail,12000,,2024-11-30,Lower Tessa,',
    ].join('\n');
    const result = parseComparableSalesCsv(csv);
    expect(result.accepted.map((a) => a.line)).toEqual([2, 5]);
    expect(result.accepted[0]!.sale).toMatchObject({ description: 'Corvane CL-330 1998', swingMm: 330, betweenCentresMm: 1000, condition: 'Good', saleKind: 'auction', price: 8500, soldOn: '2025-03-14' });
    expect(result.accepted[1]!.sale).toMatchObject({ description: 'Tallis & Wren Model 13, toolroom', currency: 'EUR', condition: undefined, yearBuilt: undefined });
    expect(result.rejected.map((r) => r.line)).toEqual([3, 4]);
    expect(result.rejected[0]!.errors).toEqual(['swing_mm: Swing over bed in whole mm']);
    expect(result.rejected[1]!.errors.map((e) => e.split(':')[0])).toEqual(['condition', 'sale_kind', 'price', 'sold_on']);
  });

  it('reads headers without regard to case, spaces or units', () => {
    const result = parseComparableSalesCsv('Description,Swing (mm),Sale kind,Price,Sold on\nCorvane CL-280,280,private,5100,2025-01-02');
    expect(result.accepted).toHaveLength(1);
    expect(result.problems).toEqual([]);
  });

  it('refuses a file without the required columns and names them', () => {
    const result = parseComparableSalesCsv('description,price\nA lathe,100');
    expect(result.accepted).toEqual([]);
    expect(result.problems.join(' ')).toMatch(/missing: swingMm, saleKind, soldOn/);
  });

  it('reports a row with too many fields instead of reading it shifted', () => {
    const result = parseComparableSalesCsv(`${HEADER}\nCorvane CL-330,330,1000,1998,Good,auction,8500,EUR,2025-03-14,Brenmark,list,extra`);
    expect(result.accepted).toEqual([]);
    expect(result.rejected[0]!.line).toBe(2);
    expect(result.rejected[0]!.errors[0]).toMatch(/Too many fields/);
  });

  it('refuses more rows than one import takes', () => {
    const rows = Array.from({ length: MAX_IMPORT_ROWS + 1 }, () => 'Corvane CL-280,280,,,,private,5100,EUR,2025-01-02,,');
    const result = parseComparableSalesCsv(`${HEADER}\n${rows.join('\n')}`);
    expect(result.accepted).toEqual([]);
    expect(result.problems.join(' ')).toMatch(/at most 5000/);
  });
});
