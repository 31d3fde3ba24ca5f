import { createServer, type IncomingHttpHeaders } from 'node:http';
import type { AddressInfo } from 'node:net';

// A stand-in for the app's webhook endpoint in tests: records every POST and answers with the
// next status from a script (then 200), so a test can make the endpoint fail on purpose.

export interface ReceivedWebhook {
  body: string;
  signature: string | undefined;
  headers: IncomingHttpHeaders;
  receivedAt: number;
}

export interface WebhookReceiver {
  url: string;
  received: ReceivedWebhook[];
  /** Statuses to answer with, in order; once used up the receiver answers 200. */
  answerWith(statuses: number[]): void;
  waitForCount(count: number, timeoutMs?: number): Promise<ReceivedWebhook[]>;
  /** Waits until `select` picks at least `count` of the webhooks received so far. */
  waitFor(select: (webhook: ReceivedWebhook) => boolean, count?: number, timeoutMs?: number): Promise<ReceivedWebhook[]>;
  close(): Promise<void>;
}

export async function startWebhookReceiver(): Promise<WebhookReceiver> {
  const received: ReceivedWebhook[] = [];
  let scriptedStatuses: number[] = [];
  let waiters: (() => void)[] = [];

  const server = createServer((request, response) => {
    const chunks: Buffer[] = [];
    request.on('data', (chunk: Buffer) => chunks.push(chunk));
    request.on('end', () => {
      const header = request.headers['stripe-signature'];
      received.push({
        body: Buffer.concat(chunks).toString('utf8'),
        signature: Array.isArray(header) ? header[0] : header,
        headers: request.headers,
        receivedAt: Date.now(),
      });
      const status = scriptedStatuses.shift() ?? 200;
      response.writeHead(status, { 'Content-Type': 'application/json' }).end(JSON.stringify({ received: true }));
      const pending = waiters;
      waiters = [];
      for (const check of pending) check();
    });
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as AddressInfo;

  const waitFor: WebhookReceiver['waitFor'] = (select, count = 1, timeoutMs = 5_000) =>
    new Promise((resolve, reject) => {
      const timer = setTimeout(
        () => reject(new Error(`expected ${count} matching webhooks within ${timeoutMs} ms, got ${received.filter(select).length}`)),
        timeoutMs,
      );
      const check = () => {
        const selected = received.filter(select);
        if (selected.length >= count) {
          clearTimeout(timer);
          resolve(selected);
        } else {
          waiters.push(check);
        }
      };
      check();
    });

  return {
    url: `http://127.0.0.1:${port}/api/payments/webhook`,
    received,
    answerWith(statuses) {
      scriptedStatuses = [...statuses];
    },
    waitFor,
    waitForCount: (count, timeoutMs) => waitFor(() => true, count, timeoutMs),
    async close() {
      await new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeAllConnections();
      });
    },
  };
}
