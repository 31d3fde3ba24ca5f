import { mkdirSync, readFileSync, renameSync, writeFileSync } from 'node:fs';
import { dirname } from 'node:path';
import type { Charge, CheckoutSession, LineItem, PaymentIntent, Refund, StripeEvent } from './stripe-objects';

// Everything the stand-in knows, kept in memory like the hosted service keeps it in its
// database. When a state file is given the snapshot is rewritten after each change, so a
// restarted stand-in still knows the sessions the app created before the restart.

export interface SessionRecord {
  session: CheckoutSession;
  lineItems: LineItem[];
  /** Stripe-Version of the creating request; events about this session carry it. */
  apiVersion: string | null;
  /** Copied onto the payment intent once the buyer pays. */
  paymentIntentData: { description?: string; metadata?: Record<string, string>; receipt_email?: string };
}

/** A POST answered once and replayed for any later request with the same Idempotency-Key. */
export interface IdempotentResponse {
  method: string;
  path: string;
  body: string;
  status: number;
  response: unknown;
}

interface Snapshot {
  sessions: SessionRecord[];
  paymentIntents: PaymentIntent[];
  charges: Charge[];
  refunds: Refund[];
  events: StripeEvent[];
  idempotency: [string, IdempotentResponse][];
}

export class PaymentsState {
  readonly sessions = new Map<string, SessionRecord>();
  readonly paymentIntents = new Map<string, PaymentIntent>();
  readonly charges = new Map<string, Charge>();
  readonly refunds = new Map<string, Refund>();
  readonly events = new Map<string, StripeEvent>();
  readonly idempotency = new Map<string, IdempotentResponse>();

  constructor(private readonly stateFile?: string) {
    if (stateFile) this.load(stateFile);
  }

  save(): void {
    if (!this.stateFile) return;
    const snapshot: Snapshot = {
      sessions: [...this.sessions.values()],
      paymentIntents: [...this.paymentIntents.values()],
      charges: [...this.charges.values()],
      refunds: [...this.refunds.values()],
      events: [...this.events.values()],
      idempotency: [...this.idempotency.entries()],
    };
    // Write then rename, so a crash mid-write never leaves half a file to load next time.
    mkdirSync(dirname(this.stateFile), { recursive: true });
    const temporary = `${this.stateFile}.${process.pid}.tmp`;
    writeFileSync(temporary, JSON.stringify(snapshot));
    renameSync(temporary, this.stateFile);
  }

  clear(): void {
    for (const map of [this.sessions, this.paymentIntents, this.charges, this.refunds, this.events, this.idempotency]) {
      map.clear();
    }
    this.save();
  }

  private load(file: string): void {
    let text: string;
    try {
      text = readFileSync(file, 'utf8');
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code === 'ENOENT') return;
      throw error;
    }
    const snapshot = JSON.parse(text) as Snapshot;
    for (const record of snapshot.sessions) this.sessions.set(record.session.id, record);
    for (const intent of snapshot.paymentIntents) this.paymentIntents.set(intent.id, intent);
    for (const charge of snapshot.charges) this.charges.set(charge.id, charge);
    for (const refund of snapshot.refunds) this.refunds.set(refund.id, refund);
    for (const event of snapshot.events) this.events.set(event.id, event);
    for (const [key, response] of snapshot.idempotency) this.idempotency.set(key, response);
  }
}
