import { createServer, type IncomingMessage, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import { handleApiRequest } from './api-routes';
import { handleCheckoutRequest } from './checkout-routes';
import { handleControlRequest } from './control-routes';
import { PaymentOperations } from './payment-operations';
import { PaymentsState } from './payments-state';
import { WebhookDispatcher } from './webhook-dispatcher';

// The payments stand-in: a local stand-in for the hosted payment service that the app reaches
// through the real Stripe SDK (host/port/protocol pointed here). One HTTP server carries the
// REST API (/v1), the buyer's checkout page (/checkout) and the test control API (/__control).

export interface PaymentsStandInOptions {
  port: number;
  host?: string;
  /** The app's webhook endpoint that events are POSTed to. */
  webhookUrl: string;
  /** The `whsec_…` secret the app verifies Stripe-Signature headers with. */
  webhookSecret: string;
  /** Base of the URLs handed to browsers (checkout page); defaults to http://localhost:<port>. */
  publicUrl?: string;
  /** Waits between webhook attempts; attempts = 1 + length. */
  retryDelaysMs?: number[];
  /** JSON file that keeps sessions, payments and events across restarts. */
  stateFile?: string;
  /** How often open sessions are checked against their expires_at. */
  expiryCheckIntervalMs?: number;
}

export interface PaymentsStandIn {
  url: string;
  close(): Promise<void>;
}

// Stripe retries for days with exponential back-off; locally the same shape, in seconds.
export const DEFAULT_RETRY_DELAYS_MS = [1_000, 2_000, 4_000, 8_000, 16_000];

export async function startPaymentsStandIn(options: PaymentsStandInOptions): Promise<PaymentsStandIn> {
  const host = options.host ?? '127.0.0.1';
  const retryDelaysMs = options.retryDelaysMs ?? DEFAULT_RETRY_DELAYS_MS;
  const state = new PaymentsState(options.stateFile);
  const dispatcher = new WebhookDispatcher({
    endpointUrl: options.webhookUrl,
    secret: options.webhookSecret,
    retryDelaysMs,
  });
  let publicUrl = options.publicUrl ?? '';
  const operations = new PaymentOperations(
    state,
    (sessionId) => `${publicUrl}/checkout/${sessionId}`,
    (event) => dispatcher.dispatch(event),
  );

  const server = createServer((request, response) => {
    void route(request, response).catch((error: unknown) => {
      console.error('payments stand-in: request failed', error);
      if (!response.headersSent) response.writeHead(500);
      response.end();
    });
  });

  async function route(request: IncomingMessage, response: ServerResponse): Promise<void> {
    const url = new URL(request.url ?? '/', 'http://stand-in.invalid');
    if (url.pathname.startsWith('/v1/')) return handleApiRequest(request, response, url, operations, state);
    if (url.pathname.startsWith('/checkout/')) return handleCheckoutRequest(request, response, url, operations);
    if (url.pathname.startsWith('/__control/')) {
      return handleControlRequest(request, response, url, {
        state,
        dispatcher,
        retryDelaysMs,
        reset() {
          state.clear();
          dispatcher.forget();
        },
      });
    }
    response.writeHead(404, { 'Content-Type': 'text/plain; charset=utf-8' }).end('Not found\n');
  }

  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port, host, () => {
      server.off('error', reject);
      resolve();
    });
  });
  const { port } = server.address() as AddressInfo;
  // Browsers are sent to localhost: the app's own URLs use localhost (Next rewrites 127.0.0.1).
  publicUrl = (options.publicUrl ?? `http://localhost:${port}`).replace(/\/+$/, '');

  const expiryCheck = setInterval(() => operations.expireOverdueSessions(), options.expiryCheckIntervalMs ?? 5_000);
  expiryCheck.unref();

  return {
    url: `http://${host}:${port}`,
    async close() {
      clearInterval(expiryCheck);
      dispatcher.close();
      await new Promise<void>((resolve, reject) => {
        server.close((error) => (error ? reject(error) : resolve()));
        server.closeAllConnections();
      });
    },
  };
}
