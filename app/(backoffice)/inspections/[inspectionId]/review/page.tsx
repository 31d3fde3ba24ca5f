import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { BandBadge } from '@/components/ui/band-badge';
import { Card } from '@/components/ui/card';
import { StatusPill } from '@/components/ui/status-pill';
import { db } from '@/db/client';
import { getInspection, getReviewBundle } from '@/db/queries/inspections';
import { collectReleaseFacts } from '@/db/queries/release-facts';
import { parseReleaseFacts } from '@/lib/decision/release-facts';
import { requirePageSession } from '@/lib/auth/session';
import { publicFileUrl } from '@/lib/storage/file-url';
import { formatDateTime, formatMoney } from '@/lib/format';
import { can, mayTransition } from '@/lib/roles';
import type { ScoringResult } from '@/lib/scoring';
import { ReviewActions } from './review-actions';
import { BedPlotsCard, NotInspectedCard, ReviewDealBreakers, ReviewDisclosure } from './review-findings';
import { SurveyReadings } from './survey-readings';
import { shownScore } from '@/lib/scoring/grading/condition-scale';

export const metadata: Metadata = { title: 'Review' };

export default async function ReviewPage({ params }: { params: Promise<{ inspectionId: string }> }) {
  const user = await requirePageSession();
  if (!can(user.role, 'report.review')) notFound();
  const id = Number((await params).inspectionId);
  const inspectionBundle = Number.isInteger(id) ? await getInspection(id) : null;
  if (!inspectionBundle) notFound();
  const { inspection, machine } = inspectionBundle;
  const { report, survey, photos } = await getReviewBundle(id);
  const result = report?.result as ScoringResult | undefined;
  // A released version shows the copy kept with it; a draft what releasing it would keep now.
  const kept = report && report.status !== 'draft' ? parseReleaseFacts(report.releaseFacts) : null;
  const facts = kept ?? (result && report?.status === 'draft' ? await collectReleaseFacts(db, { machineId: machine.id, inspectionId: inspection.id, motorPowerKw: result.machine.motorPowerKw }) : null);

  const decisions = [
    ...(report?.status === 'draft' && mayTransition(user.role, inspection.status, 'released') ? (['release'] as const) : []),
    ...(inspection.status === 'in_review' && mayTransition(user.role, 'in_review', 'on_site') ? (['send-back'] as const) : []),
    ...(inspection.status === 'released' && mayTransition(user.role, 'released', 'on_site') ? (['reopen'] as const) : []),
  ];
  const lastNote = inspectionBundle.events.filter((e) => e.note).at(-1);

  return (
    <>
      <p className="text-sm font-semibold uppercase tracking-widest text-copper">
        <Link href={`/inspections/${inspection.id}`} className="hover:underline">
          Inspection #{inspection.id}
        </Link>{' '}
        · review
      </p>
      <div className="mt-1 flex flex-wrap items-center justify-between gap-3">
        <h1 className="text-3xl font-semibold">
          {machine.maker} {machine.model}
        </h1>
        <StatusPill status={inspection.status} />
      </div>

      {!report || !result ? (
        <Card className="mt-6">
          <p>No graded draft yet: the inspector has not submitted the survey.</p>
        </Card>
      ) : (
        <>
          <ReviewDealBreakers result={result} />
          <section aria-label="Summary" className="mt-6 grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
            <Stat label="Overall condition" value={result.provisional ? `${report.overallCondition}, provisional` : report.overallCondition} sub={`score ${report.overallScore} of 100`} />
            <Stat label="Confidence" value={`${Math.round(Number(report.confidence) * 100)} %`} sub={`${result.confidence.measuredChecks} of ${result.confidence.totalChecks} checks measured`} />
            <Stat label="Repair estimate" value={formatMoney(report.repairEstimateMinor, report.currency)} sub={`${result.repairEstimate.lines.length} repair actions`} />
            <Stat label="Fair market value" value={formatMoney(report.fairMarketValueMinor, report.currency)} sub={`version ${report.version} · ${report.status}`} />
          </section>

          {result.safetyFindings.length > 0 ? (
            <div role="alert" className="mt-4 rounded-card border-2 border-band-rebuild bg-band-rebuild/5 p-4">
              <p className="font-semibold text-band-rebuild">⚠ Fix before use</p>
              <ul className="mt-1 list-disc pl-5">
                {result.safetyFindings.map((f) => (
                  <li key={f.checkId}>{f.message}</li>
                ))}
              </ul>
            </div>
          ) : null}

          <NotInspectedCard result={result} />
          {facts ? <ReviewDisclosure facts={facts} result={result} stage={report.status === 'draft' ? 'review' : 'released'} /> : null}
          <BedPlotsCard result={result} />

          <div className="mt-6 grid gap-6 xl:grid-cols-[3fr_2fr]">
            <div className="space-y-6">
              <Card title="Subsystems">
                <table className="w-full text-left">
                  <tbody className="divide-y divide-line">
                    {result.subsystems.map((s) => (
                      <tr key={s.id}>
                        <th scope="row" className="py-2 pr-3 font-medium">
                          {s.label}
                        </th>
                        <td className="figures py-2 pr-3">{s.score === null ? '—' : shownScore(s.score)}</td>
                        <td className="py-2 pr-3">{s.grade ?? 'Not graded'}</td>
                        <td className="figures py-2 text-sm text-ink-soft">
                          {s.measuredChecks}/{s.totalChecks} measured
                        </td>
                      </tr>
                    ))}
                  </tbody>
                </table>
              </Card>
              <Card title="Checks">
                <ul className="divide-y divide-line">
                  {result.checks.map((check) => (
                    <li key={check.id} className="py-2.5">
                      <details>
                        <summary className="flex min-h-touch cursor-pointer flex-wrap items-center justify-between gap-2">
                          <span className="font-medium">{check.label}</span>
                          <span className="flex items-center gap-3">
                            <span className="figures text-sm text-ink-soft">
                              {check.measured ? `${check.measured.text ?? `${check.measured.value} ${check.measured.unit}`}` : 'not measured'}
                              {check.permissible ? ` · limit ${check.permissible.value} ${check.permissible.unit}` : ''}
                            </span>
                            <BandBadge band={check.band} size="sm" />
                          </span>
                        </summary>
                        <p className="mt-2 text-sm">{check.explanation.text}</p>
                        <p className="mt-1 text-sm text-ink-soft">Source: {check.explanation.source}</p>
                      </details>
                    </li>
                  ))}
                </ul>
              </Card>
            </div>
            <div className="space-y-6">
              <Card title="Decision">
                {lastNote ? (
                  <p className="mb-4 rounded-lg bg-paper-sunken p-3 text-sm">
                    Last note ({formatDateTime(lastNote.createdAt)}): {lastNote.note}
                  </p>
                ) : null}
                {/* Always mounted, so the outcome of a decision stays on screen after the page refreshes without its buttons. */}
                <ReviewActions inspectionId={inspection.id} reportId={report.id} decisions={[...decisions]} />
              </Card>
              <Card title={`Photos (${photos.length})`}>
                {photos.length === 0 ? (
                  <p className="text-ink-soft">No photos were taken.</p>
                ) : (
                  <ul className="grid grid-cols-2 gap-3">
                    {photos.map((photo) => (
                      <li key={photo.id}>
                        <a href={publicFileUrl(photo.displayKey ?? photo.fileKey)} target="_blank" rel="noreferrer" className="block">
                          {/* Thumbnails come from the upload service, already sized; next/image would resize them again. */}
                          {/* eslint-disable-next-line @next/next/no-img-element */}
                          <img src={publicFileUrl(photo.thumbKey ?? photo.fileKey)} alt={photo.caption ?? `Photo of ${photo.section}`} className="aspect-[4/3] w-full rounded-lg border border-line object-cover" loading="lazy" />
                        </a>
                        <p className="mt-1 text-sm text-ink-soft">{photo.caption ?? photo.section}</p>
                      </li>
                    ))}
                  </ul>
                )}
              </Card>
              <Card title="Readings as entered">
                {survey ? <SurveyReadings data={survey.data as Record<string, unknown>} thermalStates={facts?.thermalStates} /> : <p>No survey.</p>}
                {survey ? <p className="figures mt-3 text-sm text-ink-soft">Survey version {survey.version}, format v{survey.formatVersion}, scored with library {report.scoringVersion}</p> : null}
              </Card>
            </div>
          </div>
        </>
      )}
    </>
  );
}

function Stat({ label, value, sub }: { label: string; value: string; sub: string }) {
  return (
    <div className="rounded-card border border-line bg-paper-raised p-4">
      <p className="text-sm text-ink-soft">{label}</p>
      <p className="figures mt-1 text-2xl font-semibold">{value}</p>
      <p className="figures text-sm text-ink-soft">{sub}</p>
    </div>
  );
}
