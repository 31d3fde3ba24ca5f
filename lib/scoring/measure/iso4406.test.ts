import { describe, expect, it } from 'vitest';
import { formatIso4406, iso4406Code, iso4406Range, iso4406ScaleNumber, parseIso4406 } from './iso4406';

describe('ISO 4406 scale numbers', () => {
  it.each([
    // [src: ISO 4406:1999 Table 1] ranges run from above the lower limit up to and including the upper
    [0, 0],
    [0.01, 0],
    [0.011, 1],
    [1.3, 7],
    [1.31, 8],
    [40, 12],
    [40.5, 13],
    [80, 13],
    [80.01, 14],
    [320, 15],
    [321, 16],
    [640, 16],
    [641, 17],
    [1300, 17],
    [1301, 18],
    [2500, 18],
    [2501, 19],
    [2_500_000, 28],
  ])('gives %s particles per mL scale number %s', (count, code) => {
    expect(iso4406ScaleNumber(count)).toBe(code);
  });

  it('codes 2000/500/60 per mL as 18/16/13', () => {
    // [src: ISO 4406:1999 scale-number table] worked example: 2000 per mL lies in >1300–2500 (18),
    // 500 in >320–640 (16), 60 in >40–80 (13).
    expect(formatIso4406(iso4406Code({ atLeast4um: 2000, atLeast6um: 500, atLeast14um: 60 }))).toBe('18/16/13');
  });

  it('marks counts beyond the table as >28', () => {
    expect(formatIso4406(iso4406Code({ atLeast4um: 3_000_000, atLeast6um: 500, atLeast14um: 60 }))).toBe('>28/16/13');
  });

  it.each([
    // [src: ISO 4406:1999 Table 1] 13 = >40–80, 16 = >320–640, 18 = >1300–2500
    [13, 40, 80],
    [16, 320, 640],
    [18, 1300, 2500],
  ])('gives scale number %s the range above %s up to %s', (code, above, upTo) => {
    expect(iso4406Range(code)).toEqual({ above, upTo });
  });

  it('round-trips every scale number through its range', () => {
    for (let code = 1; code <= 28; code++) {
      const { above, upTo } = iso4406Range(code);
      expect(iso4406ScaleNumber(upTo!)).toBe(code);
      expect(iso4406ScaleNumber(above)).toBe(code - 1);
    }
  });

  it('parses a printed code and rejects nonsense', () => {
    expect(parseIso4406('18/16/13')).toEqual({ atLeast4um: 18, atLeast6um: 16, atLeast14um: 13 });
    expect(parseIso4406('18/16')).toBeNull();
    expect(parseIso4406('40/16/13')).toBeNull();
  });
});
