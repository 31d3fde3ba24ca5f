import { describe, expect, it } from 'vitest';
import { changedSinceReport, changeNoteFor, parseMachineSnapshot, snapshotOf, type MachineSnapshot } from './machine-snapshot';

const released: MachineSnapshot = {
  machineType: 'centre_lathe',
  latheKind: 'general_purpose',
  maker: 'Harrowgate',
  model: 'HL 460',
  serialNumber: 'HG-20417',
  yearBuilt: 1988,
  swingMm: 460,
  betweenCentresMm: 1500,
  spindleBoreMm: 52,
  sizeClass: 'medium',
  motorKw: 5.5,
  supplyVoltage: 400,
  supplyPhases: 3,
  town: 'Lowmarsh',
  region: 'North Vale',
  askingPriceMinor: 640_000,
  currency: 'EUR',
  accessories: 'Three-jaw chuck, steady',
};

describe('changedSinceReport', () => {
  it('finds nothing when the listing still says what the report says', () => {
    expect(changedSinceReport(released, { ...released })).toEqual([]);
  });

  it.each([
    ['swingMm', { swingMm: 500 }, 'Listing now says 500 mm — changed since the report'],
    ['betweenCentresMm', { betweenCentresMm: 2000 }, 'Listing now says 2,000 mm — changed since the report'],
    ['yearBuilt', { yearBuilt: null }, 'Listing now says not known — changed since the report'],
    ['serialNumber', { serialNumber: 'HG-99999' }, 'Listing now says HG-99999 — changed since the report'],
    ['maker', { maker: 'Other works' }, 'Listing now says Other works — changed since the report'],
    ['askingPriceMinor', { askingPriceMinor: 590_000 }, 'Listing now says €5,900 — changed since the report'],
    ['latheKind', { latheKind: 'toolroom' as const }, 'Listing now says toolroom centre lathe — changed since the report'],
  ] as const)('says in words that %s changed, keeping the released value', (key, edit, note) => {
    const changes = changedSinceReport(released, { ...released, ...edit });
    expect(changes).toHaveLength(1);
    expect(changes[0]).toMatchObject({ key, note });
    expect(changeNoteFor(changes, key)).toBe(note);
    expect(changes[0]!.released).not.toBe(changes[0]!.now);
  });

  it('reports every sealed fact that changed, one note each', () => {
    const live = { ...released, maker: 'X', model: 'Y', serialNumber: null, swingMm: 300, spindleBoreMm: null, motorKw: 3, supplyVoltage: 230, supplyPhases: 1, town: 'T', region: 'R', accessories: null };
    expect(changedSinceReport(released, live).map((c) => c.key)).toEqual([
      'maker',
      'model',
      'serialNumber',
      'swingMm',
      'spindleBoreMm',
      'motorKw',
      'supplyVoltage',
      'supplyPhases',
      'town',
      'region',
      'accessories',
    ]);
  });
});

describe('snapshotOf', () => {
  it('reads the decimal motor power the database hands back as a number and drops listing columns the report does not state', () => {
    const snapshot = snapshotOf({ ...released, motorKw: '5.50', description: 'freshly painted' } as never);
    expect(snapshot.motorKw).toBe(5.5);
    expect(snapshot).not.toHaveProperty('description');
  });

  it('parses the stored copy as MariaDB hands it back (text) and refuses a damaged one', () => {
    expect(parseMachineSnapshot(JSON.stringify(released))).toEqual(released);
    expect(parseMachineSnapshot(null)).toBeNull();
    expect(() => parseMachineSnapshot(JSON.stringify({ ...released, swingMm: 'wide' }))).toThrow();
  });
});
