import { describe, expect, it } from 'vitest';
import { checkViscosityGrade, iso3448GradeFor, iso3448Range } from './iso3448';

describe('ISO 3448 viscosity grades', () => {
  it.each([
    // [src: ISO 3448] mid-point ±10 %: VG 32 = 28.8–35.2, VG 68 = 61.2–74.8 mm²/s at 40 °C
    [32, 28.8, 35.2],
    [68, 61.2, 74.8],
    [46, 41.4, 50.6],
    [220, 198, 242],
  ])('gives VG %s the range %s–%s mm²/s', (grade, min, max) => {
    expect(iso3448Range(grade)).toEqual({ min, max });
  });

  it('rejects a number that is not a grade', () => {
    expect(iso3448Range(50)).toBeNull();
  });

  it.each([
    [28.8, 32],
    [35.2, 32],
    [36, null],
    [61.2, 68],
    [57.5, null],
  ])('places %s mm²/s in grade %s', (v, grade) => {
    expect(iso3448GradeFor(v)).toBe(grade);
  });

  it('flags oil outside its declared grade', () => {
    expect(checkViscosityGrade(57.5, 68).withinGrade).toBe(false);
    expect(checkViscosityGrade(66, 68).withinGrade).toBe(true);
  });
});
