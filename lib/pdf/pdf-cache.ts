import 'server-only';
import { mkdir, readFile, rename, writeFile } from 'node:fs/promises';
import path from 'node:path';

/**
 * Rendered reports on local disk under .data/report-pdfs, one file per report id and version. A
 * released version never changes, so an entry never goes stale. Each app server keeps its own
 * cache; that is fine because the files are derived data and any server can render them again.
 */
export function pdfCache(dir = path.join(process.cwd(), '.data', 'report-pdfs')) {
  const fileFor = (reportId: number, version: number) => path.join(dir, `report-${reportId}-v${version}.pdf`);
  return {
    async get(reportId: number, version: number): Promise<Buffer | null> {
      try {
        return await readFile(fileFor(reportId, version));
      } catch {
        return null;
      }
    },
    async put(reportId: number, version: number, pdf: Buffer) {
      await mkdir(dir, { recursive: true });
      // Written aside and renamed, so a reader never sees half a file.
      const temporary = `${fileFor(reportId, version)}.${process.pid}.${Date.now()}.tmp`;
      await writeFile(temporary, pdf);
      await rename(temporary, fileFor(reportId, version));
    },
  };
}
