import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { ButtonLink } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { db } from '@/db/client';
import { findInspectionWithMachine, findSurvey } from '@/db/queries/surveys';
import { findLatestStatusEvent } from '@/db/queries/inspections';
import { requirePageSession } from '@/lib/auth/session';
import { formatDateTime, formatMm } from '@/lib/format';
import { INSPECTION_STATUS_LABELS } from '@/lib/inspection-status';
import { can } from '@/lib/roles';
import { sectionsStarted } from '@/lib/survey/section-progress';
import { SURVEY_SECTIONS } from '@/lib/survey/survey-sections';
import { StartVisitButton } from './start-visit-button';

export const metadata: Metadata = { title: 'Job' };

export default async function JobPage({ params, searchParams }: { params: Promise<{ inspectionId: string }>; searchParams: Promise<{ submitted?: string }> }) {
  const user = await requirePageSession();
  const inspectionId = Number((await params).inspectionId);
  if (!can(user.role, 'survey.edit.assigned') || !Number.isInteger(inspectionId)) notFound();
  const job = await findInspectionWithMachine(db, inspectionId);
  if (!job || job.inspectorId !== user.id) notFound();
  const survey = await findSurvey(db, inspectionId);
  const started = survey ? sectionsStarted(survey.data).length : 0;
  const justSubmitted = (await searchParams).submitted === '1' && job.status === 'in_review';
  const latest = job.status === 'on_site' ? await findLatestStatusEvent(job.id) : null;
  const sentBack = latest && (latest.fromStatus === 'in_review' || latest.fromStatus === 'released') ? latest : null;

  return (
    <div className="mx-auto flex max-w-2xl flex-col gap-5">
      <Link href="/jobs" className="flex min-h-touch items-center font-medium text-ink-soft hover:text-ink">
        ← My jobs
      </Link>
      <header>
        <p className="text-sm font-semibold uppercase tracking-widest text-copper">{INSPECTION_STATUS_LABELS[job.status]}</p>
        <h1 className="text-3xl font-semibold leading-tight">
          {job.maker} {job.model}
        </h1>
        <p className="figures text-ink-soft">
          {job.town}, {job.region} · {formatDateTime(job.scheduledAt)}
        </p>
      </header>
      {justSubmitted ? (
        <div role="status" className="rounded-card border-2 border-band-true bg-paper-raised p-4">
          <p className="text-lg font-semibold">Survey submitted — thank you.</p>
          <p className="text-ink-soft">It has been scored and is waiting for the coordinator’s review. It can no longer be changed from your phone.</p>
        </div>
      ) : null}
      {sentBack ? (
        <div role="status" className="rounded-card border-2 border-copper bg-copper-light/40 p-4">
          <p className="text-lg font-semibold">{sentBack.fromStatus === 'released' ? 'Reopened for a correction' : 'Sent back by the coordinator'}</p>
          <p className="mt-1">{sentBack.note}</p>
          <p className="figures mt-1 text-sm text-ink-soft">{formatDateTime(sentBack.createdAt)} UTC · your readings are kept as you left them</p>
        </div>
      ) : null}
      <Card title="The machine">
        <dl className="figures grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
          <dt className="text-ink-soft">Swing over bed</dt>
          <dd>{formatMm(job.swingMm)}</dd>
          <dt className="text-ink-soft">Between centres</dt>
          <dd>{formatMm(job.betweenCentresMm)}</dd>
          <dt className="text-ink-soft">Serial</dt>
          <dd>{job.serialNumber ?? '—'}</dd>
          <dt className="text-ink-soft">Year</dt>
          <dd>{job.yearBuilt ?? '—'}</dd>
        </dl>
      </Card>
      <Card title="On site">
        <p>{job.siteAccessNotes ?? 'No access notes.'}</p>
        {job.siteContactName ? (
          <p className="mt-2">
            Contact: {job.siteContactName}
            {job.siteContactPhone ? (
              <>
                {' · '}
                <a href={`tel:${job.siteContactPhone.replace(/\s/g, '')}`} className="figures inline-flex min-h-touch items-center font-semibold text-copper-dark underline">
                  {job.siteContactPhone}
                </a>
              </>
            ) : null}
          </p>
        ) : null}
      </Card>
      {job.status === 'booked' ? <StartVisitButton inspectionId={job.id} /> : null}
      {job.status === 'on_site' ? (
        <div className="flex flex-col gap-2">
          <p className="figures text-ink-soft">
            {started} of {SURVEY_SECTIONS.length} sections started{survey ? ` · saved version ${survey.version}` : ''}
          </p>
          <ButtonLink href={`/jobs/${job.id}/survey`} className="min-h-[56px] text-lg">
            {started > 0 ? 'Continue the survey' : 'Open the survey'}
          </ButtonLink>
        </div>
      ) : null}
      {job.status === 'in_review' && !justSubmitted ? <p className="rounded-card bg-paper-sunken p-4">Submitted and waiting for the coordinator’s review.</p> : null}
    </div>
  );
}
