import type { IncomingMessage, ServerResponse } from 'node:http';
import { z } from 'zod';
import type { FileStore, StoredFile } from './file-store.js';
import { requestOrigin, readJson, sendError, sendJson } from './http-io.js';
import { createSignedUrl } from './signing.js';
import type { UploadRegistry } from './upload-registry.js';

export interface ApiContext {
  apiKey: string;
  store: FileStore;
  registry: UploadRegistry;
  fileUrl: (key: string) => string;
  /** A development stream left open by the app is ended after this long even if files never arrive. */
  devStreamMaxMs: number;
}

type ApiHandler = (body: unknown, ctx: ApiContext, req: IncomingMessage, res: ServerResponse) => Promise<void> | void;

// uploadthing's own list limit: it returns at most 500 files per page.
const DEFAULT_LIST_LIMIT = 500;
// getSignedURL without expiresIn uses the app's dashboard default; an hour matches the SDK's presign default.
const DEFAULT_ACCESS_SECONDS = 3600;
// The stand-in does not meter storage; the free plan's 2 GB is reported so usage screens have a ceiling to show.
const REPORTED_LIMIT_BYTES = 2 * 1024 ** 3;

const RouteMetadataBody = z.object({
  fileKeys: z.array(z.string()).min(1),
  metadata: z.record(z.string(), z.unknown()).nullish(),
  isDev: z.boolean().default(false),
  callbackUrl: z.url(),
  callbackSlug: z.string(),
  awaitServerData: z.boolean().default(true),
});

const CallbackResultBody = z.union([
  z.object({ fileKey: z.string(), error: z.string() }),
  z.object({ fileKey: z.string(), callbackData: z.unknown() }),
]);

const KeysOrCustomIds = z.union([
  z.object({ fileKeys: z.array(z.string()) }),
  z.object({ customIds: z.array(z.string()) }),
]);

const ListFilesBody = z.object({
  limit: z.number().int().positive().optional(),
  offset: z.number().int().nonnegative().optional(),
});

const KeyOrCustomId = z.union([z.object({ fileKey: z.string() }), z.object({ customId: z.string() })]);

const RequestFileAccessBody = z.intersection(KeyOrCustomId, z.object({ expiresIn: z.number().int().positive().optional() }));

const RenameFilesBody = z.object({
  updates: z.array(z.intersection(KeyOrCustomId, z.object({ newName: z.string().min(1) }))),
});

const UpdateAclBody = z.object({
  updates: z.array(z.intersection(KeyOrCustomId, z.object({ acl: z.enum(['public-read', 'private']) }))),
});

function resolveFiles(store: FileStore, selector: { fileKeys: string[] } | { customIds: string[] }): StoredFile[] {
  const found = 'fileKeys' in selector ? selector.fileKeys.map((key) => store.get(key)) : selector.customIds.map((id) => store.findByCustomId(id));
  return found.filter((file): file is StoredFile => file !== undefined);
}

function resolveFile(store: FileStore, selector: { fileKey: string } | { customId: string }): StoredFile | undefined {
  return 'fileKey' in selector ? store.get(selector.fileKey) : store.findByCustomId(selector.customId);
}

/** POST /route-metadata: the app's route handler registers presigned uploads and where to call back. */
const registerRouteMetadata: ApiHandler = (raw, ctx, req, res) => {
  const body = RouteMetadataBody.parse(raw);
  const registration = {
    metadata: body.metadata ?? {},
    callbackUrl: body.callbackUrl,
    callbackSlug: body.callbackSlug,
    awaitServerData: body.awaitServerData,
    isDev: body.isDev,
    origin: requestOrigin(req),
  };
  if (!body.isDev) {
    ctx.registry.register(body.fileKeys, registration);
    sendJson(res, 200, { ok: true });
    return;
  }
  // In development the response stays open and carries one JSON line per finished upload.
  res.writeHead(200, { 'content-type': 'application/x-ndjson', 'cache-control': 'no-store' });
  res.flushHeaders();
  const devStream = { response: res, pendingKeys: new Set(body.fileKeys) };
  const giveUp = setTimeout(() => res.end(), ctx.devStreamMaxMs);
  res.on('close', () => clearTimeout(giveUp));
  ctx.registry.register(body.fileKeys, { ...registration, devStream });
};

