import { describe, expect, it } from 'vitest';
import { stripeConnectionOptions } from './stripe-client';

describe('stripeConnectionOptions', () => {
  it('leaves the SDK on its own API when no address is configured', () => {
    expect(stripeConnectionOptions(undefined)).toEqual({});
  });

  it.each([
    ['http://127.0.0.1:12171', { host: '127.0.0.1', port: 12171, protocol: 'http', maxNetworkRetries: 0 }],
    ['https://payments.internal.example', { host: 'payments.internal.example', port: 443, protocol: 'https', maxNetworkRetries: 0 }],
  ])('points the SDK at %s with one attempt per call', (url, expected) => {
    expect(stripeConnectionOptions(url)).toEqual(expected);
  });
});
