// The subset of Stripe's object shapes this stand-in produces. Field names and value types
// follow Stripe's API reference for the objects; fields the app never reads and Stripe sends as
// null are kept so that code reading them sees Stripe's null rather than undefined.

export type Metadata = Record<string, string>;

export interface LineItem {
  id: string;
  object: 'item';
  amount_discount: number;
  amount_subtotal: number;
  amount_tax: number;
  amount_total: number;
  currency: string;
  description: string;
  price: {
    id: string;
    object: 'price';
    active: boolean;
    currency: string;
    product: string;
    type: 'one_time';
    unit_amount: number;
    livemode: false;
  };
  quantity: number;
}

export interface CheckoutSession {
  id: string;
  object: 'checkout.session';
  amount_subtotal: number;
  amount_total: number;
  cancel_url: string | null;
  client_reference_id: string | null;
  created: number;
  currency: string;
  customer: null;
  customer_details: { email: string | null; name: string | null } | null;
  customer_email: string | null;
  expires_at: number;
  livemode: false;
  locale: string | null;
  metadata: Metadata;
  mode: 'payment';
  payment_intent: string | null;
  payment_method_types: string[];
  payment_status: 'unpaid' | 'paid';
  status: 'open' | 'complete' | 'expired';
  submit_type: string | null;
  success_url: string | null;
  ui_mode: 'hosted';
  url: string | null;
}

export interface PaymentIntent {
  id: string;
  object: 'payment_intent';
  amount: number;
  amount_capturable: number;
  amount_received: number;
  capture_method: 'automatic';
  created: number;
  currency: string;
  customer: null;
  description: string | null;
  latest_charge: string | null;
  livemode: false;
  metadata: Metadata;
  payment_method_types: string[];
  receipt_email: string | null;
  status: 'succeeded';
}

export interface Charge {
  id: string;
  object: 'charge';
  amount: number;
  amount_captured: number;
  amount_refunded: number;
  billing_details: { email: string | null; name: string | null };
  captured: boolean;
  created: number;
  currency: string;
  description: string | null;
  livemode: false;
  metadata: Metadata;
  paid: boolean;
  payment_intent: string;
  receipt_email: string | null;
  refunded: boolean;
  status: 'succeeded';
}

export interface Refund {
  id: string;
  object: 'refund';
  amount: number;
  charge: string;
  created: number;
  currency: string;
  metadata: Metadata;
  payment_intent: string;
  reason: 'duplicate' | 'fraudulent' | 'requested_by_customer' | null;
  status: 'succeeded';
}

export type StripeObject = CheckoutSession | PaymentIntent | Charge | Refund;

export type EventType =
  | 'checkout.session.completed'
  | 'checkout.session.expired'
  | 'charge.refunded'
  | 'refund.created';

export interface StripeEvent {
  id: string;
  object: 'event';
  api_version: string | null;
  created: number;
  data: { object: StripeObject; previous_attributes?: Record<string, unknown> };
  livemode: false;
  pending_webhooks: number;
  request: { id: string | null; idempotency_key: string | null };
  type: EventType;
}
