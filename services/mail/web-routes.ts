import type { IncomingMessage, ServerResponse } from 'node:http';
import { renderMessage, renderMessageList, renderNotFound } from './pages';
import type { MessageStore } from './message-store';

// The sink's HTTP side: pages for people and a JSON API for tests.
//   GET    /api/messages[?to=address][&waitMs=n]   newest first; waitMs long-polls for a first match
//   GET    /api/messages/:id                       one message
//   GET    /api/messages/:id/raw                   the message as received (message/rfc822)
//   GET    /api/messages/:id/attachments/:index    an attachment's bytes
//   DELETE /api/messages                           forget every message

const LONGEST_WAIT_MS = 30_000;

// Pages load nothing remote and run no script; the only frame is our own sandboxed HTML view.
const PAGE_POLICY = "default-src 'none'; style-src 'unsafe-inline'; frame-src 'self'; form-action 'self'; base-uri 'none'";
// A received HTML body may show inline and data: images and its own styles, and nothing else;
// `sandbox` keeps it script-free and on an opaque origin even when opened outside the frame.
const MAIL_HTML_POLICY = "default-src 'none'; img-src data: cid:; style-src 'unsafe-inline'; sandbox";

interface Route {
  method: string;
  pattern: RegExp;
  handle(context: { params: string[]; url: URL; response: ServerResponse; store: MessageStore }): Promise<void> | void;
}

const ROUTES: Route[] = [
  {
    method: 'GET',
    pattern: /^\/api\/messages$/,
    async handle({ url, response, store }) {
      const recipient = url.searchParams.get('to') ?? undefined;
      const waitMs = Math.min(Number(url.searchParams.get('waitMs') ?? 0) || 0, LONGEST_WAIT_MS);
      if (waitMs > 0 && store.list(recipient).length === 0) await store.waitForMessage(recipient, waitMs);
      sendJson(response, 200, { messages: store.list(recipient) });
    },
  },
  {
    method: 'DELETE',
    pattern: /^\/api\/messages$/,
    handle({ response, store }) {
      sendJson(response, 200, { deleted: store.clear() });
    },
  },
  {
    method: 'GET',
    pattern: /^\/api\/messages\/([^/]+)$/,
    handle({ params: [id = ''], response, store }) {
      const mail = store.get(id);
      if (mail) sendJson(response, 200, mail.message);
      else sendJson(response, 404, { error: `no message ${id}` });
    },
  },
  {
    method: 'GET',
    pattern: /^\/api\/messages\/([^/]+)\/raw$/,
    handle({ params: [id = ''], response, store }) {
      const mail = store.get(id);
      if (!mail) return sendJson(response, 404, { error: `no message ${id}` });
      response.writeHead(200, { 'Content-Type': 'message/rfc822', 'Content-Length': mail.raw.length });
      response.end(mail.raw);
    },
  },
  {
    method: 'GET',
    pattern: /^\/api\/messages\/([^/]+)\/attachments\/(\d+)$/,
    handle({ params: [id = '', index = ''], response, store }) {
      const mail = store.get(id);
      const attachment = mail?.message.attachments[Number(index)];
      const content = mail?.attachmentContents[Number(index)];
      if (!attachment || !content) return sendJson(response, 404, { error: `no attachment ${index} on message ${id}` });
      const filename = attachment.filename ?? `attachment-${attachment.index + 1}`;
      response.writeHead(200, {
        'Content-Type': attachment.contentType,
        'Content-Length': content.length,
        'Content-Disposition': `attachment; filename*=UTF-8''${encodeURIComponent(filename)}`,
        'X-Content-Type-Options': 'nosniff',
      });
      response.end(content);
    },
  },
  {
    method: 'GET',
    pattern: /^\/$/,
    handle({ url, response, store }) {
      const recipient = url.searchParams.get('to');
      sendHtml(response, 200, renderMessageList(store.list(recipient ?? undefined), recipient));
    },
  },
  {
    method: 'POST',
    pattern: /^\/messages\/clear$/,
    handle({ response, store }) {
      store.clear();
      response.writeHead(303, { Location: '/' }).end();
    },
  },
  {
    method: 'GET',
    pattern: /^\/messages\/([^/]+)$/,
    handle({ params: [id = ''], response, store }) {
      const mail = store.get(id);
      if (mail) sendHtml(response, 200, renderMessage(mail.message));
      else sendHtml(response, 404, renderNotFound());
    },
  },
  {
    method: 'GET',
    pattern: /^\/messages\/([^/]+)\/html$/,
    handle({ params: [id = ''], response, store }) {
      const html = store.get(id)?.message.html;
      if (!html) return sendHtml(response, 404, renderNotFound());
      response.writeHead(200, {
        'Content-Type': 'text/html; charset=utf-8',
        'Content-Security-Policy': MAIL_HTML_POLICY,
        'X-Content-Type-Options': 'nosniff',
        'Cache-Control': 'no-store',
      });
      response.end(html);
    },
  },
];

export async function handleWebRequest(request: IncomingMessage, response: ServerResponse, store: MessageStore): Promise<void> {
  const url = new URL(request.url ?? '/', 'http://mail-sink.invalid');
  const matching = ROUTES.filter((route) => route.pattern.test(url.pathname));
  const route = matching.find((candidate) => candidate.method === request.method);
  if (!route) {
    if (matching.length > 0) {
      response.writeHead(405, { Allow: matching.map((candidate) => candidate.method).join(', ') }).end();
    } else {
      sendJson(response, 404, { error: `no route ${request.method} ${url.pathname}` });
    }
    return;
  }
  const params = (route.pattern.exec(url.pathname) ?? []).slice(1).map((part) => decodeURIComponent(part));
  await route.handle({ params, url, response, store });
}

function sendJson(response: ServerResponse, status: number, body: unknown): void {
  const text = JSON.stringify(body, null, 2);
  response.writeHead(status, {
    'Content-Type': 'application/json; charset=utf-8',
    'Content-Length': Buffer.byteLength(text),
    'Cache-Control': 'no-store',
  });
  response.end(text);
}

function sendHtml(response: ServerResponse, status: number, html: string): void {
  response.writeHead(status, {
    'Content-Type': 'text/html; charset=utf-8',
    'Content-Length': Buffer.byteLength(html),
    'Content-Security-Policy': PAGE_POLICY,
    'Cache-Control': 'no-store',
  });
  response.end(html);
}
