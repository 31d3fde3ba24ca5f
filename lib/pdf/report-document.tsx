import { Document } from '@react-pdf/renderer';
import { ClaimsAndLandedCostPage } from './claims-and-landed-cost-page';
import { CoverPage } from './cover-page';
import { LimitsPage } from './limits-page';
import type { FrameFacts } from './page-frame';
import { PhotosPage } from './photos-page';
import { ReadingGuidePage } from './reading-guide-page';
import { RepairsValuationPage } from './repairs-valuation-page';
import type { ReportDocumentData } from './report-document-data';
import { SubsystemPage } from './subsystem-page';

/** The printed condition report: cover, reading guide, one page per subsystem, photos, money, the seller's claims and landed cost, limits. */
export function ReportDocument({ data }: { data: ReportDocumentData }) {
  const title = `${data.machine.maker} ${data.machine.model}`;
  const frame: FrameFacts = {
    machineTitle: data.machine.serialNumber ? `${title}, serial ${data.machine.serialNumber}` : title,
    reportLabel: `Report ${data.reportId} · version ${data.version}`,
    verificationCode: data.verificationCode,
    verificationUrl: data.verificationUrl,
  };
  const subsystems = data.result.subsystems;
  return (
    <Document
      title={`Waygrade condition report: ${frame.machineTitle}, version ${data.version}`}
      author="Waygrade"
      subject={`Measured condition report ${data.verificationCode}`}
      creator="Waygrade"
      producer="Waygrade"
      language="en-GB"
      creationDate={data.releasedAt ?? undefined}
    >
      <CoverPage data={data} frame={frame} />
      <ReadingGuidePage result={data.result} frame={frame} />
      {subsystems.map((s, i) => (
        <SubsystemPage key={s.id} subsystem={s} position={i + 1} count={subsystems.length} data={data} frame={frame} />
      ))}
      <PhotosPage photos={data.photos} frame={frame} />
      <RepairsValuationPage result={data.result} frame={frame} signers={{ inspectorName: data.inspectorName, reviewerName: data.reviewerName, releasedAt: data.releasedAt }} />
      <ClaimsAndLandedCostPage facts={data.releaseFacts} result={data.result} releasedAt={data.releasedAt} frame={frame} />
      <LimitsPage data={data} frame={frame} />
    </Document>
  );
}
