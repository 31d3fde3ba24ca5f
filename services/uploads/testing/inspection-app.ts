import { createServer, type IncomingMessage, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import { createRouteHandler } from 'uploadthing/server';
import { createInspectionPhotoRouter, type CompletedPhoto } from './inspection-photo-router.js';

type RouteHandlerConfig = NonNullable<Parameters<typeof createRouteHandler>[0]['config']>;

export interface InspectionApp {
  url: string;
  /** Where the route handler is mounted, as the app mounts it under app/api/uploadthing. */
  routeUrl: string;
  completed: CompletedPhoto[];
  close(): Promise<void>;
}

export interface InspectionAppOptions {
  /** Passed to createRouteHandler; anything left out comes from UPLOADTHING_* environment variables. */
  config?: RouteHandlerConfig;
  /** Extra pages (path to HTML or JavaScript) for a browser to load from the app's origin. */
  pages?: Record<string, { contentType: string; body: string }>;
}

async function toFetchRequest(req: IncomingMessage, origin: string): Promise<Request> {
  const chunks: Buffer[] = [];
  for await (const chunk of req) chunks.push(chunk as Buffer);
  const headers = new Headers();
  for (const [name, value] of Object.entries(req.headers)) {
    if (typeof value === 'string') headers.set(name, value);
    else if (Array.isArray(value)) for (const item of value) headers.append(name, item);
  }
  const hasBody = req.method !== 'GET' && req.method !== 'HEAD';
  return new Request(new URL(req.url ?? '/', origin), {
    method: req.method,
    headers,
    body: hasBody ? Buffer.concat(chunks) : undefined,
  });
}

async function sendFetchResponse(response: Response, res: ServerResponse): Promise<void> {
  const body = Buffer.from(await response.arrayBuffer());
  res.writeHead(response.status, Object.fromEntries(response.headers));
  res.end(body);
}

/**
 * A small Node server standing in for the Next.js app: it mounts the real uploadthing
 * route handler at /api/uploadthing exactly as a Fetch handler, which is what the
 * Next adapter does too.
 */
export async function startInspectionApp(options: InspectionAppOptions = {}): Promise<InspectionApp> {
  const completed: CompletedPhoto[] = [];
  const handler = createRouteHandler({ router: createInspectionPhotoRouter(completed), config: { logLevel: 'Error', ...options.config } });
  const server = createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as AddressInfo;
  // localhost rather than 127.0.0.1, as the project's browser tests address the app.
  const url = `http://localhost:${port}`;

  server.on('request', (req: IncomingMessage, res: ServerResponse) => {
    const pathname = (req.url ?? '/').split('?')[0]!;
    const page = options.pages?.[pathname];
    if (page) {
      res.writeHead(200, { 'content-type': page.contentType });
      res.end(page.body);
      return;
    }
    if (pathname !== '/api/uploadthing') {
      res.writeHead(404).end();
      return;
    }
    toFetchRequest(req, url)
      .then((request) => handler(request))
      .then((response) => sendFetchResponse(response, res))
      .catch((error: Error) => {
        res.writeHead(500, { 'content-type': 'text/plain' });
        res.end(error.stack ?? error.message);
      });
  });

  return {
    url,
    routeUrl: `${url}/api/uploadthing`,
    completed,
    close: () =>
      new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeAllConnections();
      }),
  };
}
