import { unixSeconds } from './object-ids';
import type { StripeEvent } from './stripe-objects';
import { stripeSignatureHeader } from './webhook-signature';

// Delivers events to the app's webhook endpoint the way Stripe does: JSON POST, signed, retried
// with growing delays while the endpoint fails or is down, never holding up the API response
// that caused the event. Fault settings let tests reproduce what Stripe may do in production:
// deliver an event twice, late, or out of order.

export interface DeliverySettings {
  /** Deliver every event twice, concurrently, with the same event id. */
  duplicate: boolean;
  /** Wait this long before the first attempt of each delivery. */
  delayMs: number;
  /** Hold new deliveries until released, then send them newest first. */
  reorder: boolean;
}

export interface DeliveryAttempt {
  number: number;
  startedAt: string;
  durationMs: number;
  /** HTTP status of the endpoint's answer, or null when it could not be reached. */
  status: number | null;
  error: string | null;
}

export type DeliveryReason = 'initial' | 'duplicate' | 'redelivery';
export type DeliveryState = 'held' | 'scheduled' | 'sending' | 'succeeded' | 'failed';

export interface Delivery {
  eventId: string;
  reason: DeliveryReason;
  state: DeliveryState;
  createdAt: string;
  nextAttemptAt: string | null;
  attempts: DeliveryAttempt[];
}

export interface WebhookDispatcherOptions {
  endpointUrl: string;
  secret: string;
  /** Waits between attempts; attempts = 1 + retryDelaysMs.length. */
  retryDelaysMs: readonly number[];
  requestTimeoutMs?: number;
}

export const DEFAULT_DELIVERY_SETTINGS: DeliverySettings = { duplicate: false, delayMs: 0, reorder: false };

const SUCCESS = /^2\d\d$/;

export class WebhookDispatcher {
  endpointUrl: string;
  private settings: DeliverySettings = { ...DEFAULT_DELIVERY_SETTINGS };
  private readonly deliveries: Delivery[] = [];
  private readonly events = new Map<string, StripeEvent>();
  private readonly timers = new Set<NodeJS.Timeout>();
  private readonly inFlight = new Set<AbortController>();
  private idleWaiters: (() => void)[] = [];
  private closed = false;

  constructor(private readonly options: WebhookDispatcherOptions) {
    this.endpointUrl = options.endpointUrl;
  }

  currentSettings(): DeliverySettings {
    return { ...this.settings };
  }

  updateSettings(changes: Partial<DeliverySettings>): DeliverySettings {
    const wasReordering = this.settings.reorder;
    this.settings = { ...this.settings, ...changes };
    if (wasReordering && !this.settings.reorder) this.releaseHeld();
    return this.currentSettings();
  }

  dispatch(event: StripeEvent): void {
    this.events.set(event.id, event);
    this.start(this.createDelivery(event.id, 'initial'));
    if (this.settings.duplicate) this.start(this.createDelivery(event.id, 'duplicate'));
  }

  /** Sends an event again, as the "Resend" button in Stripe's dashboard does. */
  redeliver(event: StripeEvent): Delivery {
    this.events.set(event.id, event);
    const delivery = this.createDelivery(event.id, 'redelivery');
    this.schedule(delivery, this.settings.delayMs);
    return delivery;
  }

  /** Sends the held deliveries one after another, newest event first. Returns how many. */
  releaseHeld(): number {
    const held = this.deliveries.filter((delivery) => delivery.state === 'held').reverse();
    for (const delivery of held) delivery.state = 'scheduled';
    void (async () => {
      for (const delivery of held) {
        if (this.closed) return;
        await this.attempt(delivery);
      }
    })();
    return held.length;
  }

  deliveriesFor(eventId: string): Delivery[] {
    return this.deliveries.filter((delivery) => delivery.eventId === eventId);
  }

  /** Resolves once nothing is scheduled or sending (held deliveries wait for a release). */
  whenIdle(): Promise<void> {
    if (this.isIdle()) return Promise.resolve();
    return new Promise((resolve) => this.idleWaiters.push(resolve));
  }

