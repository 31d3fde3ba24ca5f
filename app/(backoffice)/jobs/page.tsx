import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { EmptyState } from '@/components/ui/empty-state';
import { listJobsForInspector } from '@/db/queries/inspector-jobs';
import { requirePageSession } from '@/lib/auth/session';
import { formatDateTime, formatMm } from '@/lib/format';
import { INSPECTION_STATUS_LABELS } from '@/lib/inspection-status';
import { can } from '@/lib/roles';
import { sectionsStarted } from '@/lib/survey/section-progress';
import { SURVEY_SECTIONS } from '@/lib/survey/survey-sections';

export const metadata: Metadata = { title: 'My jobs' };

// On site first (work in hand), then booked visits by date, then those waiting for review.
const STATUS_ORDER = { on_site: 0, booked: 1, in_review: 2 } as const;
const NEXT_STEP = { on_site: 'Continue the survey', booked: 'Open the job', in_review: 'Submitted' } as const;

export default async function JobsPage() {
  const user = await requirePageSession();
  if (!can(user.role, 'survey.edit.assigned')) notFound();
  const jobs = (await listJobsForInspector(user.id)).sort(
    (a, b) => STATUS_ORDER[a.status as keyof typeof STATUS_ORDER] - STATUS_ORDER[b.status as keyof typeof STATUS_ORDER],
  );
  return (
    <div className="mx-auto flex max-w-2xl flex-col gap-5">
      <header>
        <p className="text-sm font-semibold uppercase tracking-widest text-copper">Inspector</p>
        <h1 className="text-3xl font-semibold">My jobs</h1>
      </header>
      {jobs.length === 0 ? (
        <EmptyState title="No jobs assigned" text="Inspections the coordinator assigns to you appear here, on site first, then by date." />
      ) : (
        <ul className="flex flex-col gap-3">
          {jobs.map((job) => {
            const status = job.status as keyof typeof STATUS_ORDER;
            const started = job.surveyData ? sectionsStarted(job.surveyData).length : 0;
            return (
              <li key={job.id}>
                <Link
                  href={status === 'on_site' ? `/jobs/${job.id}/survey` : `/jobs/${job.id}`}
                  className={`flex flex-col gap-1 rounded-card border bg-paper-raised p-4 shadow-sm hover:border-copper ${status === 'on_site' ? 'border-copper border-l-8' : 'border-line'}`}
                >
                  <span className="flex items-baseline justify-between gap-2">
                    <span className="text-lg font-semibold">
                      {job.maker} {job.model}
                    </span>
                    <span className="shrink-0 text-sm font-semibold text-copper-dark">{INSPECTION_STATUS_LABELS[job.status]}</span>
                  </span>
                  <span className="figures text-ink-soft">
                    {job.town} · {formatDateTime(job.scheduledAt)}
                  </span>
                  <span className="figures text-sm text-ink-soft">
                    Swing {formatMm(job.swingMm)} · centres {formatMm(job.betweenCentresMm)}
                    {job.surveyData ? ` · ${started} of ${SURVEY_SECTIONS.length} sections started` : ''}
                  </span>
                  <span className="mt-1 font-semibold text-ink">{NEXT_STEP[status]} →</span>
                </Link>
              </li>
            );
          })}
        </ul>
      )}
    </div>
  );
}
