import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { Card } from '@/components/ui/card';
import { ConditionBadge } from '@/components/ui/condition-badge';
import { findCatalogueReport } from '@/db/queries/reports-catalogue';
import { findingsOf } from '@/lib/decision/report-findings';
import { findReportDecisionFacts } from '@/db/queries/report-decision';
import { findSealedAndLiveMachine } from '@/db/queries/machine-snapshot';
import { changedSinceReport, changeNoteFor, type MachineSnapshot } from '@/lib/reports/machine-snapshot';
import { assessDisclosure } from '@/lib/decision/disclosure-contradictions';
import { missingToolingMinor } from '@/lib/decision/inclusions-value';
import { daysOnMarket, reportCurrency } from '@/lib/decision/report-currency';
import { assessSupply } from '@/lib/decision/phase-converter';
import { findShopSupply } from '@/db/queries/shop-supply';
import { requirePageSession } from '@/lib/auth/session';
import { formatDate, formatMm, formatMoney } from '@/lib/format';
import { can } from '@/lib/roles';
import { DownloadLink } from '../../purchases/download-link';
import { BuyButton } from './buy-button';
import { DealBreakersPanel } from './deal-breakers-panel';
import { ReportStatements } from './report-statements';
import { CurrencyBanner } from './currency-banner';
import { DisclosurePanel } from './disclosure-panel';
import { InclusionsPanel } from './inclusions-panel';
import { LandedCostPanel } from './landed-cost-panel';
import { repairSplitFrom } from '@/lib/decision/repair-split';
import { ReinspectionPanel } from './reinspection-panel';
import { reinspectionOffer } from '@/lib/reinspection/offer';
import { ThermalStatesPanel } from './thermal-states-panel';

export const metadata: Metadata = { title: 'Report summary' };

const LOCKED_CONTENTS = [
  'Every measured check against its permissible value, with its band and the source of the limit',
  'A page per subsystem: bed and ways, spindle, gearbox, slides, tailstock, drive, electrical, accessories',
  'The bed profile and the tailstock alignment, drawn',
  'The inspector’s photos with captions',
  'Repair estimate, line by line',
  'Fair market, orderly and forced liquidation values: premise, effective date, the sales comparison grid and the cost approach, with the working',
  'Inspector, reviewer, dates and a verification code',
];

