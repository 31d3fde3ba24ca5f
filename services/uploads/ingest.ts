import { createHash } from 'node:crypto';
import type { IncomingMessage, ServerResponse } from 'node:http';
import { buildCallbackBody, postCallbackToApp, writeDevCallbackLine, type FileUrls } from './app-callback.js';
import type { ContentDisposition, FileAcl, FileStore, StoredFile } from './file-store.js';
import { BodyTooLargeError, readBody, requestOrigin, sendError, sendJson } from './http-io.js';
import { checkSignedUrl } from './signing.js';
import type { UploadRegistration, UploadRegistry } from './upload-registry.js';

export interface IngestContext {
  apiKey: string;
  appId: string;
  store: FileStore;
  registry: UploadRegistry;
  fileUrls: (key: string) => FileUrls;
  /** Used when an upload names a route but the app never registered it (see README). */
  fallbackCallbackUrl?: string;
  /** How long an upload waits for the app's registration and for its onUploadComplete result. */
  registrationWaitMs: number;
  resultWaitMs: number;
  log: (line: string) => void;
}

// Room for the multipart boundary and part headers around the file; the file itself
// is measured exactly once the form is parsed.
const MULTIPART_ALLOWANCE_BYTES = 64 * 1024;

interface PresignedUpload {
  key: string;
  name: string;
  declaredSize: number;
  type: string;
  slug: string | null;
  customId: string | null;
  contentDisposition: ContentDisposition;
  acl: FileAcl;
}

/**
 * The SDK URI-encodes each data value before URLSearchParams encodes it again, so a
 * value read back through URLSearchParams still needs one decodeURIComponent.
 */
function readSignedValue(params: URLSearchParams, name: string): string | null {
  const value = params.get(name);
  return value === null ? null : decodeURIComponent(value);
}

/** Verifies the presigned URL and reads what the app's route handler put into it. */
function readPresignedUpload(req: IncomingMessage, res: ServerResponse, ctx: IngestContext): PresignedUpload | null {
  const pathAndQuery = req.url ?? '/';
  const check = checkSignedUrl(requestOrigin(req), pathAndQuery, ctx.apiKey);
  if (!check.ok) {
    const message = check.reason === 'expired' ? 'The upload URL has expired' : 'Invalid upload URL signature';
    sendError(res, 403, message);
    return null;
  }
  const { params } = check;
  if (readSignedValue(params, 'x-ut-identifier') !== ctx.appId) {
    sendError(res, 403, 'The upload URL was signed for another app');
    return null;
  }
  const declaredSize = Number(readSignedValue(params, 'x-ut-file-size'));
  if (!Number.isSafeInteger(declaredSize) || declaredSize < 0) {
    sendError(res, 400, 'The upload URL carries no valid file size');
    return null;
  }
  const key = decodeURIComponent(pathAndQuery.split('?')[0]!.slice(1));
  return {
    key,
    declaredSize,
    name: readSignedValue(params, 'x-ut-file-name') ?? key,
    type: readSignedValue(params, 'x-ut-file-type') ?? 'application/octet-stream',
    slug: readSignedValue(params, 'x-ut-slug'),
    customId: readSignedValue(params, 'x-ut-custom-id'),
    contentDisposition: readSignedValue(params, 'x-ut-content-disposition') === 'attachment' ? 'attachment' : 'inline',
    acl: readSignedValue(params, 'x-ut-acl') === 'private' ? 'private' : 'public-read',
  };
}

/**
 * HEAD tells a resuming client where to continue. Partial uploads are not kept,
 * so every upload starts from byte 0 and a paused upload simply sends the whole file again.
 */
export function handleIngestHead(req: IncomingMessage, res: ServerResponse, ctx: IngestContext): void {
  if (!readPresignedUpload(req, res, ctx)) return;
  res.writeHead(200, { 'x-ut-range-start': '0' });
  res.end();
}

function rangeStart(req: IncomingMessage): number {
  const match = /^bytes=(\d+)-/.exec(req.headers.range ?? '');
  return match ? Number(match[1]) : 0;
}

/** The browser client sends multipart/form-data with one "file" part; a bare body is accepted as the file too. */
async function extractFileBytes(req: IncomingMessage, body: Buffer): Promise<Uint8Array | null> {
  const contentType = req.headers['content-type'] ?? '';
  if (!contentType.startsWith('multipart/form-data')) return body;
  const form = await new Response(new Blob([new Uint8Array(body)]), { headers: { 'content-type': contentType } }).formData();
  const part = form.get('file');
  if (part === null || typeof part === 'string') return null;
  return new Uint8Array(await part.arrayBuffer());
}

