import { newObjectId, unixSeconds } from './object-ids';
import { formatMinorAmount } from './money-format';
import type { PaymentsState } from './payments-state';
import type { CreateCheckoutSessionParams, CreateRefundParams } from './request-params';
import { invalidRequest, resourceMissing } from './stripe-error';
import type {
  Charge,
  CheckoutSession,
  EventType,
  LineItem,
  PaymentIntent,
  Refund,
  StripeEvent,
  StripeObject,
} from './stripe-objects';

// What happens to payments: a checkout session is created, paid or abandoned, and a payment is
// refunded. Each change Stripe would announce becomes an event handed to `publish`.

/** Where a change came from; Stripe copies this into the event's `request` field. */
export interface RequestContext {
  requestId: string | null;
  idempotencyKey: string | null;
  apiVersion: string | null;
}

const NO_REQUEST: RequestContext = { requestId: null, idempotencyKey: null, apiVersion: null };

// Stripe's limits on `expires_at`: 30 minutes to 24 hours after creation, 24 hours by default.
const MIN_SESSION_LIFETIME_S = 30 * 60;
const MAX_SESSION_LIFETIME_S = 24 * 60 * 60;
// A caller's clock may run a little behind ours; Stripe tolerates small skews as well.
const CLOCK_SKEW_S = 60;

export class PaymentOperations {
  constructor(
    private readonly state: PaymentsState,
    private readonly checkoutPageUrl: (sessionId: string) => string,
    private readonly publish: (event: StripeEvent) => void,
  ) {}

  createCheckoutSession(params: CreateCheckoutSessionParams, context: RequestContext): CheckoutSession {
    const created = unixSeconds();
    const currencies = new Set(params.line_items.map((item) => item.price_data.currency));
    if (currencies.size > 1) {
      throw invalidRequest('All line items must use the same currency.', { param: 'line_items' });
    }
    const expiresAt = params.expires_at ?? created + MAX_SESSION_LIFETIME_S;
    if (expiresAt < created + MIN_SESSION_LIFETIME_S - CLOCK_SKEW_S) {
      throw invalidRequest('The `expires_at` timestamp must be at least 30 minutes from Checkout Session creation.', {
        param: 'expires_at',
      });
    }
    if (expiresAt > created + MAX_SESSION_LIFETIME_S + CLOCK_SKEW_S) {
      throw invalidRequest('The `expires_at` timestamp must be less than 24 hours from Checkout Session creation.', {
        param: 'expires_at',
      });
    }

    const lineItems: LineItem[] = params.line_items.map((item) => {
      const total = item.price_data.unit_amount * item.quantity;
      return {
        id: newObjectId('li_'),
        object: 'item',
        amount_discount: 0,
        amount_subtotal: total,
        amount_tax: 0,
        amount_total: total,
        currency: item.price_data.currency,
        description: item.price_data.product_data.name,
        price: {
          id: newObjectId('price_'),
          object: 'price',
          active: false,
          currency: item.price_data.currency,
          product: newObjectId('prod_', 14),
          type: 'one_time',
          unit_amount: item.price_data.unit_amount,
          livemode: false,
        },
        quantity: item.quantity,
      };
    });
    const amountTotal = lineItems.reduce((sum, item) => sum + item.amount_total, 0);
    const id = newObjectId('cs_test_', 58);
    const session: CheckoutSession = {
      id,
      object: 'checkout.session',
      amount_subtotal: amountTotal,
      amount_total: amountTotal,
      cancel_url: params.cancel_url ?? null,
      client_reference_id: params.client_reference_id ?? null,
      created,
      currency: lineItems[0]?.currency ?? 'eur',
      customer: null,
      customer_details: null,
      customer_email: params.customer_email ?? null,
      expires_at: expiresAt,
      livemode: false,
      locale: params.locale ?? null,
      metadata: params.metadata ?? {},
      mode: 'payment',
      payment_intent: null,
      payment_method_types: params.payment_method_types ?? ['card'],
      payment_status: 'unpaid',
      status: 'open',
      submit_type: params.submit_type ?? null,
      success_url: params.success_url,
      ui_mode: 'hosted',
      url: this.checkoutPageUrl(id),
    };
    this.state.sessions.set(id, {
      session,
      lineItems,
      apiVersion: context.apiVersion,
      paymentIntentData: params.payment_intent_data ?? {},
    });
    this.state.save();
    return session;
  }

