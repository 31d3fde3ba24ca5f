import { describe, expect, it } from 'vitest';
import { checkLocalFallbacks, LOCAL_STRIPE_SECRET_KEY, LOCAL_STRIPE_WEBHOOK_SECRET, LOCAL_UPLOADTHING_API_KEY, localUploadthingToken } from '../scripts/lib/stack.mjs';
import { LOCAL_UPLOADS_CREDENTIALS } from '../services/uploads/local-token';
import * as local from './local-secrets';

describe('the local stand-in secrets', () => {
  it('holds the same values as the start script and the uploads stand-in', () => {
    expect([local.LOCAL_STRIPE_SECRET_KEY, local.LOCAL_STRIPE_WEBHOOK_SECRET, local.LOCAL_UPLOADTHING_API_KEY]).toEqual([
      LOCAL_STRIPE_SECRET_KEY,
      LOCAL_STRIPE_WEBHOOK_SECRET,
      LOCAL_UPLOADTHING_API_KEY,
    ]);
    expect(LOCAL_UPLOADS_CREDENTIALS.apiKey).toBe(local.LOCAL_UPLOADTHING_API_KEY);
    expect(local.isLocalUploadthingToken(localUploadthingToken())).toBe(true);
  });

  it.each([
    ['http://localhost:3000', true],
    ['http://127.0.0.1:3100', true],
    ['http://[::1]:3000', true],
    ['https://waygrade.example', false],
    ['http://192.168.1.20:3000', false],
    ['http://localhost.waygrade.example', false],
  ])('tells whether %s is on this machine (%s)', (url, expected) => {
    expect(local.isLoopbackUrl(url)).toBe(expected);
  });
});

describe('checkLocalFallbacks in the start script', () => {
  it('lets npm start and npm test fill every secret in on this machine', () => {
    expect(() => checkLocalFallbacks({})).not.toThrow();
    expect(() => checkLocalFallbacks({ APP_URL: 'http://localhost:3050', NODE_ENV: 'production' })).not.toThrow();
  });

  it('refuses to fill in a webhook secret beside a real payments key', () => {
    expect(() => checkLocalFallbacks({ STRIPE_SECRET_KEY: 'sk_test_51Invented000000' })).toThrow(/set STRIPE_WEBHOOK_SECRET, UPLOADTHING_TOKEN as well/);
  });

  it('fills in nothing in a production deployment', () => {
    expect(() => checkLocalFallbacks({ WAYGRADE_DEPLOYMENT: 'production', STRIPE_SECRET_KEY: 'sk_live_51Invented000000' })).toThrow(
      /gets no local stand-in secrets: set STRIPE_WEBHOOK_SECRET, UPLOADTHING_TOKEN/,
    );
    expect(() => checkLocalFallbacks({ APP_URL: 'https://waygrade.example' })).toThrow(/set STRIPE_SECRET_KEY, STRIPE_WEBHOOK_SECRET, UPLOADTHING_TOKEN/);
  });

  it('starts a production deployment that brings its own secrets', () => {
    expect(() =>
      checkLocalFallbacks({ APP_URL: 'https://waygrade.example', STRIPE_SECRET_KEY: 'sk_live_x', STRIPE_WEBHOOK_SECRET: 'whsec_x', UPLOADTHING_TOKEN: 'dG9rZW4=' }),
    ).not.toThrow();
  });
});
