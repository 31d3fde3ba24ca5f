'use client';

import { usePathname, useRouter, useSearchParams } from 'next/navigation';
import { useCallback, useMemo } from 'react';

export type ParamPatch = Record<string, string | null | undefined>;

/**
 * The table's filters, sort and page live in the URL (shareable, back-button friendly). Reads the
 * current parameters and writes a patch; any change other than the page itself goes back to page 1.
 */
export function useComparisonUrl() {
  const router = useRouter();
  const pathname = usePathname();
  const searchParams = useSearchParams();
  const queryString = searchParams.toString();
  const params = useMemo(() => Object.fromEntries(new URLSearchParams(queryString)), [queryString]);

  const update = useCallback(
    (patch: ParamPatch) => {
      const next = new URLSearchParams(queryString);
      for (const [key, value] of Object.entries(patch)) {
        if (value === null || value === undefined || value === '') next.delete(key);
        else next.set(key, value);
      }
      if (!('page' in patch)) next.delete('page');
      next.sort();
      const search = next.toString();
      router.replace(search ? `${pathname}?${search}` : pathname, { scroll: false });
    },
    [queryString, pathname, router],
  );

  const clear = useCallback(() => router.replace(pathname, { scroll: false }), [pathname, router]);

  return { params, queryString, update, clear };
}

/** A multi-select parameter as a list (comma-separated in the URL). */
export const listParam = (value: string | undefined) => (value ? value.split(',').filter(Boolean) : []);
export const toggleInList = (value: string | undefined, item: string) => {
  const list = listParam(value);
  const next = list.includes(item) ? list.filter((x) => x !== item) : [...list, item];
  return next.length ? next.join(',') : null;
};
