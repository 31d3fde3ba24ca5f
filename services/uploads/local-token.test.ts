import { UTApi } from 'uploadthing/server';
import { describe, expect, it } from 'vitest';
import { decodeUploadsToken, encodeUploadsToken, LOCAL_UPLOADS_CREDENTIALS, LOCAL_UPLOADS_TOKEN } from './local-token.js';

describe('local uploads token', () => {
  it('decodes back to the local credentials', () => {
    expect(decodeUploadsToken(LOCAL_UPLOADS_TOKEN)).toEqual(LOCAL_UPLOADS_CREDENTIALS);
  });

  it('is accepted by the uploadthing SDK', async () => {
    const utapi = new UTApi({ token: LOCAL_UPLOADS_TOKEN, ufsHost: 'localhost:12112', ufsAppIdLocation: 'path', logLevel: 'Error' });

    const { ufsUrl } = await utapi.generateSignedURL('a-key');

    expect(ufsUrl).toMatch(/^http:\/\/localhost:12112\/a\/waygrade-local\/a-key\?expires=\d+&signature=hmac-sha256%3D[0-9a-f]{64}$/);
  });

  it.each([
    ['an apiKey without the sk_ prefix', { apiKey: 'live_key', appId: 'a', regions: ['local'] }, /sk_/],
    ['a missing appId', { apiKey: 'sk_live_x', regions: ['local'] }, /appId/],
    ['an empty region list', { apiKey: 'sk_live_x', appId: 'a', regions: [] }, /regions/],
  ])('refuses a token with %s', (_title, credentials, message) => {
    expect(() => decodeUploadsToken(encodeUploadsToken(credentials as never))).toThrow(message);
  });

  it('refuses a token that is not base64 JSON', () => {
    expect(() => decodeUploadsToken('not a token')).toThrow(/base64/);
  });
});
