import type { ServerResponse } from 'node:http';

/** What the app's route handler tells the ingest about each upload it has presigned (POST /route-metadata). */
export interface UploadRegistration {
  metadata: Record<string, unknown>;
  callbackUrl: string;
  callbackSlug: string;
  awaitServerData: boolean;
  isDev: boolean;
  /** Where the app reached the stand-in; the callback names it so the app knows where to post its result. */
  origin: string;
  /** In development the app keeps the registration request open and receives callbacks as JSON lines on it. */
  devStream?: DevCallbackStream;
}

export interface DevCallbackStream {
  response: ServerResponse;
  pendingKeys: Set<string>;
}

export type CallbackOutcome = { ok: true; serverData: unknown } | { ok: false; error: string };

interface Waiter {
  resolve: (outcome: CallbackOutcome) => void;
  timer: NodeJS.Timeout;
}

/**
 * Holds upload registrations and lets an upload wait for the two things that may
 * arrive on other requests: the registration itself (the app may post it a moment
 * after handing out the presigned URL) and the app's onUploadComplete result.
 * Kept in memory: an upload in flight does not survive a restart, stored files do.
 */
export class UploadRegistry {
  private readonly registrations = new Map<string, UploadRegistration>();
  private readonly registrationWaiters = new Map<string, Array<() => void>>();
  private readonly resultWaiters = new Map<string, Waiter>();
  private readonly earlyResults = new Map<string, CallbackOutcome>();
  private readonly registeredAt = new Map<string, number>();

  /** Presigned URLs live an hour by default; a registration older than that belongs to an abandoned upload. */
  constructor(private readonly registrationLifetimeMs = 60 * 60 * 1000) {}

  register(fileKeys: string[], registration: UploadRegistration): void {
    this.pruneAbandoned();
    for (const key of fileKeys) {
      this.registrations.set(key, registration);
      this.registeredAt.set(key, Date.now());
      for (const wake of this.registrationWaiters.get(key) ?? []) wake();
      this.registrationWaiters.delete(key);
    }
  }

  async waitForRegistration(key: string, timeoutMs: number): Promise<UploadRegistration | undefined> {
    const known = this.registrations.get(key);
    if (known) return known;
    await new Promise<void>((resolve) => {
      const wake = () => {
        clearTimeout(timer);
        resolve();
      };
      const timer = setTimeout(() => {
        const remaining = (this.registrationWaiters.get(key) ?? []).filter((waiting) => waiting !== wake);
        if (remaining.length > 0) this.registrationWaiters.set(key, remaining);
        else this.registrationWaiters.delete(key);
        resolve();
      }, timeoutMs);
      this.registrationWaiters.set(key, [...(this.registrationWaiters.get(key) ?? []), wake]);
    });
    return this.registrations.get(key);
  }

  forget(key: string): void {
    this.registrations.delete(key);
    this.registeredAt.delete(key);
    this.earlyResults.delete(key);
  }

  private pruneAbandoned(): void {
    const cutoff = Date.now() - this.registrationLifetimeMs;
    for (const [key, at] of this.registeredAt) if (at < cutoff) this.forget(key);
  }

  /** Called when the app posts /callback-result; the result may land before anyone waits for it. */
  settle(key: string, outcome: CallbackOutcome): void {
    const waiter = this.resultWaiters.get(key);
    if (!waiter) {
      // Only uploads in flight can have a result worth keeping for later.
      if (this.registrations.has(key)) this.earlyResults.set(key, outcome);
      return;
    }
    clearTimeout(waiter.timer);
    this.resultWaiters.delete(key);
    waiter.resolve(outcome);
  }

  waitForResult(key: string, timeoutMs: number): Promise<CallbackOutcome> {
    const early = this.earlyResults.get(key);
    if (early) {
      this.earlyResults.delete(key);
      return Promise.resolve(early);
    }
    return new Promise((resolve) => {
      const timer = setTimeout(() => {
        this.resultWaiters.delete(key);
        resolve({ ok: false, error: `The app sent no upload result for ${key} within ${timeoutMs} ms` });
      }, timeoutMs);
      this.resultWaiters.set(key, { resolve, timer });
    });
  }

  /** Ends every open development stream and releases every waiter, for shutdown. */
  closeAll(): void {
    for (const registration of new Set(this.registrations.values())) {
      registration.devStream?.response.end();
    }
    for (const [key, waiter] of this.resultWaiters) {
      clearTimeout(waiter.timer);
      waiter.resolve({ ok: false, error: 'The upload service is shutting down' });
      this.resultWaiters.delete(key);
    }
    for (const wakers of this.registrationWaiters.values()) for (const wake of wakers) wake();
    this.registrationWaiters.clear();
  }
}
