'use client';

import { useEffect, useState, useSyncExternalStore } from 'react';
import type { DraftSurvey } from '@/lib/survey/draft-survey-schema';
import { SurveySaver } from './survey-saver';

export type { SaveState } from './survey-saver';

/** The survey's autosave for a React screen: the saver's data and state, and its actions. */
export function useSurveyAutosave({ inspectionId, initialVersion, initialData }: { inspectionId: number; initialVersion: number; initialData: DraftSurvey }) {
  const [saver] = useState(() => new SurveySaver(inspectionId, initialVersion, initialData));
  const snapshot = useSyncExternalStore(saver.subscribe, saver.getSnapshot, saver.getSnapshot);

  useEffect(() => {
    saver.restoreQueued();
    const warnBeforeLeaving = (event: BeforeUnloadEvent) => {
      if (saver.hasUnsavedChanges()) event.preventDefault();
    };
    window.addEventListener('online', saver.online);
    window.addEventListener('offline', saver.offline);
    window.addEventListener('beforeunload', warnBeforeLeaving);
    return () => {
      window.removeEventListener('online', saver.online);
      window.removeEventListener('offline', saver.offline);
      window.removeEventListener('beforeunload', warnBeforeLeaving);
      saver.dispose();
    };
  }, [saver]);

  return { ...snapshot, saver };
}