  forget(): void {
    this.cancelAll();
    this.deliveries.length = 0;
    this.events.clear();
    this.settings = { ...DEFAULT_DELIVERY_SETTINGS };
    this.notifyIfIdle();
  }

  close(): void {
    this.closed = true;
    this.cancelAll();
    this.notifyIfIdle();
  }

  private createDelivery(eventId: string, reason: DeliveryReason): Delivery {
    const delivery: Delivery = {
      eventId,
      reason,
      state: 'scheduled',
      createdAt: new Date().toISOString(),
      nextAttemptAt: null,
      attempts: [],
    };
    this.deliveries.push(delivery);
    return delivery;
  }

  private start(delivery: Delivery): void {
    if (this.settings.reorder) {
      delivery.state = 'held';
      return;
    }
    this.schedule(delivery, this.settings.delayMs);
  }

  private schedule(delivery: Delivery, waitMs: number): void {
    if (this.closed) return;
    delivery.state = 'scheduled';
    delivery.nextAttemptAt = new Date(Date.now() + waitMs).toISOString();
    const timer = setTimeout(() => {
      this.timers.delete(timer);
      void this.attempt(delivery);
    }, waitMs);
    this.timers.add(timer);
  }

  private async attempt(delivery: Delivery): Promise<void> {
    const event = this.events.get(delivery.eventId);
    if (!event || this.closed) return;
    delivery.state = 'sending';
    delivery.nextAttemptAt = null;
    // Stripe sends pretty-printed JSON and signs every attempt afresh with the current time.
    const payload = JSON.stringify(event, null, 2);
    const controller = new AbortController();
    this.inFlight.add(controller);
    const timeout = setTimeout(() => controller.abort(new Error('endpoint did not answer in time')), this.options.requestTimeoutMs ?? 10_000);
    const startedAt = new Date();
    let status: number | null = null;
    let error: string | null = null;
    try {
      const response = await fetch(this.endpointUrl, {
        method: 'POST',
        headers: {
          'Content-Type': 'application/json; charset=utf-8',
          'User-Agent': 'Stripe/1.0 (+https://stripe.com/docs/webhooks)',
          'Stripe-Signature': stripeSignatureHeader(payload, this.options.secret, unixSeconds()),
        },
        body: payload,
        // Stripe counts a redirect as a failed delivery rather than following it.
        redirect: 'manual',
        signal: controller.signal,
      });
      status = response.status;
      await response.arrayBuffer();
      if (!SUCCESS.test(String(status))) error = `endpoint answered ${status}`;
    } catch (failure) {
      error = describeFailure(failure);
    } finally {
      clearTimeout(timeout);
      this.inFlight.delete(controller);
    }
    if (this.closed) return;
    delivery.attempts.push({
      number: delivery.attempts.length + 1,
      startedAt: startedAt.toISOString(),
      durationMs: Date.now() - startedAt.getTime(),
      status,
      error,
    });
    if (error === null) {
      delivery.state = 'succeeded';
    } else {
      const nextWait = this.options.retryDelaysMs[delivery.attempts.length - 1];
      if (nextWait === undefined) delivery.state = 'failed';
      else this.schedule(delivery, nextWait);
    }
    this.notifyIfIdle();
  }

  private cancelAll(): void {
    for (const timer of this.timers) clearTimeout(timer);
    this.timers.clear();
    for (const controller of this.inFlight) controller.abort(new Error('stand-in closing'));
    this.inFlight.clear();
  }

  private isIdle(): boolean {
    if (this.closed) return true;
    return !this.deliveries.some((delivery) => delivery.state === 'scheduled' || delivery.state === 'sending');
  }

  private notifyIfIdle(): void {
    if (!this.isIdle()) return;
    const waiters = this.idleWaiters;
    this.idleWaiters = [];
    for (const resolve of waiters) resolve();
  }
}

function describeFailure(failure: unknown): string {
  if (failure instanceof Error) {
    const cause = failure.cause instanceof Error ? `: ${failure.cause.message}` : '';
    return `${failure.message}${cause}`;
  }
  return String(failure);
}
