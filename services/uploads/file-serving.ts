import type { IncomingMessage, ServerResponse } from 'node:http';
import type { FileStore, StoredFile } from './file-store.js';
import { requestOrigin, sendError } from './http-io.js';
import { checkSignedUrl } from './signing.js';

export interface ServingContext {
  apiKey: string;
  store: FileStore;
}

// Keys never change content, so a browser may keep a photo for a day; private files are not cached.
const PUBLIC_CACHE = 'public, max-age=86400, immutable';

function contentDisposition(file: StoredFile): string {
  const asciiName = file.name.replace(/[^\x20-\x7e]|["\\]/g, '_');
  return `${file.contentDisposition}; filename="${asciiName}"; filename*=UTF-8''${encodeURIComponent(file.name)}`;
}

/** One "bytes=a-b" range, as browsers send when seeking; anything else is served whole. */
function parseRange(header: string | undefined, size: number): { start: number; end: number } | 'unsatisfiable' | null {
  const match = /^bytes=(\d*)-(\d*)$/.exec(header ?? '');
  if (!match || (match[1] === '' && match[2] === '')) return null;
  const start = match[1] === '' ? Math.max(0, size - Number(match[2])) : Number(match[1]);
  const end = match[1] === '' || match[2] === '' ? size - 1 : Math.min(Number(match[2]), size - 1);
  if (start > end || start >= size) return 'unsatisfiable';
  return { start, end };
}

/**
 * GET/HEAD /f/<key> and /a/<appId>/<key>. Private files need a URL signed with the
 * apiKey, as made by UTApi.generateSignedURL or /v6/requestFileAccess.
 */
export async function serveFile(key: string, req: IncomingMessage, res: ServerResponse, ctx: ServingContext): Promise<void> {
  const file = ctx.store.get(key);
  if (!file) {
    sendError(res, 404, 'File not found');
    return;
  }
  if (file.acl === 'private') {
    const check = checkSignedUrl(requestOrigin(req), req.url ?? '/', ctx.apiKey);
    if (!check.ok) {
      sendError(res, 403, 'This file is private; use a signed URL');
      return;
    }
  }
  const bytes = await ctx.store.readBytes(key);
  const headers: Record<string, string> = {
    'content-type': file.type || 'application/octet-stream',
    'content-disposition': contentDisposition(file),
    'cache-control': file.acl === 'private' ? 'private, no-store' : PUBLIC_CACHE,
    etag: `"${file.fileHash}"`,
    'accept-ranges': 'bytes',
  };
  const range = parseRange(req.headers.range, bytes.length);
  if (range === 'unsatisfiable') {
    res.writeHead(416, { ...headers, 'content-range': `bytes */${bytes.length}` });
    res.end();
    return;
  }
  const body = range ? bytes.subarray(range.start, range.end + 1) : bytes;
  if (range) headers['content-range'] = `bytes ${range.start}-${range.end}/${bytes.length}`;
  headers['content-length'] = String(body.length);
  res.writeHead(range ? 206 : 200, headers);
  res.end(req.method === 'HEAD' ? undefined : body);
}