export default async function ReportSummaryPage({
  params,
  searchParams,
}: {
  params: Promise<{ id: string }>;
  searchParams: Promise<{ checkout?: string; reinspection?: string }>;
}) {
  const user = await requirePageSession();
  const { id } = await params;
  const { checkout, reinspection } = await searchParams;
  const reportId = Number(id);
  const owner = user.role === 'seller';
  if (!Number.isInteger(reportId) || reportId <= 0 || (!can(user.role, 'report.browse') && !owner)) notFound();
  const report = await findCatalogueReport(reportId, user.id);
  if (!report || (owner && report.sellerId !== user.id)) notFound();
  const superseded = report.supersededById !== null;
  const canDownload = report.hasAccess || user.role === 'admin';
  // The findings behind the claims are part of the paid report: shown to those who may read it.
  const showsFindings = canDownload || owner;
  const [facts, readerSupply, machine] = await Promise.all([
    findReportDecisionFacts(report.id),
    showsFindings ? findShopSupply(user.id) : null,
    findSealedAndLiveMachine(report.id),
  ]);
  // What the report states about the machine is the copy sealed at release; where the listing now
  // says otherwise, the sealed value stays and a note says what the listing says today.
  const changes = machine?.sealed ? changedSinceReport(machine.sealed, machine.live) : [];
  const noteFor = (key: keyof MachineSnapshot) => changeNoteFor(changes, key);
  const shownInCard = new Set<keyof MachineSnapshot>(['latheKind', 'swingMm', 'betweenCentresMm', 'yearBuilt', 'askingPriceMinor']);
  const otherChanges = changes.filter((change) => !shownInCard.has(change.key));
  const askingPrice = machine?.sealed ? { minor: machine.sealed.askingPriceMinor, currency: machine.sealed.currency } : { minor: report.askingPriceMinor, currency: report.machineCurrency };
  const findings = facts ? findingsOf(facts.result) : null;
  // The seller's answers as kept with this version at release, not as the listing reads today.
  const kept = facts && showsFindings ? facts.releaseFacts : null;
  const disclosure = kept?.disclosure ?? null;
  const shopSupply = facts ? readerSupply : null;
  const currency = facts ? reportCurrency(facts.inspectedOn ?? report.releasedAt ?? new Date(), new Date(), facts.validityDays) : null;

  return (
    <>
      <p className="text-sm font-semibold uppercase tracking-widest text-copper">Report summary</p>
      <div className="mt-1 flex flex-wrap items-start justify-between gap-4">
        <div>
          <h1 className="text-3xl font-semibold">
            {report.maker} {report.model}
          </h1>
          <p className="figures mt-1 text-ink-soft">
            Version {report.version}, released {formatDate(report.releasedAt)} · {report.town}, {report.region}
          </p>
        </div>
        <ConditionBadge grade={report.overallCondition} provisional={findings?.provisional ?? false} />
      </div>
      {/* Deal-breakers head the summary whatever the grade. */}
      <DealBreakersPanel dealBreakers={findings?.dealBreakers ?? []} showsFindings={showsFindings} />
      {currency ? <CurrencyBanner currency={currency} /> : null}
      {facts && currency && can(user.role, 'reinspection.request') && !superseded ? (
        <ReinspectionPanel
          reportId={report.id}
          machineId={facts.machineId}
          userId={user.id}
          listingStatus={facts.listingStatus}
          offer={reinspectionOffer(currency, new Date())}
          fee={report.feeMinor === null ? null : { amountMinor: report.feeMinor, currency: report.feeCurrency ?? 'EUR' }}
          returnedFromCheckout={reinspection === 'returned'}
        />
      ) : null}
      {reinspection === 'cancelled' ? (
        <p role="status" className="mt-6 rounded-lg border border-line-strong bg-paper-sunken px-4 py-3">
          Re-inspection payment cancelled. Nothing was charged.
        </p>
      ) : null}
      {checkout === 'cancelled' ? (
        <p role="status" className="mt-6 rounded-lg border border-line-strong bg-paper-sunken px-4 py-3">
          Payment cancelled. Nothing was charged; you can buy the report whenever you are ready.
        </p>
      ) : null}
      {superseded ? (
        <p role="status" className="mt-6 rounded-lg border border-band-worn/40 bg-band-worn/10 px-4 py-3 text-band-worn">
          A newer version of this report has been released. Open the machine again from the list to see it.
        </p>
      ) : null}
      <div className="mt-8 grid gap-6 lg:grid-cols-[1fr_1.1fr]">
        <Card title="The machine">
          <dl className="figures grid grid-cols-[auto_1fr] gap-x-6 gap-y-2">
            <dt className="text-ink-soft">Type</dt>
            <dd>
              {report.latheKind === 'toolroom' ? 'Toolroom centre lathe' : 'General-purpose centre lathe'}
              <ChangeNote note={noteFor('latheKind')} />
            </dd>
            <dt className="text-ink-soft">Swing over bed</dt>
            <dd>
              {formatMm(report.swingMm)}
              <ChangeNote note={noteFor('swingMm')} />
            </dd>
            <dt className="text-ink-soft">Between centres</dt>
            <dd>
              {formatMm(report.betweenCentresMm)}
              <ChangeNote note={noteFor('betweenCentresMm')} />
            </dd>
            <dt className="text-ink-soft">Built</dt>
            <dd>
              {report.yearBuilt ?? 'not known'}
              <ChangeNote note={noteFor('yearBuilt')} />
            </dd>
            <dt className="text-ink-soft">{machine?.sealed ? 'Asking price at release' : 'Asking price'}</dt>
            <dd>
              {formatMoney(askingPrice.minor, askingPrice.currency)}
              <ChangeNote note={noteFor('askingPriceMinor')} />
            </dd>
            {facts ? (
              <>
                <dt className="text-ink-soft">Days listed</dt>
                <dd>{daysOnMarket(facts.listedAt, new Date())} days</dd>
              </>
            ) : null}
            {facts && facts.priceHistory.length > 1 ? (
              <>
                <dt className="text-ink-soft">Price history</dt>
                <dd>
                  <ol>
                    {facts.priceHistory.map((p, i) => (
                      <li key={i}>
                        {formatDate(p.changedAt)}: {p.askingPriceMinor === null ? 'offers invited' : formatMoney(p.askingPriceMinor, p.currency)}
                      </li>
                    ))}
                  </ol>
                </dd>
              </>
            ) : null}
            <dt className="text-ink-soft">Overall condition</dt>
            <dd className="font-medium">
              {report.overallCondition}
              {findings?.provisional ? (
                <>
                  , provisional
                  <span className="mt-1 block font-normal text-ink-soft">{findings.provisionalReasons.join(' ')}</span>
                </>
              ) : null}
            </dd>
          </dl>
          {otherChanges.length > 0 ? (
            <div className="mt-4 border-t border-line pt-3 text-sm" data-testid="changed-since-report">
              <p className="font-medium">The listing has changed since this report was released. The report states:</p>
              <ul className="mt-1 space-y-1">
                {otherChanges.map((change) => (
                  <li key={change.key}>
                    {change.label}: {change.released}
                    <ChangeNote note={change.note} />
                  </li>
                ))}
              </ul>
            </div>
          ) : null}
        </Card>
        <section aria-labelledby="locked-heading" className="rounded-card border border-line bg-paper-raised p-5 shadow-sm">
          <h2 id="locked-heading" className="flex items-center gap-2 text-lg font-semibold">
            <svg aria-hidden="true" width="18" height="18" viewBox="0 0 24 24" className="text-copper">
              <rect x="4" y="10" width="16" height="11" rx="2" fill="none" stroke="currentColor" strokeWidth="2" />
              <path d="M8 10V7a4 4 0 0 1 8 0v3" fill="none" stroke="currentColor" strokeWidth="2" />
            </svg>
            {canDownload ? 'The full report' : 'In the full report'}
          </h2>
          <ul className="mt-3 space-y-1.5 text-ink-soft">
            {LOCKED_CONTENTS.map((item) => (
              <li key={item} className="flex gap-2">
                <span aria-hidden="true" className="text-copper">
                  ·
                </span>
                {item}
              </li>
            ))}
          </ul>
          <div className="mt-5">
            {canDownload ? (
              <DownloadLink reportId={report.id} />
            ) : !can(user.role, 'report.buy') ? (
              <p className="text-ink-soft">Your account cannot buy reports.</p>
            ) : superseded ? null : report.feeMinor === null ? (
              <p className="text-ink-soft">The fee for this size of machine is not set yet. Please look again later.</p>
            ) : (
              <>
                <BuyButton reportId={report.id} price={formatMoney(report.feeMinor, report.feeCurrency ?? 'EUR')} />
                <p className="mt-3 text-sm text-ink-soft">
                  Paid through our payment provider. Access is yours as soon as the payment is confirmed, including any later version of this
                  report.
                </p>
              </>
            )}
          </div>
        </section>
      </div>
      {facts && showsFindings ? (
        <DisclosurePanel
          assessments={disclosure ? assessDisclosure(disclosure, facts.result, kept?.landedCostBasis.nameplate ?? null) : null}
          answeredOn={disclosure ? new Date(disclosure.answeredAt) : null}
          keptWithVersion={kept !== null}
        />
      ) : null}
      {facts && showsFindings ? <InclusionsPanel items={facts.inclusions} currency={facts.currency} /> : null}
      {facts && showsFindings ? (
        <LandedCostPanel
          facts={{
            currency: facts.currency,
            askingPriceMinor: facts.askingPriceMinor,
            repairsMinor: facts.repairEstimateMinor,
            repairSplit: facts.repairEstimateMinor === null ? null : repairSplitFrom(facts.result, facts.currency),
            missingToolingMinor: missingToolingMinor(facts.inclusions, facts.currency),
            supply: assessSupply(
              facts.nameplate ? { ...facts.nameplate, motorKw: facts.result.machine.motorPowerKw ?? facts.motorKw } : null,
              shopSupply,
            ),
            weightKg: facts.movingSheet?.weightKg ?? null,
            siteAccess: facts.movingSheet?.siteAccess ?? 'ground-level-wide',
          }}
        />
      ) : null}
      {kept ? <ThermalStatesPanel states={kept.thermalStates} /> : null}
      <ReportStatements notInspected={showsFindings ? (findings?.notInspected ?? null) : null} />
    </>
  );
}

/** The words beside a sealed fact the listing now gives differently. */
function ChangeNote({ note }: { note: string | null }) {
  if (!note) return null;
  return <span className="block text-sm text-band-worn">{note}</span>;
}
