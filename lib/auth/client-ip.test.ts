import { describe, expect, it } from 'vitest';
import { clientIpFrom } from './client-ip';

const headers = (forwardedFor?: string, extra: Record<string, string> = {}) =>
  new Headers({ ...(forwardedFor === undefined ? {} : { 'x-forwarded-for': forwardedFor }), ...extra });

// Addresses from the documentation ranges (RFC 5737, RFC 3849). The app server appends the socket's
// address last; each trusted proxy in front appends the address it saw (the usual X-Forwarded-For
// practice, common practice: MDN's X-Forwarded-For page describes the rightmost entries as the trustworthy ones).
describe('clientIpFrom', () => {
  it.each([
    ['the socket address when no proxy is trusted', '198.51.100.7', 0, '198.51.100.7'],
    ['the socket address, not a forged first entry, when no proxy is trusted', '203.0.113.66, 198.51.100.7', 0, '198.51.100.7'],
    ['the entry the one trusted proxy appended', '203.0.113.66, 192.0.2.10, 198.51.100.7', 1, '192.0.2.10'],
    ['the entry two trusted proxies put before their own', '203.0.113.66, 192.0.2.10, 198.51.100.8, 198.51.100.7', 2, '192.0.2.10'],
    ['an IPv6 socket address', '2001:db8::1', 0, '2001:db8::1'],
    ['the IPv4 address of a dual-stack socket', '::ffff:192.0.2.44', 0, '192.0.2.44'],
  ])('takes %s', (_what, forwardedFor, trusted, expected) => {
    expect(clientIpFrom(headers(forwardedFor), trusted)).toBe(expected);
  });

  it.each([
    ['no header at all', undefined, 0],
    ['fewer entries than trusted proxies', '198.51.100.7', 1],
    ['an entry that is not an address', 'victim, not-an-address', 0],
    ['an entry over 45 characters', `${'1'.repeat(70)}`, 0],
    ['an address with a port', '192.0.2.10:5555', 0],
    ['an empty entry', '192.0.2.10, ', 0],
  ])('answers null for %s', (_what, forwardedFor, trusted) => {
    expect(clientIpFrom(headers(forwardedFor), trusted)).toBeNull();
  });

  it('ignores X-Real-IP, which any visitor can write', () => {
    expect(clientIpFrom(headers(undefined, { 'x-real-ip': '203.0.113.66' }), 0)).toBeNull();
  });

  it('keeps a 200-character forged header from reaching the 64-character audit column', () => {
    const forged = `${'a'.repeat(200)}, 198.51.100.7`;
    expect(clientIpFrom(headers(forged), 0)).toBe('198.51.100.7');
    expect(clientIpFrom(headers(forged), 1)).toBeNull();
  });
});
