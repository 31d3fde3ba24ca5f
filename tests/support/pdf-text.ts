import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';

/** A PDF's text as one line of words, read back with poppler's pdftotext (Debian poppler-utils). */
export function pdfToText(pdf: Buffer): string {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'waygrade-e2e-pdf-'));
  const file = path.join(dir, 'report.pdf');
  writeFileSync(file, pdf);
  return execFileSync('pdftotext', [file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
}
