import 'server-only';
import { mkdir, readFile, rename, writeFile } from 'node:fs/promises';
import path from 'node:path';

/**
 * Rendered reports on local disk under .data/report-pdfs, one file per report version, named by
 * its id, version, random verification code and the renderer's layout: a released version never changes, so an entry
 * never goes stale, and a database that was reset (or another database on the same disk) can
 * never be served a file rendered for a different report that happened to get the same id. Each app server keeps its own
 * cache; that is fine because the files are derived data and any server can render them again.
 */
export type PdfCacheKey = { reportId: number; version: number; verificationCode: string };

/**
 * The layout the renderer prints today. Bump it whenever what a report PDF shows changes (a new
 * page, a new block, a colour): files rendered by an older layout are then never served again.
 * 2: the seller's claims and landed cost page, cold/warm per section, darker faint ink.
 * 3: "1 of 1 check", not "checks".
 * 4: scores cut, not rounded, to one decimal, so none shows across its grade's edge.
 * 5: the valuation as a signed appraisal (premise, effective date, sales grid, statement); repairs split in the landed cost.
 */
export const REPORT_PDF_LAYOUT = 5;

export function pdfCache(dir = path.join(process.cwd(), '.data', 'report-pdfs'), layout = REPORT_PDF_LAYOUT) {
  const fileFor = (key: PdfCacheKey) => path.join(dir, `report-${key.reportId}-v${key.version}-${key.verificationCode.replace(/[^A-Z0-9-]/gi, '')}-layout${layout}.pdf`);
  return {
    async get(key: PdfCacheKey): Promise<Buffer | null> {
      try {
        return await readFile(fileFor(key));
      } catch {
        return null;
      }
    },
    async put(key: PdfCacheKey, pdf: Buffer) {
      await mkdir(dir, { recursive: true });
      // Written aside and renamed, so a reader never sees half a file.
      const temporary = `${fileFor(key)}.${process.pid}.${Date.now()}.tmp`;
      await writeFile(temporary, pdf);
      await rename(temporary, fileFor(key));
    },
  };
}
