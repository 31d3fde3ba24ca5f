import { describe, expect, it } from 'vitest';
import { reportDownloadFilename } from './download-filename';

describe('reportDownloadFilename', () => {
  it.each([
    [{ maker: 'Oldreth', model: 'T400', serialNumber: 'OL48213', version: 2 }, 'waygrade-oldreth-t400-ol48213-v2.pdf'],
    [{ maker: 'Tallis & Wren', model: 'Model 17 Toolroom', serialNumber: 'TA-1182', version: 1 }, 'waygrade-tallis-and-wren-model-17-toolroom-ta-1182-v1.pdf'],
    [{ maker: 'Ambrell', model: 'Series 9/850', serialNumber: null, version: 3 }, 'waygrade-ambrell-series-9-850-v3.pdf'],
    [{ maker: 'Kessmärk "Präzision"', model: 'KZ 250', serialNumber: ' 77/03 ', version: 1 }, 'waygrade-kessmark-prazision-kz-250-77-03-v1.pdf'],
  ])('names %o as %s', (report, expected) => {
    expect(reportDownloadFilename(report)).toBe(expected);
  });
});
