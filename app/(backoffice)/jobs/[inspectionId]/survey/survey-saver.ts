import type { DraftSurvey } from '@/lib/survey/draft-survey-schema';
import { clearQueuedSurvey, readQueuedSurvey, writeQueuedSurvey } from './offline-queue';

export type SaveState =
  | { kind: 'saved'; at: Date | null }
  | { kind: 'unsaved' }
  | { kind: 'saving' }
  | { kind: 'offline' }
  | { kind: 'conflict'; message: string; serverVersion: number; serverData: DraftSurvey }
  | { kind: 'refused'; message: string };

export interface SaverSnapshot {
  data: DraftSurvey;
  state: SaveState;
  /** Bumped when the data is replaced wholesale, so inputs holding their own text start afresh. */
  revision: number;
}

// Wait this long after the last keystroke before sending: one request per pause, not per digit.
const DEBOUNCE_MS = 800;
// While the network fails, try again this often (and at once when the browser reports it is back).
const RETRY_MS = 5_000;

type ConflictBody = { message?: string; current?: { version: number; data: DraftSurvey } | null };

/**
 * Autosave of the whole survey with its version, outside React so its timers and requests follow
 * one clear order. Every change is queued on the phone first, sent after a short pause and confirmed
 * by the version the server answers. A 409 means another device saved newer work: nothing is
 * overwritten and the inspector chooses. Local edits are only dropped when the inspector chooses
 * the other device's version.
 */
export class SurveySaver {
  private snapshot: SaverSnapshot;
  private version: number;
  private dirty = false;
  private inFlight = false;
  private blocked = false;
  private timer: ReturnType<typeof setTimeout> | null = null;
  private listeners = new Set<() => void>();

  constructor(
    private readonly inspectionId: number,
    private readonly initialVersion: number,
    private readonly initialData: DraftSurvey,
  ) {
    this.version = initialVersion;
    this.snapshot = { data: initialData, state: { kind: 'saved', at: null }, revision: 0 };
  }

  subscribe = (listener: () => void) => {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  };

  getSnapshot = () => this.snapshot;

  confirmedVersion = () => this.version;

  private publish(change: Partial<SaverSnapshot>) {
    this.snapshot = { ...this.snapshot, ...change };
    for (const listener of this.listeners) listener();
  }

  private queue() {
    writeQueuedSurvey(this.inspectionId, { baseVersion: this.version, data: this.snapshot.data, changedAt: new Date().toISOString() });
  }

  private schedule(delay: number) {
    if (this.timer) clearTimeout(this.timer);
    this.timer = setTimeout(() => void this.flush(), delay);
  }

  /** Edits left on this phone by an earlier visit (closed while offline) come back first. */
  restoreQueued() {
    const queued = readQueuedSurvey(this.inspectionId);
    if (!queued) return;
    if (JSON.stringify(queued.data) === JSON.stringify(this.initialData)) {
      clearQueuedSurvey(this.inspectionId);
      return;
    }
    this.dirty = true;
    if (queued.baseVersion === this.initialVersion) {
      this.publish({ data: queued.data, revision: this.snapshot.revision + 1, state: { kind: 'unsaved' } });
      this.schedule(0);
    } else {
      this.blocked = true;
      this.publish({
        data: queued.data,
        revision: this.snapshot.revision + 1,
        state: {
          kind: 'conflict',
          message: 'This phone holds edits that were never sent, and the survey was changed on another device since.',
          serverVersion: this.initialVersion,
          serverData: this.initialData,
        },
      });
    }
  }

  update = (change: (current: DraftSurvey) => DraftSurvey) => {
    const next = change(this.snapshot.data);
    if (next === this.snapshot.data) return;
    this.dirty = true;
    this.publish({ data: next, ...(this.blocked ? {} : { state: navigator.onLine ? { kind: 'unsaved' } : { kind: 'offline' } }) });
    this.queue();
    if (!this.blocked) this.schedule(DEBOUNCE_MS);
  };

  online = () => this.schedule(0);

  offline = () => {
    if (this.dirty && !this.blocked) this.publish({ state: { kind: 'offline' } });
  };

  hasUnsavedChanges = () => this.dirty;

  async flush() {
    if (!this.dirty || this.inFlight || this.blocked) return;
    if (!navigator.onLine) {
      this.publish({ state: { kind: 'offline' } });
      return;
    }
    const sent = this.snapshot.data;
    this.inFlight = true;
    this.publish({ state: { kind: 'saving' } });
    try {
      const response = await fetch(`/api/surveys/${this.inspectionId}`, {
        method: 'PUT',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ baseVersion: this.version, data: sent }),
      });
      await this.handle(response, sent);
    } catch {
      // No answer at all: the signal dropped mid-request. The queue still holds everything.
      this.publish({ state: { kind: 'offline' } });
      this.schedule(RETRY_MS);
    } finally {
      this.inFlight = false;
    }
  }

  private async handle(response: Response, sent: DraftSurvey) {
    if (response.ok) {
      const body = (await response.json()) as { data: { version: number } };
      this.version = body.data.version;
      if (this.snapshot.data === sent) {
        this.dirty = false;
        clearQueuedSurvey(this.inspectionId);
        this.publish({ state: { kind: 'saved', at: new Date() } });
      } else {
        // Typed on while the save was under way: re-queue on the new version and send again.
        this.queue();
        this.publish({ state: { kind: 'unsaved' } });
        this.schedule(0);
      }
      return;
    }
    const body = (await response.json().catch(() => ({}))) as ConflictBody & { fieldErrors?: Record<string, string[]> };
    if (response.status === 409 && body.current) {
      this.blocked = true;
      this.publish({ state: { kind: 'conflict', message: body.message ?? 'This survey was changed on another device.', serverVersion: body.current.version, serverData: body.current.data } });
    } else if (response.status >= 500) {
      this.publish({ state: { kind: 'offline' } });
      this.schedule(RETRY_MS);
    } else {
      this.blocked = true;
      const fields = body.fieldErrors ? ` (${Object.keys(body.fieldErrors).slice(0, 3).join(', ')})` : '';
      const message =
        response.status === 401
          ? 'You have been signed out. Sign in again in a new tab; your changes are kept on this phone.'
          : `${body.message ?? 'The server did not accept this save.'}${fields} Your changes are kept on this phone.`;
      this.publish({ state: { kind: 'refused', message } });
    }
  }

  /** After a conflict: take the other device's survey (this phone's edits are discarded on request)… */
  loadTheirs = () => {
    const state = this.snapshot.state;
    if (state.kind !== 'conflict') return;
    this.version = state.serverVersion;
    this.dirty = false;
    this.blocked = false;
    clearQueuedSurvey(this.inspectionId);
    this.publish({ data: state.serverData, revision: this.snapshot.revision + 1, state: { kind: 'saved', at: new Date() } });
  };

  /** …or keep this phone's survey: it is re-based on the server's version and saved over it. */
  keepMine = () => {
    const state = this.snapshot.state;
    if (state.kind !== 'conflict') return;
    this.version = state.serverVersion;
    this.blocked = false;
    this.dirty = true;
    this.queue();
    this.publish({ state: { kind: 'unsaved' } });
    this.schedule(0);
  };

  retry = () => {
    this.blocked = false;
    this.dirty = true;
    this.publish({ state: { kind: 'unsaved' } });
    this.schedule(0);
  };

  dispose() {
    if (this.timer) clearTimeout(this.timer);
  }
}
