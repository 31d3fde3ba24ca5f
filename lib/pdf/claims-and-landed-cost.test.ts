import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import type { ReleaseFacts } from '@/lib/decision/release-facts';
import { scoreSurvey, type ScoringResult } from '@/lib/scoring';
import { renderReportPdf } from './render-report-pdf';
import type { ReportDocumentData } from './report-document-data';
import { reportLandedCost } from './report-landed-cost';

// Text is read back with poppler's pdftotext (Debian poppler-utils, installed by `npm test`).
function pdfToText(pdf: Buffer) {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'waygrade-pdf-'));
  const file = path.join(dir, 'report.pdf');
  writeFileSync(file, pdf);
  return execFileSync('pdftotext', [file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
}

const worn = JSON.parse(readFileSync(path.resolve('lib/scoring/examples/worn.json'), 'utf8'));

const basis: ReleaseFacts['landedCostBasis'] = {
  currency: 'EUR',
  askingPriceMinor: 850_000,
  missingToolingMinor: 55_000,
  weightKg: 1850,
  siteAccess: 'narrow-door-or-steps',
  nameplate: { voltage: 400, phases: 3, motorKw: 5.5 },
};

const facts: ReleaseFacts = {
  disclosure: {
    knownFaults: '',
    repairsAndRebuilds: '',
    crashesOrDrops: '',
    usage: 'toolroom-or-maintenance',
    usageNotes: '',
    supplyVoltage: 400,
    supplyPhases: 3,
    included: '3-jaw chuck, fixed steady',
    saleTerm: 'tested-under-power',
    answeredAt: '2025-05-20T09:00:00.000Z',
  },
  landedCostBasis: basis,
  thermalStates: [
    { section: 'spindle', state: 'warm', source: 'power-run-clock', explanation: 'Read at 08:42 UTC, 42 min after the spindle was started cold at 08:00 UTC (warm from 30 min)', minutesRun: 42, readingsAt: '2025-05-27T08:42:00.000Z' },
    { section: 'bedAndWays', state: 'cold', source: 'inspector', explanation: 'Set by the inspector as cold', minutesRun: null, readingsAt: null },
  ],
};

// The rigging figures are the invented demo rates in lib/decision/rigging-estimate.ts worked by hand;
// the converter size is the common-practice 1.5 × motor rule in lib/decision/phase-converter.ts.
describe('reportLandedCost', () => {
  let result: ScoringResult;
  beforeAll(() => {
    result = scoreSurvey(worn);
  });

  it('adds price, the example move, no converter on the nameplate supply, missing tooling and repairs', () => {
    const { cost, rigging } = reportLandedCost(basis, result, new Date('2025-06-04T10:00:00Z'));
    // handling (350.00 + 120.00 × 1.85 t) × 1.25 narrow access = 715.00; transport 2.50 × 100 km = 250.00.
    expect(rigging?.handling.amountMinor).toBe(71_500);
    expect(rigging?.transport.amountMinor).toBe(25_000);
    expect(result.repairEstimate.total.currency).toBe('EUR');
    expect(cost.total.amountMinor).toBe(850_000 + 96_500 + 0 + 55_000 + result.repairEstimate.total.amountMinor);
    expect(cost.notKnown).toEqual([]);
  });

  it('states the basis: same for every buyer, the release date, the distance and the single-phase converter', () => {
    const { assumptions } = reportLandedCost(basis, result, new Date('2025-06-04T10:00:00Z'));
    const text = assumptions.join(' ');
    expect(text).toContain('Every copy of this report version prints the same figures');
    expect(text).toContain('(2025-06-04)');
    expect(text).toContain('moved 100 km');
    // 1.5 × 5.5 kW = 8.25 kW, so the 11 kW size at €2,900.
    expect(text).toContain('8.25 kW');
    expect(text).toContain('€2,900');
    expect(text).toContain('No buyer’s premium and no tax');
  });

  it('leaves out what is not known and says why', () => {
    const { cost, assumptions } = reportLandedCost({ ...basis, weightKg: null, nameplate: null, missingToolingMinor: null }, result, null);
    expect(cost.notKnown).toEqual(['Rigging and transport', 'Phase converter', 'Missing tooling']);
    expect(cost.total.amountMinor).toBe(850_000 + result.repairEstimate.total.amountMinor);
    expect(assumptions.join(' ')).toContain('no machine weight');
  });

  it('uses no rates or repair figures in another currency', () => {
    const { cost } = reportLandedCost({ ...basis, currency: 'GBP' }, result, null);
    expect(cost.notKnown).toEqual(expect.arrayContaining(['Rigging and transport', 'Repairs the findings call for']));
    expect(cost.total).toEqual({ amountMinor: 850_000 + 55_000, currency: 'GBP' });
  });
});

describe('the printed claims, landed cost and thermal states', () => {
  let result: ScoringResult;
  let text: string;
  let oldText: string;

  beforeAll(async () => {
    result = scoreSurvey(worn);
    const data: ReportDocumentData = {
      reportId: 311,
      version: 1,
      verificationCode: 'WG-CLAI-MSLC-0001',
      verificationUrl: 'https://waygrade.example/verify/WG-CLAI-MSLC-0001',
      releasedAt: new Date('2025-06-04T10:00:00Z'),
      machine: { maker: 'Oldreth', model: 'T400', serialNumber: null, yearBuilt: 1979, swingMm: 400, betweenCentresMm: 1500, spindleBoreMm: 52, motorKw: 5.5, latheKind: 'general_purpose', town: 'Kellbrook', region: 'Brenmark' },
      inspectorName: 'Ilse Marwick',
      reviewerName: 'Nadia Ferrand',
      releaseFacts: facts,
      result,
      photos: [],
    };
    text = pdfToText(await renderReportPdf(data));
    oldText = pdfToText(await renderReportPdf({ ...data, releaseFacts: null }));
  }, 90_000);

  it('prints the seller’s "no known faults" with its contradiction in words and the finding behind it', () => {
    const faulty = result.checks.find((c) => c.band === 'worn' || c.band === 'unfit')!;
    expect(text).toContain('The seller’s claims beside the findings');
    // pdftotext reads the table column by column, so the claim and its mark are found near each other.
    expect(text).toMatch(/Known faults No known faults .{0,40}Contradicted by the findings/);
    expect(text).toContain(`${faulty.label}: ${faulty.bandLabel}`);
    expect(text).toContain('Answers as given on 20 May 2025 and kept with this version at release');
  });

  it('prints the landed cost total and its basis', () => {
    const total = 850_000 + 96_500 + 55_000 + result.repairEstimate.total.amountMinor;
    expect(text).toMatch(new RegExp(`Landed cost .{0,30}€${Math.round(total / 100).toLocaleString('en-GB')}`));
    expect(text).toContain('The basis of these figures');
  });

  it('prints cold or warm beside the readings of each subsystem', () => {
    expect(text).toContain('Spindle read warm:');
    expect(text).toContain('Bed and ways read cold (set by the inspector):');
  });

  it('says so when a version was released before these facts were kept', () => {
    expect(oldText).toContain('released before the seller’s answers were kept');
    expect(oldText).not.toContain('Contradicted by the findings');
  });
});
