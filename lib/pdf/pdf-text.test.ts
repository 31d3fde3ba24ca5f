import { describe, expect, it } from 'vitest';
import { pdfText } from './pdf-text';

describe('pdfText', () => {
  it.each([
    ['18 MΩ', '18 Mohm'],
    ['0.08 Ω', '0.08 ohm'],
    ['= 58.5 → Fair', '= 58.5 gives Fair'],
    ['particles ≥4 µm(c)', 'particles >=4 µm(c)'],
    ['0.02 mm/m ± 10 % at 40 °C × 2', '0.02 mm/m ± 10 % at 40 °C × 2'],
  ])('prints %j as %j', (input, expected) => {
    expect(pdfText(input)).toBe(expected);
  });
});
