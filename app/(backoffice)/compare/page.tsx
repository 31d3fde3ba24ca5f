import type { Metadata } from 'next';
import { Suspense } from 'react';
import { db } from '@/db/client';
import { listComparisonRegions } from '@/db/queries/comparison';
import { listShortlists } from '@/db/queries/shortlists';
import { requirePagePermission } from '@/lib/auth/session';
import { ComparisonWorkspace } from './comparison-workspace';
import { QueryProvider } from './query-provider';

export const metadata: Metadata = { title: 'Compare machines' };

export default async function ComparePage() {
  const user = await requirePagePermission('compare.use');
  const [regions, shortlists] = await Promise.all([listComparisonRegions(db), listShortlists(db, user.id)]);
  return (
    <>
      <p className="text-sm font-semibold uppercase tracking-widest text-copper">Compare</p>
      <h1 className="mt-1 text-3xl font-semibold">Compare inspected machines</h1>
      <p className="mt-2 max-w-3xl text-ink-soft">
        Every lathe with a released Waygrade report, on one scale: sizes, the overall condition and each subsystem’s grade, how much of the
        survey was measured, and the asking price against the estimated value.
      </p>
      {/* The table wants the whole window: break out of the signed-in area's reading width. */}
      <div className="relative left-1/2 mt-6 w-[calc(100vw-2.5rem)] max-w-[120rem] -translate-x-1/2">
        <QueryProvider>
          {/* useSearchParams needs a Suspense boundary when the page is rendered ahead of the request. */}
          <Suspense>
            <ComparisonWorkspace regions={regions} shortlists={shortlists.map((s) => ({ ...s, machines: Number(s.machines) }))} />
          </Suspense>
        </QueryProvider>
      </div>
    </>
  );
}
