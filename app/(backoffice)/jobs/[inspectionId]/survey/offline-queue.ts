import type { DraftSurvey } from '@/lib/survey/draft-survey-schema';

/**
 * Edits not yet confirmed by the server, kept in this browser's localStorage so a lost signal, a
 * closed tab or a flat battery loses nothing. An entry is removed only when the server has stored
 * exactly this data.
 */
export interface QueuedSurvey {
  baseVersion: number;
  data: DraftSurvey;
  changedAt: string;
}

const keyFor = (inspectionId: number) => `waygrade:survey:${inspectionId}`;

export function readQueuedSurvey(inspectionId: number): QueuedSurvey | null {
  try {
    const raw = window.localStorage.getItem(keyFor(inspectionId));
    return raw ? (JSON.parse(raw) as QueuedSurvey) : null;
  } catch {
    return null;
  }
}

export function writeQueuedSurvey(inspectionId: number, entry: QueuedSurvey): boolean {
  try {
    window.localStorage.setItem(keyFor(inspectionId), JSON.stringify(entry));
    return true;
  } catch {
    // Storage full or blocked (private mode): the edit stays in memory and is still sent.
    return false;
  }
}

export function clearQueuedSurvey(inspectionId: number) {
  try {
    window.localStorage.removeItem(keyFor(inspectionId));
  } catch {
    // Nothing to clear when storage is unavailable.
  }
}
