import { renderToBuffer } from '@react-pdf/renderer';
import { registerReportFonts } from './fonts';
import { ReportDocument } from './report-document';
import type { ReportDocumentData } from './report-document-data';

/** The report as PDF bytes. Deterministic for the same data: the creation date is the release date. */
export async function renderReportPdf(data: ReportDocumentData): Promise<Buffer> {
  registerReportFonts();
  return renderToBuffer(<ReportDocument data={data} />);
}
