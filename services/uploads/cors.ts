import type { IncomingMessage, ServerResponse } from 'node:http';

// Browsers upload straight from the app's pages to the ingest, so every response carries
// CORS headers. The uploadthing client sends Range, x-uploadthing-version and trace headers
// (b3, traceparent) and reads x-ut-range-start from the HEAD response before a PUT.
const ALLOWED_METHODS = 'GET, HEAD, PUT, POST, OPTIONS';
const DEFAULT_ALLOWED_HEADERS = 'content-type, range, x-uploadthing-version, b3, traceparent, tracestate';
const EXPOSED_HEADERS = 'x-ut-range-start, content-length, content-range, accept-ranges';

/**
 * No cookies or credentials travel on these requests, so echoing the caller's
 * origin admits the app wherever it runs (localhost:3000, a preview port, a phone on the LAN).
 */
export function applyCors(req: IncomingMessage, res: ServerResponse): void {
  const origin = req.headers.origin;
  res.setHeader('access-control-allow-origin', origin ?? '*');
  if (origin) res.setHeader('vary', 'origin');
  res.setHeader('access-control-allow-methods', ALLOWED_METHODS);
  const requested = req.headers['access-control-request-headers'];
  res.setHeader('access-control-allow-headers', typeof requested === 'string' && requested ? requested : DEFAULT_ALLOWED_HEADERS);
  res.setHeader('access-control-expose-headers', EXPOSED_HEADERS);
  res.setHeader('access-control-max-age', '600');
}

export function answerPreflight(res: ServerResponse): void {
  res.writeHead(204);
  res.end();
}
