import type { IncomingMessage, ServerResponse } from 'node:http';

// Small request/response helpers shared by the stand-in's routes (node:http has no body parser).

export class BodyTooLargeError extends Error {}

const DEFAULT_BODY_LIMIT_BYTES = 1_000_000;

export async function readBody(request: IncomingMessage, limitBytes = DEFAULT_BODY_LIMIT_BYTES): Promise<string> {
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const chunk of request) {
    const buffer = chunk as Buffer;
    size += buffer.length;
    if (size > limitBytes) throw new BodyTooLargeError(`Request body exceeds ${limitBytes} bytes`);
    chunks.push(buffer);
  }
  return Buffer.concat(chunks).toString('utf8');
}

export function sendJson(
  response: ServerResponse,
  status: number,
  body: unknown,
  headers: Record<string, string> = {},
): void {
  const text = JSON.stringify(body, null, 2);
  response.writeHead(status, {
    ...headers,
    'Content-Type': 'application/json',
    'Content-Length': Buffer.byteLength(text),
    'Cache-Control': 'no-store',
  });
  response.end(text);
}

// The checkout page needs no script, frames or remote resources, so the policy forbids them.
const PAGE_SECURITY_POLICY = "default-src 'none'; style-src 'unsafe-inline'; base-uri 'none'; frame-ancestors 'none'";

export function sendHtml(response: ServerResponse, status: number, html: string): void {
  response.writeHead(status, {
    'Content-Type': 'text/html; charset=utf-8',
    'Content-Length': Buffer.byteLength(html),
    'Content-Security-Policy': PAGE_SECURITY_POLICY,
    'Cache-Control': 'no-store',
  });
  response.end(html);
}

/** 303 so the browser follows a form POST with a GET, as after any hosted payment page. */
export function redirectAfterPost(response: ServerResponse, location: string): void {
  response.writeHead(303, { Location: location, 'Content-Length': 0 });
  response.end();
}

export function escapeHtml(text: string): string {
  return text
    .replaceAll('&', '&amp;')
    .replaceAll('<', '&lt;')
    .replaceAll('>', '&gt;')
    .replaceAll('"', '&quot;')
    .replaceAll("'", '&#39;');
}
