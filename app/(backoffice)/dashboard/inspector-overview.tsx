import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { listInspectorJobs } from '@/db/queries/dashboard';
import { formatDateTime } from '@/lib/format';
import { INSPECTION_STATUS_LABELS } from '@/lib/inspection-status';

export async function InspectorOverview({ userId }: { userId: string }) {
  const jobs = await listInspectorJobs(userId);
  return (
    <Card title="Your jobs">
      {jobs.length === 0 ? (
        <EmptyState title="No jobs assigned" text="Inspections the coordinator assigns to you appear here in date order." />
      ) : (
        <ul className="divide-y divide-line">
          {jobs.map((job) => (
            <li key={job.id} className="flex flex-wrap items-baseline justify-between gap-2 py-3">
              <div>
                <p className="font-medium">
                  {job.maker} {job.model}
                </p>
                <p className="text-sm text-ink-soft">{job.town}</p>
              </div>
              <p className="figures text-sm">
                {formatDateTime(job.scheduledAt)} · {INSPECTION_STATUS_LABELS[job.status]}
              </p>
            </li>
          ))}
        </ul>
      )}
    </Card>
  );
}
