import type { Metadata } from 'next';
import { Pager } from '@/components/data-table/pager';
import { ButtonLink } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { PEOPLE_PAGE_SIZE, listPeople } from '@/db/queries/users';
import { ROLES } from '@/db/schema/users';
import { ACCOUNT_STATE_LOOK } from '@/lib/accounts/account-state';
import { requirePagePermission } from '@/lib/auth/session';
import { ROLE_LABELS } from '@/lib/roles';
import { ACCOUNT_STATES, peopleFiltersSchema } from '@/lib/validation/list-filters';
import { PeopleTable } from './people-table';
import { peopleHref } from './people-url';

export const metadata: Metadata = { title: 'People' };

const CONTROL = 'mt-1 block w-full min-h-touch rounded-lg border border-line-strong bg-paper-raised px-3 text-base';

export default async function PeoplePage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  await requirePagePermission('users.manage');
  const filters = peopleFiltersSchema.parse(await searchParams);
  const { rows, total } = await listPeople(filters);
  const filtered = Boolean(filters.q || filters.role || filters.state);
  const first = (filters.page - 1) * PEOPLE_PAGE_SIZE + 1;

  return (
    <>
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-3xl font-semibold">People</h1>
          <p className="mt-1 text-ink-soft">Everyone with a Waygrade account. Open a person to change their role or deactivate them.</p>
        </div>
        <ButtonLink href="/admin/people/invite">Invite an inspector or coordinator</ButtonLink>
      </div>

      <form method="get" action="/admin/people" role="search" className="mt-6 grid gap-3 rounded-card border border-line bg-paper-raised p-4 sm:grid-cols-[2fr_1fr_1fr_auto] sm:items-end">
        <label className="block">
          <span className="font-medium">Search</span>
          <input name="q" type="search" defaultValue={filters.q ?? ''} placeholder="Name, e-mail or business" className={CONTROL} />
        </label>
        <label className="block">
          <span className="font-medium">Role</span>
          <select name="role" defaultValue={filters.role ?? ''} className={CONTROL}>
            <option value="">All roles</option>
            {ROLES.map((role) => (
              <option key={role} value={role}>
                {ROLE_LABELS[role]}
              </option>
            ))}
          </select>
        </label>
        <label className="block">
          <span className="font-medium">State</span>
          <select name="state" defaultValue={filters.state ?? ''} className={CONTROL}>
            <option value="">Any state</option>
            {ACCOUNT_STATES.map((state) => (
              <option key={state} value={state}>
                {ACCOUNT_STATE_LOOK[state].label}
              </option>
            ))}
          </select>
        </label>
        <input type="hidden" name="sort" value={filters.sort} />
        <input type="hidden" name="dir" value={filters.dir} />
        <button type="submit" className="min-h-touch rounded-lg border border-line-strong bg-paper-sunken px-5 font-medium hover:bg-line">
          Show
        </button>
      </form>

      <div className="mt-6">
        {rows.length === 0 ? (
          <EmptyState
            title={filtered ? 'Nobody matches these filters' : 'No accounts yet'}
            text={filtered ? 'Try a shorter search or another role.' : 'Invite an inspector or a coordinator to get started.'}
          />
        ) : (
          <>
            <PeopleTable rows={rows} filters={filters} />
            <Pager
              page={filters.page}
              hasMore={filters.page * PEOPLE_PAGE_SIZE < total}
              href={(page) => peopleHref(filters, { page })}
              summary={`${first}–${first + rows.length - 1} of ${total}`}
            />
          </>
        )}
      </div>
    </>
  );
}
