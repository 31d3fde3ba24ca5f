import type { PeopleFilters } from '@/lib/validation/list-filters';

/** The people list's address for a set of filters; defaults are left out to keep links short. */
export function peopleHref(filters: PeopleFilters, change: Partial<PeopleFilters> = {}) {
  const next = { ...filters, page: 1, ...change };
  const params = new URLSearchParams();
  if (next.q) params.set('q', next.q);
  if (next.role) params.set('role', next.role);
  if (next.state) params.set('state', next.state);
  if (next.sort !== 'created') params.set('sort', next.sort);
  if (next.dir !== 'desc') params.set('dir', next.dir);
  if (next.page > 1) params.set('page', String(next.page));
  const query = params.toString();
  return query ? `/admin/people?${query}` : '/admin/people';
}
