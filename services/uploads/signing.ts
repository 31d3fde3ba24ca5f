import { createHmac, timingSafeEqual } from 'node:crypto';

// uploadthing signs with HMAC-SHA256 keyed by the apiKey and writes the result as
// "hmac-sha256=<hex>", both for callback bodies and for presigned URLs.
const SIGNATURE_PREFIX = 'hmac-sha256=';

export function signPayload(payload: string, apiKey: string): string {
  return SIGNATURE_PREFIX + createHmac('sha256', apiKey).update(payload, 'utf8').digest('hex');
}

export function isSignatureValid(payload: string, signature: string | null | undefined, apiKey: string): boolean {
  if (!signature || !signature.startsWith(SIGNATURE_PREFIX)) return false;
  const given = Buffer.from(signature.slice(SIGNATURE_PREFIX.length), 'hex');
  const expected = createHmac('sha256', apiKey).update(payload, 'utf8').digest();
  return given.length === expected.length && timingSafeEqual(given, expected);
}

export type SignedUrlCheck =
  | { ok: true; params: URLSearchParams }
  | { ok: false; reason: 'missing-signature' | 'bad-signature' | 'expired' };

/**
 * The SDK builds a presigned URL by appending `expires` (epoch ms) and its data
 * parameters, signing the resulting href, then appending `signature` last. So the
 * signed text is the full URL with the `signature` parameter taken out again.
 * `origin` is the scheme and host the caller addressed (from the Host header).
 */
export function checkSignedUrl(origin: string, pathAndQuery: string, apiKey: string, now = Date.now()): SignedUrlCheck {
  const queryStart = pathAndQuery.indexOf('?');
  const path = queryStart === -1 ? pathAndQuery : pathAndQuery.slice(0, queryStart);
  const rawQuery = queryStart === -1 ? '' : pathAndQuery.slice(queryStart + 1);
  const parts = rawQuery.split('&').filter((part) => part.length > 0);
  const signaturePart = parts.find((part) => part.startsWith('signature='));
  if (!signaturePart) return { ok: false, reason: 'missing-signature' };
  const signature = new URLSearchParams(signaturePart).get('signature');
  const unsignedParts = parts.filter((part) => part !== signaturePart);
  const signedText = origin + path + (unsignedParts.length > 0 ? '?' + unsignedParts.join('&') : '');
  if (!isSignatureValid(signedText, signature, apiKey)) return { ok: false, reason: 'bad-signature' };
  const params = new URLSearchParams(unsignedParts.join('&'));
  const expires = Number(params.get('expires'));
  if (!Number.isFinite(expires) || expires < now) return { ok: false, reason: 'expired' };
  return { ok: true, params };
}

/** Mirrors the SDK's generateSignedURL so the stand-in can hand out file-access links. */
export function createSignedUrl(url: string, apiKey: string, ttlSeconds: number, now = Date.now()): string {
  const parsed = new URL(url);
  parsed.searchParams.append('expires', String(now + ttlSeconds * 1000));
  const signature = signPayload(parsed.toString(), apiKey);
  parsed.searchParams.append('signature', signature);
  return parsed.href;
}