async function findRegistration(upload: PresignedUpload, req: IncomingMessage, ctx: IngestContext): Promise<UploadRegistration | undefined> {
  // Uploads made by UTApi.uploadFiles carry no route, so no app callback follows them.
  if (upload.slug === null) return undefined;
  const registered = await ctx.registry.waitForRegistration(upload.key, ctx.registrationWaitMs);
  if (registered) return registered;
  if (!ctx.fallbackCallbackUrl) return undefined;
  ctx.log(`upload ${upload.key} was never registered by the app; calling back ${ctx.fallbackCallbackUrl} without metadata`);
  return {
    metadata: {},
    callbackUrl: ctx.fallbackCallbackUrl,
    callbackSlug: upload.slug,
    awaitServerData: true,
    isDev: false,
    origin: requestOrigin(req),
  };
}

/** Runs the app's onUploadComplete through its callback and, when the route asks for it, waits for its result. */
async function notifyApp(file: StoredFile, registration: UploadRegistration, ctx: IngestContext): Promise<{ serverData: unknown } | { error: string }> {
  const body = buildCallbackBody(file, ctx.fileUrls(file.key), registration);
  const result = ctx.registry.waitForResult(file.key, ctx.resultWaitMs);
  try {
    if (registration.isDev) {
      writeDevCallbackLine(body, registration, ctx.apiKey);
      const stream = registration.devStream;
      stream?.pendingKeys.delete(file.key);
      if (stream && stream.pendingKeys.size === 0) stream.response.end();
    } else if (registration.awaitServerData) {
      await postCallbackToApp(body, registration, ctx.apiKey);
    } else {
      postCallbackToApp(body, registration, ctx.apiKey).catch((error: Error) => ctx.log(`callback for ${file.key} failed: ${error.message}`));
    }
  } catch (error) {
    ctx.registry.settle(file.key, { ok: false, error: (error as Error).message });
  }
  if (!registration.awaitServerData) {
    result.then((outcome) => {
      if (!outcome.ok) ctx.log(`upload ${file.key}: ${outcome.error}`);
    });
    return { serverData: null };
  }
  const outcome = await result;
  return outcome.ok ? { serverData: outcome.serverData } : { error: outcome.error };
}

export async function handleIngestPut(req: IncomingMessage, res: ServerResponse, ctx: IngestContext): Promise<void> {
  const upload = readPresignedUpload(req, res, ctx);
  if (!upload) return;
  if (rangeStart(req) !== 0) {
    res.setHeader('content-range', 'bytes */0');
    sendError(res, 416, 'Partial uploads are not kept; send the file from byte 0');
    return;
  }
  const registration = await findRegistration(upload, req, ctx);
  if (upload.slug !== null && !registration) {
    sendError(res, 409, `The app never registered upload ${upload.key} for route ${upload.slug}`);
    return;
  }

  let bytes: Uint8Array | null;
  try {
    const body = await readBody(req, upload.declaredSize + MULTIPART_ALLOWANCE_BYTES);
    bytes = await extractFileBytes(req, body);
  } catch (error) {
    if (error instanceof BodyTooLargeError) {
      res.setHeader('connection', 'close');
      sendError(res, 413, `The file is larger than the ${upload.declaredSize} bytes the upload URL allows`);
      return;
    }
    throw error;
  }
  if (!bytes) {
    sendError(res, 400, 'The upload carries no "file" part');
    return;
  }
  // The route handler checked the declared size against the route's maxFileSize and
  // signed it into the URL, so holding the bytes to that size enforces the route limit.
  if (bytes.byteLength > upload.declaredSize) {
    sendError(res, 413, `The file is ${bytes.byteLength} bytes, more than the ${upload.declaredSize} bytes the upload URL allows`);
    return;
  }

  const stored = await ctx.store.put(
    {
      key: upload.key,
      customId: upload.customId,
      name: upload.name,
      size: bytes.byteLength,
      type: upload.type,
      fileHash: createHash('md5').update(bytes).digest('hex'),
      acl: upload.acl,
      contentDisposition: upload.contentDisposition,
    },
    bytes,
  );
  const urls = ctx.fileUrls(stored.key);
  const answer = registration ? await notifyApp(stored, registration, ctx) : { serverData: null };
  ctx.registry.forget(stored.key);
  if ('error' in answer) {
    sendError(res, 502, answer.error);
    return;
  }
  sendJson(res, 200, { ...urls, fileHash: stored.fileHash, serverData: answer.serverData });
}
