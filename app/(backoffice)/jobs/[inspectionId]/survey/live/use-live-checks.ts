'use client';

import { useDeferredValue, useEffect, useMemo, useState } from 'react';
import type { CheckResult } from '@/lib/scoring';
import type { DraftSurvey } from '@/lib/survey/draft-survey-schema';

type ScoreDraft = (draft: DraftSurvey) => Map<string, CheckResult> | null;

// A failed load (the signal dropped just then) is tried again this often, and at once when the
// browser reports it is back online.
const RETRY_MS = 5_000;

export type LiveChecks = { loaded: false } | { loaded: true; byId: Map<string, CheckResult> | null };

/**
 * The checks graded so far, by id: not loaded until the scoring library has arrived, then null while
 * the machine's size is missing. The library is fetched right after the screen is up instead of with
 * it, because it is most of the survey's JavaScript.
 */
export function useLiveChecks(data: DraftSurvey): LiveChecks {
  const [scoreDraft, setScoreDraft] = useState<ScoreDraft | null>(null);

  useEffect(() => {
    let cancelled = false;
    let timer: ReturnType<typeof setTimeout> | undefined;
    const load = () => {
      clearTimeout(timer);
      import('./score-draft').then(
        (module) => {
          if (!cancelled) setScoreDraft(() => module.scoreDraft);
          window.removeEventListener('online', load);
        },
        () => {
          if (!cancelled) timer = setTimeout(load, RETRY_MS);
        },
      );
    };
    window.addEventListener('online', load);
    load();
    return () => {
      cancelled = true;
      clearTimeout(timer);
      window.removeEventListener('online', load);
    };
  }, []);

  const deferred = useDeferredValue(data);
  return useMemo(() => (scoreDraft ? { loaded: true, byId: scoreDraft(deferred) } : { loaded: false }), [scoreDraft, deferred]);
}
