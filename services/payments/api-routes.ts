import type { IncomingMessage, ServerResponse } from 'node:http';
import Stripe from 'stripe';
import { expandObject } from './expansion';
import { FormEncodingError, parseFormEncoded, type FormObject } from './form-encoding';
import { BodyTooLargeError, readBody, sendJson } from './http-io';
import { newObjectId } from './object-ids';
import type { PaymentOperations, RequestContext } from './payment-operations';
import type { PaymentsState } from './payments-state';
import {
  createCheckoutSessionParams,
  createRefundParams,
  expandOnlyParams,
  parseParams,
} from './request-params';
import { invalidRequest, StripeApiError } from './stripe-error';

// The `/v1/…` REST surface, answering the way api.stripe.com does: bearer secret-key auth,
// form-encoded params, Stripe-shaped JSON objects and errors, Idempotency-Key replay on POST.

interface ApiCall {
  params: FormObject;
  pathIds: string[];
  context: RequestContext;
}

interface ApiRoute {
  method: 'GET' | 'POST';
  pattern: RegExp;
  handle(call: ApiCall, operations: PaymentOperations): unknown;
}

const ID = '([^/]+)';

const ROUTES: ApiRoute[] = [
  {
    method: 'POST',
    pattern: /^\/v1\/checkout\/sessions$/,
    handle({ params, context }, operations) {
      const input = parseParams(createCheckoutSessionParams, params);
      return expandObject(operations.createCheckoutSession(input, context), input.expand, operations);
    },
  },
  {
    method: 'GET',
    pattern: new RegExp(`^/v1/checkout/sessions/${ID}$`),
    handle({ params, pathIds: [id = ''] }, operations) {
      const input = parseParams(expandOnlyParams, params);
      return expandObject(operations.retrieveCheckoutSession(id), input.expand, operations);
    },
  },
  {
    method: 'GET',
    pattern: new RegExp(`^/v1/checkout/sessions/${ID}/line_items$`),
    handle({ pathIds: [id = ''] }, operations) {
      return {
        object: 'list',
        data: operations.checkoutLineItems(id),
        has_more: false,
        url: `/v1/checkout/sessions/${id}/line_items`,
      };
    },
  },
  {
    method: 'POST',
    pattern: new RegExp(`^/v1/checkout/sessions/${ID}/expire$`),
    handle({ params, pathIds: [id = ''], context }, operations) {
      const input = parseParams(expandOnlyParams, params);
      return expandObject(operations.expireCheckoutSession(id, context), input.expand, operations);
    },
  },
  {
    method: 'POST',
    pattern: /^\/v1\/refunds$/,
    handle({ params, context }, operations) {
      const input = parseParams(createRefundParams, params);
      return expandObject(operations.createRefund(input, context), input.expand, operations);
    },
  },
  {
    method: 'GET',
    pattern: new RegExp(`^/v1/refunds/${ID}$`),
    handle({ params, pathIds: [id = ''] }, operations) {
      const input = parseParams(expandOnlyParams, params);
      return expandObject(operations.retrieveRefund(id), input.expand, operations);
    },
  },
  {
    method: 'GET',
    pattern: new RegExp(`^/v1/payment_intents/${ID}$`),
    handle({ params, pathIds: [id = ''] }, operations) {
      const input = parseParams(expandOnlyParams, params);
      return expandObject(operations.retrievePaymentIntent(id), input.expand, operations);
    },
  },
  {
    method: 'GET',
    pattern: new RegExp(`^/v1/charges/${ID}$`),
    handle({ params, pathIds: [id = ''] }, operations) {
      const input = parseParams(expandOnlyParams, params);
      return expandObject(operations.retrieveCharge(id), input.expand, operations);
    },
  },
];

// The account's default API version when a request names none: the one the pinned SDK speaks.
const ACCOUNT_API_VERSION = Stripe.API_VERSION;

