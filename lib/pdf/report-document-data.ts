import type { ReleaseFacts } from '@/lib/decision/release-facts';
import type { ScoringResult } from '@/lib/scoring';

/** A photo ready to print: the image bytes are fetched before rendering, never during it. */
export interface ReportPhoto {
  section: string | null;
  caption: string | null;
  image: { data: Buffer; format: 'jpg' | 'png' };
}

/** Everything the printed report shows; built from one report version and nothing else. */
export interface ReportDocumentData {
  reportId: number;
  version: number;
  verificationCode: string;
  verificationUrl: string;
  releasedAt: Date | null;
  machine: {
    maker: string;
    model: string;
    serialNumber: string | null;
    yearBuilt: number | null;
    swingMm: number;
    betweenCentresMm: number;
    spindleBoreMm: number | null;
    motorKw: number | null;
    latheKind: 'general_purpose' | 'toolroom';
    town: string;
    region: string;
  };
  inspectorName: string | null;
  reviewerName: string | null;
  result: ScoringResult;
  /** The disclosure, landed-cost basis and thermal states kept at release (for a draft, as they stand now); null for versions released before they were kept. */
  releaseFacts: ReleaseFacts | null;
  photos: ReportPhoto[];
}
