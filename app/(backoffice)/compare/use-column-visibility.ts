'use client';

import { useCallback, useMemo, useSyncExternalStore } from 'react';
import type { VisibilityState } from '@tanstack/react-table';

// Column visibility is a reading preference of this browser, not part of a view to share: it is
// kept in localStorage rather than in the URL.
const STORAGE_KEY = 'waygrade.compare.columns';
const listeners = new Set<() => void>();
let memoryFallback = '{}';

function read() {
  try {
    return window.localStorage.getItem(STORAGE_KEY) ?? '{}';
  } catch {
    return memoryFallback;
  }
}

function subscribe(listener: () => void) {
  listeners.add(listener);
  window.addEventListener('storage', listener);
  return () => {
    listeners.delete(listener);
    window.removeEventListener('storage', listener);
  };
}

export function useColumnVisibility() {
  const raw = useSyncExternalStore(subscribe, read, () => '{}');
  const visibility = useMemo<VisibilityState>(() => {
    try {
      return JSON.parse(raw) as VisibilityState;
    } catch {
      // A damaged preference only means every column shows.
      return {};
    }
  }, [raw]);
  const update = useCallback((next: VisibilityState) => {
    memoryFallback = JSON.stringify(next);
    try {
      window.localStorage.setItem(STORAGE_KEY, memoryFallback);
    } catch {
      // Private windows may refuse storage; the choice then lasts for this visit.
    }
    for (const listener of listeners) listener();
  }, []);
  return [visibility, update] as const;
}
