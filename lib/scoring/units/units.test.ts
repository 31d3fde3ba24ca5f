import convert from 'convert-units';
import { describe, expect, it } from 'vitest';
import { fromMillimetres, toMillimetres, type LengthUnit } from './length';
import { fromMillimetresPerMetre, toMillimetresPerMetre } from './slope';
import { toKilowatts } from './power';

// Cross-checks against the convert-units package (a general-purpose reference library). Its imperial
// factors carry about 8 significant figures (foot = 1/3.28084 m), so agreement is asked to 1 part in 10⁷;
// the library itself uses the exact 25.4 mm inch.
function expectRelativelyClose(actual: number, expected: number, relative: number) {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(Math.abs(expected) * relative);
}
describe('length units', () => {
  it.each([
    [1, 'in', convert(1).from('in').to('mm')],
    [12.5, 'in', convert(12.5).from('in').to('mm')],
    // thou and tenths are 0.001 in and 0.0001 in (trade usage): checked through convert-units' inch.
    [1, 'thou', convert(0.001).from('in').to('mm')],
    [3, 'tenths', convert(0.0003).from('in').to('mm')],
    // convert-units 2.x has no µm; checked through metres (1 µm = 1e-6 m).
    [7, 'µm', convert(7e-6).from('m').to('mm')],
    [0.02, 'mm', 0.02],
  ] as const)('converts %s %s to the same millimetres as convert-units', (value, unit, expected) => {
    expectRelativelyClose(toMillimetres({ value, unit: unit as LengthUnit }), expected, 1e-7);
  });

  it('round-trips every unit', () => {
    for (const unit of ['mm', 'µm', 'in', 'thou', 'tenths'] as const) {
      expect(fromMillimetres(toMillimetres({ value: 1.234, unit }), unit)).toBeCloseTo(1.234, 12);
    }
  });
});

describe('level sensitivity units', () => {
  it('converts arc-seconds through radians as convert-units does', () => {
    const rad = convert(4.125).from('arcsec').to('rad');
    expect(toMillimetresPerMetre({ value: 4.125, unit: 'arcsec' })).toBeCloseTo(1000 * Math.tan(rad), 9);
  });

  it.each([
    // Worked example: 1 rad = 180/π × 3600″ = 206 264.8″, so 0.02 mm/m = 0.000 02 rad × 206 264.8 = 4.125″,
    // 0.05 mm/m = 10.31″ and 1″ = 1/206 264.8 rad = 4.848 µm/m.
    [0.02, 4.125],
    [0.05, 10.31],
    [0.004848, 1],
  ])('gives %s mm/m as about %s arc-seconds', (mmPerM, arcsec) => {
    expect(fromMillimetresPerMetre(mmPerM, 'arcsec')).toBeCloseTo(arcsec, 2);
  });

  it('converts in/ft with convert-units inch and foot', () => {
    const expected = (convert(0.0005).from('in').to('mm') / convert(1).from('ft').to('mm')) * 1000;
    expectRelativelyClose(toMillimetresPerMetre({ value: 0.0005, unit: 'in/ft' }), expected, 1e-7);
  });
});

describe('motor power units', () => {
  it('converts mechanical horsepower to kW', () => {
    // 1 hp = 550 ft·lbf/s; ft and lbf via convert-units (ft) and standard gravity 9.80665 m/s² (lb → kg).
    const watts = 550 * convert(1).from('ft').to('m') * convert(1).from('lb').to('kg') * 9.80665;
    // convert-units' pound is 0.453592 kg (6 figures), hence 1 part in 10⁶.
    expectRelativelyClose(toKilowatts({ value: 1, unit: 'hp' }), watts / 1000, 1e-6);
  });
});
