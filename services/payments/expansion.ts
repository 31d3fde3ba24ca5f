import type { PaymentOperations } from './payment-operations';
import { invalidRequest } from './stripe-error';
import type { StripeObject } from './stripe-objects';

// `expand[]=payment_intent` asks Stripe to replace an id with the object it names, and dotted
// paths (`payment_intent.latest_charge`) go deeper. Which fields may be expanded, per object type:
const EXPANDABLE_FIELDS: Record<string, readonly string[]> = {
  'checkout.session': ['payment_intent', 'line_items'],
  payment_intent: ['latest_charge'],
  charge: ['payment_intent'],
  refund: ['charge', 'payment_intent'],
};

// Ids carry their type in the prefix, which is how a referenced object is found.
const RETRIEVERS_BY_PREFIX: [string, (operations: PaymentOperations, id: string) => StripeObject][] = [
  ['cs_', (operations, id) => operations.retrieveCheckoutSession(id)],
  ['pi_', (operations, id) => operations.retrievePaymentIntent(id)],
  ['ch_', (operations, id) => operations.retrieveCharge(id)],
  ['re_', (operations, id) => operations.retrieveRefund(id)],
];

export function expandObject(
  object: StripeObject,
  paths: readonly string[] | undefined,
  operations: PaymentOperations,
): Record<string, unknown> {
  // Expansion never changes stored state: it works on a copy.
  const copy = structuredClone(object) as unknown as Record<string, unknown>;
  for (const path of paths ?? []) expandPath(copy, path.split('.'), path, operations);
  return copy;
}

function expandPath(
  target: Record<string, unknown>,
  segments: string[],
  fullPath: string,
  operations: PaymentOperations,
): void {
  const [field, ...rest] = segments;
  const objectType = String(target.object);
  if (!field || !EXPANDABLE_FIELDS[objectType]?.includes(field)) {
    throw invalidRequest(`This property cannot be expanded (${field ?? fullPath}).`, { param: 'expand' });
  }
  if (field === 'line_items') {
    const sessionId = String(target.id);
    target.line_items = {
      object: 'list',
      data: operations.checkoutLineItems(sessionId),
      has_more: false,
      url: `/v1/checkout/sessions/${sessionId}/line_items`,
    };
    return;
  }
  const value = target[field];
  if (typeof value === 'string') {
    const retrieve = RETRIEVERS_BY_PREFIX.find(([prefix]) => value.startsWith(prefix))?.[1];
    if (retrieve) target[field] = structuredClone(retrieve(operations, value));
  }
  const expanded = target[field];
  if (rest.length > 0 && typeof expanded === 'object' && expanded !== null) {
    expandPath(expanded as Record<string, unknown>, rest, fullPath, operations);
  }
}
