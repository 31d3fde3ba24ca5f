import { BedProfilePlot } from '@/components/charts/bed-profile-plot';
import { WearProfilePlot } from '@/components/charts/wear-profile-plot';
import { Card } from '@/components/ui/card';
import { assessDisclosure } from '@/lib/decision/disclosure-contradictions';
import type { ReleaseFacts } from '@/lib/decision/release-facts';
import { AREA_LABELS, type ScoringResult } from '@/lib/scoring';
import { DealBreakersPanel } from '../../../reports/[id]/deal-breakers-panel';
import { DisclosurePanel } from '../../../reports/[id]/disclosure-panel';

/** Deal-breakers first, whatever the grade: the reviewer sees them before anything else. */
export function ReviewDealBreakers({ result }: { result: ScoringResult }) {
  return <DealBreakersPanel dealBreakers={result.dealBreakers ?? []} showsFindings />;
}

/** What the inspector set aside, with the reason recorded on site. */
export function NotInspectedCard({ result }: { result: ScoringResult }) {
  const items = result.notInspected ?? [];
  return (
    <Card title={`Not inspected (${items.length})`} className="mt-6">
      {items.length === 0 ? (
        <p className="text-ink-soft">Everything in the survey was inspected.</p>
      ) : (
        <ul className="divide-y divide-line" data-testid="not-inspected">
          {items.map((n) => (
            <li key={n.id} className="grid gap-1 py-2 sm:grid-cols-[16rem_1fr]">
              <span className="font-medium">{n.id.startsWith('area:') ? (AREA_LABELS[n.id.slice(5)] ?? n.label) : n.label}</span>
              <span className="text-ink-soft">{n.reason}</span>
            </li>
          ))}
        </ul>
      )}
    </Card>
  );
}

/** The seller's claims against the findings: as a release would keep them now, or as kept with a released version. */
export function ReviewDisclosure({ facts, result, stage }: { facts: ReleaseFacts; result: ScoringResult; stage: 'review' | 'released' }) {
  const disclosure = facts.disclosure;
  return (
    <DisclosurePanel
      assessments={disclosure ? assessDisclosure(disclosure, result, facts.landedCostBasis.nameplate) : null}
      answeredOn={disclosure ? new Date(disclosure.answeredAt) : null}
      keptWithVersion
      stage={stage}
    />
  );
}

/** The level profile and the way wear on one mm axis from the headstock, side by side. */
export function BedPlotsCard({ result }: { result: ScoringResult }) {
  const profile = result.plots.bedProfile;
  const wear = result.plots.bedWear ?? null;
  if (!profile && !wear) return null;
  const xMaxMm = profile ? Math.max(...profile.points.map((p) => p.x)) : undefined;
  return (
    <Card title="Bed: level profile and way wear" className="mt-6">
      <div className="grid gap-6 lg:grid-cols-2">
        {profile ? <BedProfilePlot series={profile} /> : <p className="text-ink-soft">No level readings along the bed.</p>}
        {wear ? <WearProfilePlot series={wear} xMaxMm={xMaxMm} /> : <p className="text-ink-soft">No way thickness or carriage-lock readings.</p>}
      </div>
    </Card>
  );
}
