import type { AuditFilters } from '@/lib/validation/list-filters';

export function auditHref(filters: AuditFilters, change: Partial<AuditFilters> = {}) {
  const next = { ...filters, page: 1, ...change };
  const params = new URLSearchParams();
  for (const key of ['actor', 'entity', 'entityId', 'from', 'to'] as const) {
    const value = next[key];
    if (value) params.set(key, value);
  }
  if (next.page > 1) params.set('page', String(next.page));
  const query = params.toString();
  return query ? `/admin/audit?${query}` : '/admin/audit';
}
