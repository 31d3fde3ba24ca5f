import { describe, expect, it } from 'vitest';
import { machineFormSchema } from './machine';

const listing = {
  maker: 'Corvane',
  model: 'CL-330',
  serialNumber: 'K-4471',
  latheKind: 'general_purpose',
  swingMm: '330',
  betweenCentresMm: '1000',
  town: 'Kellbrook',
  region: 'Brenmark',
};

describe('machineFormSchema', () => {
  it('accepts an ordinary listing and trims the spaces around its fields', () => {
    const parsed = machineFormSchema.parse({ ...listing, maker: '  Corvane ', town: 'Kellbrook  ' });
    expect(parsed).toMatchObject({ maker: 'Corvane', town: 'Kellbrook' });
  });

  // The values a CSV export or a one-line label could be broken with (line breaks, and the control
  // characters spreadsheet formula injection leads with: OWASP, "CSV Injection").
  it.each([
    ['maker', '=1+2\n'],
    ['maker', '\n=cmd'],
    ['model', 'CL-330\r\nsecond line'],
    ['model', '\t=x'],
    ['town', '\r@x'],
    ['town', 'Kell\u2028brook'],
    ['region', 'Bren\u0000mark'],
    ['serialNumber', 'K-44\u007f71'],
  ])('refuses a %s with a line break or control character (%j) and says why', (field, value) => {
    const result = machineFormSchema.safeParse({ ...listing, [field]: value });
    expect(result.success).toBe(false);
    const issue = result.error!.issues.find((i) => i.path[0] === field);
    expect(issue?.message).toMatch(/on one line/);
  });

  it('keeps a maker that only looks like a formula, on one line, for the export to escape', () => {
    expect(machineFormSchema.parse({ ...listing, maker: '=1+2' }).maker).toBe('=1+2');
  });
});