  retrieveCheckoutSession(id: string): CheckoutSession {
    return this.sessionRecord(id).session;
  }

  checkoutLineItems(id: string): LineItem[] {
    return this.sessionRecord(id).lineItems;
  }

  expireCheckoutSession(id: string, context: RequestContext): CheckoutSession {
    const record = this.sessionRecord(id);
    const { session } = record;
    if (session.status !== 'open') {
      throw invalidRequest(
        `Only Checkout Sessions with a status in ["open"] can be expired. This Checkout Session has a status of "${session.status}".`,
        { code: 'checkout_session_not_open' },
      );
    }
    this.markExpired(record.session, context, record.apiVersion);
    return session;
  }

  /** Expires open sessions whose `expires_at` has passed, as Stripe does on its own. */
  expireOverdueSessions(now = unixSeconds()): void {
    for (const record of this.state.sessions.values()) {
      if (record.session.status === 'open' && record.session.expires_at <= now) {
        this.markExpired(record.session, NO_REQUEST, record.apiVersion);
      }
    }
  }

  /** The buyer confirmed payment on the checkout page. */
  completeCheckoutSession(id: string, buyerEmail: string | null): CheckoutSession {
    const record = this.sessionRecord(id);
    const { session } = record;
    if (session.status !== 'open') {
      throw invalidRequest(`This Checkout Session is no longer open (status "${session.status}").`, {
        code: 'checkout_session_not_open',
      });
    }
    const email = session.customer_email ?? buyerEmail;
    const created = unixSeconds();
    const paymentIntentId = newObjectId('pi_');
    const charge: Charge = {
      id: newObjectId('ch_'),
      object: 'charge',
      amount: session.amount_total,
      amount_captured: session.amount_total,
      amount_refunded: 0,
      billing_details: { email, name: null },
      captured: true,
      created,
      currency: session.currency,
      description: record.paymentIntentData.description ?? null,
      livemode: false,
      metadata: {},
      paid: true,
      payment_intent: paymentIntentId,
      receipt_email: record.paymentIntentData.receipt_email ?? null,
      refunded: false,
      status: 'succeeded',
    };
    // Checkout copies payment_intent_data.metadata, not the session's metadata, onto the intent.
    const paymentIntent: PaymentIntent = {
      id: paymentIntentId,
      object: 'payment_intent',
      amount: session.amount_total,
      amount_capturable: 0,
      amount_received: session.amount_total,
      capture_method: 'automatic',
      created,
      currency: session.currency,
      customer: null,
      description: record.paymentIntentData.description ?? null,
      latest_charge: charge.id,
      livemode: false,
      metadata: record.paymentIntentData.metadata ?? {},
      payment_method_types: session.payment_method_types,
      receipt_email: record.paymentIntentData.receipt_email ?? null,
      status: 'succeeded',
    };
    this.state.charges.set(charge.id, charge);
    this.state.paymentIntents.set(paymentIntent.id, paymentIntent);
    Object.assign(session, {
      status: 'complete',
      payment_status: 'paid',
      payment_intent: paymentIntent.id,
      customer_details: { email, name: null },
      url: null,
    } satisfies Partial<CheckoutSession>);
    this.recordEvent('checkout.session.completed', session, undefined, NO_REQUEST, record.apiVersion);
    return session;
  }

