import type { ReleaseFacts } from '@/lib/decision/release-facts';
import type { ScoringResult } from '@/lib/scoring';
import { DisclosureBlock } from './disclosure-block';
import { LandedCostBlock } from './landed-cost-block';
import { FramedPage, type FrameFacts } from './page-frame';

/** The listing set beside the findings: the seller's claims, then the landed cost. */
export function ClaimsAndLandedCostPage({ facts, result, releasedAt, frame }: { facts: ReleaseFacts | null; result: ScoringResult; releasedAt: Date | null; frame: FrameFacts }) {
  return (
    <FramedPage frame={frame} bookmark="Seller’s claims and landed cost">
      <DisclosureBlock facts={facts} result={result} />
      <LandedCostBlock facts={facts} result={result} releasedAt={releasedAt} />
    </FramedPage>
  );
}
