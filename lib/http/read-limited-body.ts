import { AppError } from '@/lib/errors';

/**
 * The request body as text, read as a stream and refused with `too_large` as soon as it passes
 * `maxBytes` (or at once when Content-Length already says so), so an oversized body is never held
 * in memory whole nor parsed.
 */
export async function readLimitedBody(request: Request, maxBytes: number): Promise<string> {
  const declared = Number(request.headers.get('content-length'));
  if (Number.isFinite(declared) && declared > maxBytes) throw new AppError('too_large');
  if (!request.body) return '';
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let received = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    received += value.byteLength;
    if (received > maxBytes) {
      await reader.cancel().catch(() => undefined);
      throw new AppError('too_large');
    }
    chunks.push(value);
  }
  // TextDecoder as Request.text() decodes: UTF-8, a leading byte-order mark dropped.
  return new TextDecoder().decode(Buffer.concat(chunks, received));
}
