import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import sharp from 'sharp';
import { beforeAll, describe, expect, it } from 'vitest';
import { scoreSurvey, type ComparableSale, type ScoringResult } from '@/lib/scoring';
import sales from '@/lib/scoring/examples/sales/comparable-sales.json';
import { renderReportPdf } from './render-report-pdf';
import type { ReportDocumentData } from './report-document-data';

// Text is read back with poppler's pdftotext (Debian poppler-utils, installed by `npm test`).
function pdfToText(pdf: Buffer, layout = false) {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'waygrade-pdf-'));
  const file = path.join(dir, 'report.pdf');
  writeFileSync(file, pdf);
  return execFileSync('pdftotext', [...(layout ? ['-layout'] : []), file, '-'], { encoding: 'utf8' });
}

function pdfPageCount(pdf: Buffer) {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'waygrade-pdf-'));
  const file = path.join(dir, 'report.pdf');
  writeFileSync(file, pdf);
  return Number(/Pages:\s+(\d+)/.exec(execFileSync('pdfinfo', [file], { encoding: 'utf8' }))![1]);
}

const survey = JSON.parse(readFileSync(path.resolve('lib/scoring/examples/worn.json'), 'utf8'));

describe('renderReportPdf', () => {
  let result: ScoringResult;
  let data: ReportDocumentData;
  let pdf: Buffer;
  let text: string;

  beforeAll(async () => {
    result = scoreSurvey(survey, { comparableSales: sales as ComparableSale[] });
    const photo = await sharp({ create: { width: 320, height: 220, channels: 3, background: '#8a8f92' } }).jpeg().toBuffer();
    data = {
      reportId: 4127,
      version: 2,
      verificationCode: 'WG-7K3P-Q9XD-4MRT',
      verificationUrl: 'https://waygrade.example/verify/WG-7K3P-Q9XD-4MRT',
      releasedAt: new Date('2025-06-04T10:00:00Z'),
      machine: {
        maker: 'Oldreth',
        model: 'T400',
        serialNumber: 'OL48213',
        yearBuilt: 1979,
        swingMm: 400,
        betweenCentresMm: 1500,
        spindleBoreMm: 52,
        motorKw: 5.5,
        latheKind: 'general_purpose',
        town: 'Kellbrook',
        region: 'Brenmark',
      },
      inspectorName: 'Ilse Marwick',
      reviewerName: 'Nadia Ferrand',
      releaseFacts: null,
      result,
      photos: [{ section: 'bed', caption: 'Step in the front way near the chuck', image: { data: photo, format: 'jpg' } }],
    };
    pdf = await renderReportPdf(data);
    text = pdfToText(pdf);
  }, 60_000);

  it('writes a PDF with Work Sans embedded', () => {
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    expect(pdf.toString('latin1')).toMatch(/WorkSans-Regular/);
  });

  it('names the machine, its identity and the report version on the cover', () => {
    expect(text).toContain('Oldreth T400');
    expect(text).toContain('serial OL48213');
    expect(text).toContain('1,500 mm');
    expect(text).toContain('No. 4127, version 2');
    expect(text).toContain('Ilse Marwick');
    expect(text).toContain('Nadia Ferrand');
  });

  it('prints the overall grade, every subsystem grade and the confidence', () => {
    // Cut, not rounded, to one decimal: the stored two decimals with the last one dropped (58.46 prints 58.4).
    expect(text).toContain(`Score ${result.overall.score!.toFixed(2).slice(0, -1)} of 100`);
    expect(text).toContain(result.overall.condition!);
    for (const s of result.subsystems) expect(text).toContain(s.label);
    expect(text).toContain(`${Math.round(result.confidence.value * 100)} % of the check weight measured`);
  });

  it('prints each measured check with its measured and permissible figures and band word', () => {
    const layout = pdfToText(pdf, true);
    const straightness = result.checks.find((c) => c.id === 'bed-straightness')!;
    // The check's own row, not a subsystem line that names it as its worst check.
    const line = layout.split('\n').find((l) => l.includes(straightness.label) && !l.includes('score ='))!;
    expect(line).toContain('0.063 mm');
    expect(line).toContain('0.030 mm');
    expect(line).toContain(straightness.bandLabel);
    expect(text).toContain('ISO 1708 G1');
  });

  it('prints the key money figures: repair total and the three values', () => {
    const v = result.valuation.reconciliation!;
    const euros = (minor: number) => `€${Math.round(minor / 100).toLocaleString('en-GB')}`;
    expect(text).toContain(euros(result.repairEstimate.total.amountMinor));
    expect(text).toContain(euros(v.fairMarketValue.amountMinor));
    expect(text).toContain(euros(v.orderlyLiquidationValue.amountMinor));
    expect(text).toContain(euros(v.forcedLiquidationValue.amountMinor));
    expect(text).toContain('replacement cost new (RCN)');
  });

  it('prints the valuation as a signed appraisal: premise, effective date, currency, grid, approaches, statement', () => {
    const v = result.valuation;
    const flat = text.replace(/\s+/g, ' ');
    expect(text).toContain('Premise of value');
    expect(flat).toContain(v.premise.label);
    expect(text).toContain(v.effectiveDate!);
    expect(text).toContain('Sales comparison, the primary approach');
    // every sale on the grid, the outlier named as such
    for (const sale of v.salesComparison!.adjustedPrices) expect(flat).toContain(sale.description.slice(0, 20));
    expect(flat).toContain('outlier, left out');
    expect(text).toContain('Cost approach, by breakdown');
    expect(text).toContain('Reconciliation');
    expect(text).toContain('Statement');
    expect(flat).toContain('its fee does not depend on the value');
  });

  it('carries the verification code, the limits of the inspection, the safety cautions and numbered pages', () => {
    const pages = pdfPageCount(pdf);
    expect(text).toContain('WG-7K3P-Q9XD-4MRT');
    expect(text).toContain('https://waygrade.example/verify/WG-7K3P-Q9XD-4MRT');
    expect(text).toContain('What this inspection can and cannot tell');
    expect(text).toContain('does not replace local codes');
    expect(text).toContain('lock it off');
    expect(text).toContain(`Page 1 of ${pages}`);
    expect(text).toContain(`Page ${pages} of ${pages}`);
    expect(text).toContain('Step in the front way near the chuck');
  });

  it('prints no character the embedded font lacks', () => {
    expect(text).not.toMatch(/[Ω→≥≤√Σ]/);
  });
});
