import { describe, expect, it } from 'vitest';
import { vibrationClassForMotorPower, vibrationZone } from './vibration-zone';

describe('ISO 10816-1 vibration zones', () => {
  it.each([
    // [src: ISO 10816-1 Annex B] class I boundaries 0.71 / 1.8 / 4.5 mm/s RMS; a boundary value is in the better zone
    [0.71, 'I', 'A'],
    [0.72, 'I', 'B'],
    [1.8, 'I', 'B'],
    [1.81, 'I', 'C'],
    [4.5, 'I', 'C'],
    [4.51, 'I', 'D'],
    // [src: ISO 10816-1 Annex B] class II boundaries 1.12 / 2.8 / 7.1 mm/s RMS
    [1.12, 'II', 'A'],
    [1.13, 'II', 'B'],
    [2.8, 'II', 'B'],
    [2.81, 'II', 'C'],
    [7.1, 'II', 'C'],
    [7.11, 'II', 'D'],
    // [memory: ISO 10816-1 Annex B] classes III and IV
    [11.2, 'III', 'C'],
    [18.1, 'IV', 'D'],
  ] as const)('puts %s mm/s in class %s into zone %s', (v, klass, zone) => {
    expect(vibrationZone(v, klass)).toBe(zone);
  });

  it('takes class I up to 15 kW and class II above', () => {
    // [memory: ISO 10816-1 machine classes]
    expect(vibrationClassForMotorPower(15)).toBe('I');
    expect(vibrationClassForMotorPower(18.5)).toBe('II');
    expect(vibrationClassForMotorPower(undefined)).toBe('I');
  });
});