  createRefund(params: CreateRefundParams, context: RequestContext): Refund {
    const charge = this.refundableCharge(params);
    const unrefunded = charge.amount - charge.amount_refunded;
    if (unrefunded === 0) {
      throw invalidRequest(`Charge ${charge.id} has already been refunded.`, { code: 'charge_already_refunded' });
    }
    const amount = params.amount ?? unrefunded;
    if (amount > unrefunded) {
      throw invalidRequest(
        `Refund amount (${formatMinorAmount(amount, charge.currency)}) is greater than unrefunded amount on charge (${formatMinorAmount(unrefunded, charge.currency)})`,
        { param: 'amount', code: 'amount_too_large' },
      );
    }
    const refund: Refund = {
      id: newObjectId('re_'),
      object: 'refund',
      amount,
      charge: charge.id,
      created: unixSeconds(),
      currency: charge.currency,
      metadata: params.metadata ?? {},
      payment_intent: charge.payment_intent,
      reason: params.reason ?? null,
      status: 'succeeded',
    };
    const previous = { amount_refunded: charge.amount_refunded, refunded: charge.refunded };
    charge.amount_refunded += amount;
    charge.refunded = charge.amount_refunded === charge.amount;
    this.state.refunds.set(refund.id, refund);
    // Stripe announces a refund twice: charge.refunded (what most integrations handle, with the
    // charge's new amount_refunded) and refund.created (the refund object itself).
    this.recordEvent('charge.refunded', charge, previous, context, context.apiVersion);
    this.recordEvent('refund.created', refund, undefined, context, context.apiVersion);
    return refund;
  }

  retrieveRefund(id: string): Refund {
    const refund = this.state.refunds.get(id);
    if (!refund) throw resourceMissing('refund', id);
    return refund;
  }

  retrievePaymentIntent(id: string): PaymentIntent {
    const intent = this.state.paymentIntents.get(id);
    if (!intent) throw resourceMissing('payment_intent', id);
    return intent;
  }

  retrieveCharge(id: string): Charge {
    const charge = this.state.charges.get(id);
    if (!charge) throw resourceMissing('charge', id);
    return charge;
  }

  private refundableCharge(params: CreateRefundParams): Charge {
    if (params.charge) {
      const charge = this.state.charges.get(params.charge);
      if (!charge) throw resourceMissing('charge', params.charge, 'charge');
      return charge;
    }
    if (!params.payment_intent) {
      throw invalidRequest('One of the following params should be provided for this request: payment_intent or charge.');
    }
    const intent = this.state.paymentIntents.get(params.payment_intent);
    if (!intent) throw resourceMissing('payment_intent', params.payment_intent, 'payment_intent');
    const charge = intent.latest_charge ? this.state.charges.get(intent.latest_charge) : undefined;
    if (!charge) {
      throw invalidRequest(`This PaymentIntent (${intent.id}) does not have a successful charge to refund.`, {
        param: 'payment_intent',
        code: 'charge_not_refundable',
      });
    }
    return charge;
  }

  private markExpired(session: CheckoutSession, context: RequestContext, apiVersion: string | null): void {
    Object.assign(session, { status: 'expired', url: null } satisfies Partial<CheckoutSession>);
    this.recordEvent('checkout.session.expired', session, undefined, context, apiVersion);
  }

  private sessionRecord(id: string) {
    const record = this.state.sessions.get(id);
    if (!record) throw resourceMissing('checkout.session', id);
    return record;
  }

  private recordEvent(
    type: EventType,
    object: StripeObject,
    previousAttributes: Record<string, unknown> | undefined,
    context: RequestContext,
    apiVersion: string | null,
  ): void {
    const event: StripeEvent = {
      id: newObjectId('evt_'),
      object: 'event',
      api_version: apiVersion ?? context.apiVersion,
      created: unixSeconds(),
      // A snapshot: later changes to the object must not rewrite what this event said.
      data: previousAttributes
        ? { object: structuredClone(object), previous_attributes: previousAttributes }
        : { object: structuredClone(object) },
      livemode: false,
      pending_webhooks: 1,
      request: { id: context.requestId, idempotency_key: context.idempotencyKey },
      type,
    };
    this.state.events.set(event.id, event);
    this.state.save();
    this.publish(event);
  }
}
