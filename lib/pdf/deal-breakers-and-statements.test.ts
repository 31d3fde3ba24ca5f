import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { CONDITION_SCALE, scoreSurvey } from '@/lib/scoring';
import { renderReportPdf } from './render-report-pdf';
import type { ReportDocumentData } from './report-document-data';

// The reading guide may run over a page, so pages 2–4 are read together. Text is read back with poppler's pdftotext (Debian poppler-utils).
function pageText(pdf: Buffer, first: number, last = first) {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'waygrade-pdf-'));
  const file = path.join(dir, 'report.pdf');
  writeFileSync(file, pdf);
  return execFileSync('pdftotext', ['-f', String(first), '-l', String(last), file, '-'], { encoding: 'utf8' });
}

function documentFor(surveyFile: string): ReportDocumentData {
  const survey = JSON.parse(readFileSync(path.resolve(surveyFile), 'utf8'));
  return {
    reportId: 88,
    version: 1,
    verificationCode: 'WG-DEMO-DEAL-0001',
    verificationUrl: 'https://waygrade.example/verify/WG-DEMO-DEAL-0001',
    releasedAt: new Date('2025-06-04T10:00:00Z'),
    machine: {
      maker: 'Hollin',
      model: 'C330',
      serialNumber: 'HC-5521',
      yearBuilt: 1991,
      swingMm: 330,
      betweenCentresMm: 1000,
      spindleBoreMm: 38,
      motorKw: 3,
      latheKind: 'general_purpose',
      town: 'Kellbrook',
      region: 'Brenmark',
    },
    inspectorName: 'Ilse Marwick',
    reviewerName: 'Nadia Ferrand',
    releaseFacts: null,
    result: scoreSurvey(survey),
    photos: [],
  };
}

describe('deal-breakers and the standing statements in the report PDF', () => {
  let whole: string;
  let cover: string;
  let guide: string;
  let plainCover: string;
  let plainGuide: string;

  beforeAll(async () => {
    const pdf = await renderReportPdf(documentFor('lib/scoring/examples/deal-breaker.json'));
    cover = pageText(pdf, 1);
    whole = pageText(pdf, 1, 99);
    guide = pageText(pdf, 2, 4);
    const plain = await renderReportPdf(documentFor('lib/scoring/examples/near-new.json'));
    plainCover = pageText(plain, 1);
    plainGuide = pageText(plain, 2, 4);
  }, 90_000);

  it('puts the deal-breaker above the overall grade on the cover, even for an Excellent machine', () => {
    const at = cover.indexOf('Deal-breaker');
    expect(at).toBeGreaterThan(-1);
    expect(at).toBeLessThan(cover.indexOf('Overall condition'));
    expect(cover).toContain('Broken gear teeth');
    expect(cover).toContain('Two teeth broken on the 60-tooth change gear');
  });

  it('prints no deal-breaker block when none was recorded', () => {
    expect(plainCover).not.toContain('Deal-breaker');
  });

  it('states scope, independence, not a warranty and no advice in every report', () => {
    for (const text of [guide, plainGuide]) {
      expect(text).toContain('Scope:');
      expect(text).toContain('Independence:');
      expect(text).toContain('Not a warranty');
      expect(text).toContain('No advice to buy or not to buy');
    }
  });

  it('prints the written grade scale with each grade\'s meaning', () => {
    for (const g of CONDITION_SCALE) expect(plainGuide).toContain(g.meaning);
  });

  it('lists the areas not inspected with the inspector\'s reason', () => {
    expect(guide).toContain('Not inspected, as the inspector recorded it');
    expect(guide).toContain('No bar stock on site (demo)');
  });

  it('draws the way wear beside the level profile with where the carriage binds', () => {
    // deal-breaker.json: thickest station 25.00 mm, 24.96 mm at 250 mm → 40 µm (arithmetic).
    expect(whole).toContain('Way wear along the bed');
    expect(whole).toContain('deepest 40 µm at 250 mm from the headstock');
    expect(whole).toContain('The locked carriage binds 450 mm from the headstock');
  });
});
