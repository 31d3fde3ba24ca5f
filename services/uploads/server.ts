import { createServer, type IncomingMessage, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import { API_ROUTES, handleApiRequest, type ApiContext } from './api-routes.js';
import { answerPreflight, applyCors } from './cors.js';
import { FileStore } from './file-store.js';
import { serveFile, type ServingContext } from './file-serving.js';
import { sendError } from './http-io.js';
import { handleIngestHead, handleIngestPut, type IngestContext } from './ingest.js';
import { UploadRegistry } from './upload-registry.js';

export interface UploadsStandInOptions {
  port: number;
  host?: string;
  apiKey: string;
  appId: string;
  /** Folder for the stored files and their JSON index. */
  dataDir: string;
  /** Base of the file URLs handed back to the app and the browser; defaults to the listening address. */
  publicUrl?: string;
  /** The app's route handler, called back for uploads the app never registered (see README). */
  callbackUrl?: string;
  /** Where to write the one-line notices; defaults to console.log. */
  log?: (line: string) => void;
}

export interface UploadsStandIn {
  url: string;
  close(): Promise<void>;
}

// The app normally registers an upload before the browser starts it; this covers an
// app that hands out presigned URLs before its registration call has landed.
const REGISTRATION_WAIT_MS = 5_000;
// onUploadComplete usually writes a database row; a minute is generous and still ends a stuck upload.
const RESULT_WAIT_MS = 60_000;
// The SDK's presigned URLs live an hour by default, so a development stream never needs to outlive that.
const DEV_STREAM_MAX_MS = 60 * 60 * 1000;

type Route = {
  methods: readonly string[];
  pattern: RegExp;
  handle: (match: RegExpExecArray, req: IncomingMessage, res: ServerResponse) => Promise<void> | void;
};

export async function startUploadsStandIn(options: UploadsStandInOptions): Promise<UploadsStandIn> {
  const host = options.host ?? '127.0.0.1';
  const log = options.log ?? ((line: string) => console.log(line));
  const store = await FileStore.open(options.dataDir);
  const registry = new UploadRegistry();
  const server = createServer();
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port, host, () => {
      server.off('error', reject);
      resolve();
    });
  });
  const { port } = server.address() as AddressInfo;
  const listeningUrl = `http://${host.includes(':') ? `[${host}]` : host}:${port}`;
  const publicUrl = (options.publicUrl ?? listeningUrl).replace(/\/$/, '');
  const fileUrl = (key: string) => `${publicUrl}/f/${encodeURIComponent(key)}`;

  const ingest: IngestContext = {
    apiKey: options.apiKey,
    appId: options.appId,
    store,
    registry,
    fileUrls: (key) => ({
      url: fileUrl(key),
      appUrl: `${publicUrl}/a/${encodeURIComponent(options.appId)}/${encodeURIComponent(key)}`,
      ufsUrl: fileUrl(key),
    }),
    fallbackCallbackUrl: options.callbackUrl,
    registrationWaitMs: REGISTRATION_WAIT_MS,
    resultWaitMs: RESULT_WAIT_MS,
    log,
  };
  const api: ApiContext = { apiKey: options.apiKey, store, registry, fileUrl, devStreamMaxMs: DEV_STREAM_MAX_MS };
  const serving: ServingContext = { apiKey: options.apiKey, store };

  const routes: Route[] = [
    {
      methods: ['POST'],
      pattern: /^(\/route-metadata|\/callback-result|\/v6\/[A-Za-z]+)$/,
      handle: (match, req, res) => {
        const handler = API_ROUTES[match[1]!];
        if (!handler) return sendError(res, 404, `Unknown endpoint ${match[1]}`);
        return handleApiRequest(handler, req, res, api);
      },
    },
    { methods: ['GET', 'HEAD'], pattern: /^\/f\/([^/]+)$/, handle: (match, req, res) => serveFile(decodeURIComponent(match[1]!), req, res, serving) },
    {
      methods: ['GET', 'HEAD'],
      pattern: /^\/a\/([^/]+)\/([^/]+)$/,
      handle: (match, req, res) =>
        decodeURIComponent(match[1]!) === options.appId
          ? serveFile(decodeURIComponent(match[2]!), req, res, serving)
          : sendError(res, 404, 'Unknown app'),
    },
    { methods: ['HEAD'], pattern: /^\/([^/]+)$/, handle: (_match, req, res) => handleIngestHead(req, res, ingest) },
    { methods: ['PUT'], pattern: /^\/([^/]+)$/, handle: (_match, req, res) => handleIngestPut(req, res, ingest) },
  ];

  server.on('request', (req: IncomingMessage, res: ServerResponse) => {
    applyCors(req, res);
    if (req.method === 'OPTIONS') return answerPreflight(res);
    const pathname = (req.url ?? '/').split('?')[0]!;
    for (const route of routes) {
      const match = route.pattern.exec(pathname);
      if (!match || !route.methods.includes(req.method ?? '')) continue;
      Promise.resolve(route.handle(match, req, res)).catch((error: Error) => {
        log(`uploads: ${req.method} ${pathname} failed: ${error.stack ?? error.message}`);
        if (!res.headersSent) sendError(res, 500, 'The upload service failed');
        else res.destroy();
      });
      return;
    }
    sendError(res, 404, `No ${req.method} ${pathname}`);
  });

  return {
    url: listeningUrl,
    close: async () => {
      registry.closeAll();
      await new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeAllConnections();
      });
    },
  };
}