export async function handleApiRequest(
  request: IncomingMessage,
  response: ServerResponse,
  url: URL,
  operations: PaymentOperations,
  state: PaymentsState,
): Promise<void> {
  const requestId = newObjectId('req_', 14);
  const apiVersion = headerValue(request, 'stripe-version') ?? ACCOUNT_API_VERSION;
  const idempotencyKey = request.method === 'POST' ? headerValue(request, 'idempotency-key') : null;
  const headers: Record<string, string> = { 'Request-Id': requestId, 'Stripe-Version': apiVersion };
  if (idempotencyKey) headers['Idempotency-Key'] = idempotencyKey;
  const reply = (status: number, body: unknown, extraHeaders: Record<string, string> = {}) =>
    sendJson(response, status, body, { ...headers, ...extraHeaders });

  try {
    const apiKey = authenticate(request);
    const body = request.method === 'POST' ? await readBody(request) : '';
    const idempotencyScope = idempotencyKey ? `${apiKey}\u0000${idempotencyKey}` : null;
    if (idempotencyScope) {
      const earlier = state.idempotency.get(idempotencyScope);
      if (earlier) {
        if (earlier.method !== request.method || earlier.path !== url.pathname || earlier.body !== body) {
          throw new StripeApiError(
            400,
            'idempotency_error',
            `Keys for idempotent requests can only be used with the same parameters they were first used with. Try using a key other than '${idempotencyKey}' if you meant to execute a different request.`,
          );
        }
        reply(earlier.status, earlier.response, { 'Idempotent-Replayed': 'true' });
        return;
      }
    }

    const [status, result] = route(request.method ?? 'GET', url, body, operations, {
      requestId,
      idempotencyKey,
      apiVersion,
    });
    // Stripe keeps the outcome of an idempotent request, errors included, except server faults.
    if (idempotencyScope && status < 500) {
      state.idempotency.set(idempotencyScope, {
        method: request.method ?? 'POST',
        path: url.pathname,
        body,
        status,
        response: result,
      });
      state.save();
    }
    reply(status, result);
  } catch (error) {
    const failure = toStripeError(error);
    reply(failure.status, failure.toBody(requestId));
  }
}

function route(
  method: string,
  url: URL,
  body: string,
  operations: PaymentOperations,
  context: RequestContext,
): [number, unknown] {
  for (const candidate of ROUTES) {
    const match = candidate.pattern.exec(url.pathname);
    if (!match || candidate.method !== method) continue;
    try {
      const params = parseFormEncoded(method === 'POST' ? body : url.search.slice(1));
      const pathIds = match.slice(1).map((segment) => decodeURIComponent(segment));
      return [200, candidate.handle({ params, pathIds, context }, operations)];
    } catch (error) {
      const failure = toStripeError(error);
      return [failure.status, failure.toBody(context.requestId ?? '')];
    }
  }
  throw new StripeApiError(
    404,
    'invalid_request_error',
    `Unrecognized request URL (${method}: ${url.pathname}). Please see https://stripe.com/docs or we can help at https://support.stripe.com/.`,
  );
}

function authenticate(request: IncomingMessage): string {
  const header = headerValue(request, 'authorization') ?? '';
  const [scheme = '', credentials = ''] = header.split(/\s+/, 2);
  let key = '';
  if (scheme.toLowerCase() === 'bearer') key = credentials;
  // Stripe also takes the key as the user name of HTTP basic auth (curl -u sk_test_…:).
  if (scheme.toLowerCase() === 'basic') key = Buffer.from(credentials, 'base64').toString('utf8').split(':')[0] ?? '';
  if (!key) {
    throw new StripeApiError(
      401,
      'invalid_request_error',
      "You did not provide an API key. You need to provide your API key in the Authorization header, using Bearer auth (e.g. 'Authorization: Bearer YOUR_SECRET_KEY').",
    );
  }
  // Test-mode secret keys only: a live key here would mean the app is misconfigured.
  if (!/^sk_test_\w+$/.test(key)) {
    throw new StripeApiError(401, 'invalid_request_error', `Invalid API Key provided: ${redactKey(key)}`);
  }
  return key;
}

function redactKey(key: string): string {
  return key.length <= 12 ? `${key.slice(0, 3)}***` : `${key.slice(0, 8)}${'*'.repeat(key.length - 12)}${key.slice(-4)}`;
}

function headerValue(request: IncomingMessage, name: string): string | null {
  const value = request.headers[name];
  return (Array.isArray(value) ? value[0] : value) ?? null;
}

function toStripeError(error: unknown): StripeApiError {
  if (error instanceof StripeApiError) return error;
  if (error instanceof FormEncodingError) return invalidRequest(error.message);
  if (error instanceof BodyTooLargeError) return new StripeApiError(413, 'invalid_request_error', error.message);
  console.error('payments stand-in: unexpected error', error);
  return new StripeApiError(500, 'api_error', 'An unexpected error occurred in the payments stand-in.');
}