/** POST /callback-result: the app reports what onUploadComplete returned (or why forwarding failed). */
const receiveCallbackResult: ApiHandler = (raw, ctx, _req, res) => {
  const body = CallbackResultBody.parse(raw);
  if ('error' in body) ctx.registry.settle(body.fileKey, { ok: false, error: body.error });
  else ctx.registry.settle(body.fileKey, { ok: true, serverData: body.callbackData ?? null });
  sendJson(res, 200, { ok: true });
};

const listFiles: ApiHandler = (raw, ctx, _req, res) => {
  const { limit = DEFAULT_LIST_LIMIT, offset = 0 } = ListFilesBody.parse(raw);
  const all = ctx.store.list();
  const page = all.slice(offset, offset + limit);
  sendJson(res, 200, {
    hasMore: offset + page.length < all.length,
    files: page.map((file) => ({
      id: file.id,
      customId: file.customId,
      key: file.key,
      name: file.name,
      size: file.size,
      status: 'Uploaded',
      uploadedAt: file.uploadedAt,
    })),
  });
};

const deleteFiles: ApiHandler = async (raw, ctx, _req, res) => {
  const files = resolveFiles(ctx.store, KeysOrCustomIds.parse(raw));
  const deletedCount = await ctx.store.remove(files.map((file) => file.key));
  sendJson(res, 200, { success: true, deletedCount });
};

const getFileUrl: ApiHandler = (raw, ctx, _req, res) => {
  const files = resolveFiles(ctx.store, KeysOrCustomIds.parse(raw));
  sendJson(res, 200, { data: files.map((file) => ({ key: file.key, url: ctx.fileUrl(file.key) })) });
};

const requestFileAccess: ApiHandler = (raw, ctx, _req, res) => {
  const body = RequestFileAccessBody.parse(raw);
  const file = resolveFile(ctx.store, body);
  if (!file) {
    sendError(res, 404, 'File not found');
    return;
  }
  const signed = createSignedUrl(ctx.fileUrl(file.key), ctx.apiKey, body.expiresIn ?? DEFAULT_ACCESS_SECONDS);
  sendJson(res, 200, { url: signed, ufsUrl: signed });
};

const renameFiles: ApiHandler = async (raw, ctx, _req, res) => {
  for (const update of RenameFilesBody.parse(raw).updates) {
    const file = resolveFile(ctx.store, update);
    if (file) await ctx.store.update(file.key, { name: update.newName });
  }
  sendJson(res, 200, { success: true });
};

const updateAcl: ApiHandler = async (raw, ctx, _req, res) => {
  for (const update of UpdateAclBody.parse(raw).updates) {
    const file = resolveFile(ctx.store, update);
    if (file) await ctx.store.update(file.key, { acl: update.acl });
  }
  sendJson(res, 200, { success: true });
};

const getUsageInfo: ApiHandler = (_raw, ctx, _req, res) => {
  const files = ctx.store.list();
  const totalBytes = files.reduce((sum, file) => sum + file.size, 0);
  sendJson(res, 200, { totalBytes, appTotalBytes: totalBytes, filesUploaded: files.length, limitBytes: REPORTED_LIMIT_BYTES });
};

/** Every POST endpoint the SDK calls with its apiKey, by path. */
export const API_ROUTES: Readonly<Record<string, ApiHandler>> = {
  '/route-metadata': registerRouteMetadata,
  '/callback-result': receiveCallbackResult,
  '/v6/listFiles': listFiles,
  '/v6/deleteFiles': deleteFiles,
  '/v6/getFileUrl': getFileUrl,
  '/v6/requestFileAccess': requestFileAccess,
  '/v6/renameFiles': renameFiles,
  '/v6/updateACL': updateAcl,
  '/v6/getUsageInfo': getUsageInfo,
};

export async function handleApiRequest(handler: ApiHandler, req: IncomingMessage, res: ServerResponse, ctx: ApiContext): Promise<void> {
  if (req.headers['x-uploadthing-api-key'] !== ctx.apiKey) {
    sendError(res, 401, 'Missing or invalid x-uploadthing-api-key');
    return;
  }
  let body: unknown;
  try {
    body = await readJson(req);
  } catch {
    sendError(res, 400, 'The request body is not JSON');
    return;
  }
  try {
    await handler(body, ctx, req, res);
  } catch (error) {
    if (error instanceof z.ZodError) {
      sendJson(res, 400, { error: 'Invalid request body', issues: error.issues });
      return;
    }
    throw error;
  }
}
