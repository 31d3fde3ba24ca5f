import type { IncomingMessage, ServerResponse } from 'node:http';
import {
  renderCancelledPage,
  renderCheckoutPage,
  renderClosedSessionPage,
  renderUnknownSessionPage,
} from './checkout-page';
import { readBody, redirectAfterPost, sendHtml } from './http-io';
import type { PaymentOperations } from './payment-operations';
import type { CheckoutSession } from './stripe-objects';

// The buyer's side of a checkout session: the page at `session.url` and its Pay and Cancel forms.

const PAGE = /^\/checkout\/([^/]+)$/;
const PAY = /^\/checkout\/([^/]+)\/pay$/;
const CANCEL = /^\/checkout\/([^/]+)\/cancel$/;

export async function handleCheckoutRequest(
  request: IncomingMessage,
  response: ServerResponse,
  url: URL,
  operations: PaymentOperations,
): Promise<void> {
  const [, pageId] = PAGE.exec(url.pathname) ?? [];
  const [, payId] = PAY.exec(url.pathname) ?? [];
  const [, cancelId] = CANCEL.exec(url.pathname) ?? [];
  const sessionId = decodeURIComponent(pageId ?? payId ?? cancelId ?? '');
  const session = findSession(operations, sessionId);
  if (!session) {
    sendHtml(response, 404, renderUnknownSessionPage());
    return;
  }

  if (pageId && request.method === 'GET') {
    if (session.status !== 'open') sendHtml(response, 410, renderClosedSessionPage(session));
    else sendHtml(response, 200, renderCheckoutPage(session, operations.checkoutLineItems(session.id)));
    return;
  }

  if (payId && request.method === 'POST') {
    if (session.status !== 'open') {
      sendHtml(response, 409, renderClosedSessionPage(session));
      return;
    }
    const form = new URLSearchParams(await readBody(request));
    const email = form.get('email')?.trim() || null;
    if (!session.customer_email && !email) {
      sendHtml(response, 400, renderCheckoutPage(session, operations.checkoutLineItems(session.id)));
      return;
    }
    const paid = operations.completeCheckoutSession(session.id, email);
    redirectAfterPost(response, successUrl(paid));
    return;
  }

  if (cancelId && request.method === 'POST') {
    // Leaving the page does not close the session in Stripe either: it stays open until it expires.
    if (session.cancel_url) redirectAfterPost(response, session.cancel_url);
    else sendHtml(response, 200, renderCancelledPage());
    return;
  }

  response.writeHead(405, { Allow: pageId ? 'GET' : 'POST' }).end();
}

/** Stripe fills the `{CHECKOUT_SESSION_ID}` template variable in success_url. */
function successUrl(session: CheckoutSession): string {
  return (session.success_url ?? '').replaceAll('{CHECKOUT_SESSION_ID}', session.id);
}

function findSession(operations: PaymentOperations, id: string): CheckoutSession | null {
  if (!id) return null;
  try {
    return operations.retrieveCheckoutSession(id);
  } catch {
    return null;
  }
}
