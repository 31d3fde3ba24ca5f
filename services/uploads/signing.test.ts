import { UTApi } from 'uploadthing/server';
import { beforeAll, describe, expect, it } from 'vitest';
import { encodeUploadsToken } from './local-token.js';
import { checkSignedUrl, isSignatureValid, signPayload, type SignedUrlCheck } from './signing.js';

const apiKey = 'sk_live_waygrade_signing_suite';
const token = encodeUploadsToken({ apiKey, appId: 'waygrade-signing-suite', regions: ['local'] });

describe('checkSignedUrl against URLs signed by the uploadthing SDK', () => {
  let signed: URL;

  beforeAll(async () => {
    // generateSignedURL signs locally with the same routine the route handler uses for presigned uploads.
    const utapi = new UTApi({ token, ufsHost: 'localhost:12112', ufsAppIdLocation: 'path', logLevel: 'Error' });
    signed = new URL((await utapi.generateSignedURL('lathe-photo-key', { expiresIn: 60 })).ufsUrl);
  });

  function check(mutate: (url: URL) => void, options: { key?: string; now?: number } = {}): SignedUrlCheck['ok'] | string {
    const url = new URL(signed.href);
    mutate(url);
    const result = checkSignedUrl(url.origin, url.pathname + url.search, options.key ?? apiKey, options.now);
    return result.ok ? true : result.reason;
  }

  const cases: Array<[string, (url: URL) => void, { key?: string; now?: number }, true | string]> = [
    ['accepts the URL as signed', () => {}, {}, true],
    ['rejects another file key in the path', (url) => (url.pathname = url.pathname.replace('lathe-photo-key', 'other-key')), {}, 'bad-signature'],
    ['rejects a later expiry', (url) => url.searchParams.set('expires', String(Date.now() + 10 ** 9)), {}, 'bad-signature'],
    ['rejects another host', (url) => (url.host = 'localhost:9999'), {}, 'bad-signature'],
    ['rejects a missing signature', (url) => url.searchParams.delete('signature'), {}, 'missing-signature'],
    ['rejects a different apiKey', () => {}, { key: 'sk_live_someone_else' }, 'bad-signature'],
    ['rejects the URL once it has expired', () => {}, { now: Date.now() + 61_000 }, 'expired'],
  ];

  it.each(cases)('%s', (_title, mutate, options, expected) => {
    expect(check(mutate, options)).toBe(expected);
  });
});

describe('signPayload', () => {
  it('produces what isSignatureValid accepts and nothing else', () => {
    const body = JSON.stringify({ status: 'uploaded', file: { key: 'k' } });
    const signature = signPayload(body, apiKey);

    expect(signature).toMatch(/^hmac-sha256=[0-9a-f]{64}$/);
    expect(isSignatureValid(body, signature, apiKey)).toBe(true);
    expect(isSignatureValid(body + ' ', signature, apiKey)).toBe(false);
    expect(isSignatureValid(body, signature, 'sk_other')).toBe(false);
    expect(isSignatureValid(body, null, apiKey)).toBe(false);
  });
});
