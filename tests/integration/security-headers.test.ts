import { describe, expect, it } from 'vitest';

const APP_URL = process.env.APP_URL ?? 'http://localhost:3100';
const UPLOADS_ORIGIN = process.env.UPLOADS_PUBLIC_URL ? new URL(process.env.UPLOADS_PUBLIC_URL).origin : null;

/** A Content-Security-Policy header as directive → sources. */
function parsePolicy(header: string | null) {
  expect(header, 'Content-Security-Policy header').toBeTruthy();
  return new Map(
    header!
      .split(';')
      .map((part) => part.trim().split(/\s+/))
      .filter((words) => words[0])
      .map(([name, ...sources]) => [name!, sources]),
  );
}

// A page, a signed-out redirect, a JSON route and the not-found page: headers on every kind of answer.
const ADDRESSES = ['/', '/sign-in', '/dashboard', '/api/compare', '/no-such-page'];

describe('security headers on the running app', () => {
  it.each(ADDRESSES)('%s carries the content security policy and the other protections', async (address) => {
    const response = await fetch(`${APP_URL}${address}`, { redirect: 'manual' });
    expect(response.status).toBeLessThan(500);
    const policy = parsePolicy(response.headers.get('content-security-policy'));

    expect(policy.get('default-src')).toEqual(["'self'"]);
    // Script files only from the app itself: no other host, no wildcard, no eval in production.
    expect(policy.get('script-src')?.filter((s) => s !== "'unsafe-inline'")).toEqual(["'self'"]);
    expect(policy.get('script-src')).not.toContain("'unsafe-eval'");
    expect(policy.get('style-src')?.[0]).toBe("'self'");
    expect(policy.get('font-src')).toEqual(["'self'"]);
    expect(policy.get('frame-ancestors')).toEqual(["'none'"]);
    expect(policy.get('object-src')).toEqual(["'none'"]);
    expect(policy.get('base-uri')).toEqual(["'self'"]);
    expect(policy.get('img-src')).toContain("'self'");
    expect(policy.get('connect-src')).toContain("'self'");
    if (UPLOADS_ORIGIN) {
      // Photos are shown from, and uploaded to, the upload service.
      expect(policy.get('img-src')).toContain(UPLOADS_ORIGIN);
      expect(policy.get('connect-src')).toContain(UPLOADS_ORIGIN);
    }
    for (const sources of policy.values()) expect(sources).not.toContain('*');

    expect(response.headers.get('x-content-type-options')).toBe('nosniff');
    expect(response.headers.get('referrer-policy')).toBe('strict-origin-when-cross-origin');
    expect(response.headers.get('x-frame-options')).toBe('DENY');
    expect(response.headers.get('x-powered-by')).toBeNull();
  });
});
