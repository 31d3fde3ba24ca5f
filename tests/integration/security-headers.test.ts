import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { closeDatabase, db } from '@/db/client';
import { surveys } from '@/db/schema';
import { createAccount } from '../support/accounts';
import { sessionCookie } from '../support/private-stack';
import { createReleasedReport } from '../support/purchase-fixtures';
import { bookedInspection } from './survey-fixtures';

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

// Answers meant for one person must not be kept by a browser or a shared cache (RFC 9111 section 5.2.2:
// "private" keeps shared caches out, "no-store" keeps every cache out).
describe('cache headers on per-user answers', () => {
  const cookies: Record<string, string> = {};
  let inspectionId: number;
  let reportId: number;
  let surveyData: unknown;

  beforeAll(async () => {
    const dealer = await createAccount('dealer');
    cookies.dealer = await sessionCookie({ ...dealer, sessionVersion: 0 });
    const booked = await bookedInspection({ start: true });
    inspectionId = booked.inspectionId;
    [{ data: surveyData }] = (await db.select({ data: surveys.data }).from(surveys).where(eq(surveys.inspectionId, inspectionId))) as [{ data: unknown }];
    cookies.inspector = await sessionCookie({ id: booked.inspector.id, role: 'inspector', name: booked.inspector.name ?? '', email: '', sessionVersion: 0 });
    ({ reportId } = await createReleasedReport());
  });
  afterAll(() => closeDatabase());

  it.each([
    ['the comparison page for a dealer', () => ['/api/compare', { headers: { cookie: cookies.dealer! } }], 200],
    ['the comparison refused to a signed-out visitor', () => ['/api/compare', {}], 401],
    ['an inspector’s survey', () => [`/api/surveys/${inspectionId}`, { headers: { cookie: cookies.inspector! } }], 200],
    ['an autosave refused as invalid', () => [`/api/surveys/${inspectionId}`, { method: 'PUT', headers: { cookie: cookies.inspector!, 'content-type': 'application/json' }, body: '{"baseVersion":"x"}' }], 400],
    ['an autosave made on an old version', () => [`/api/surveys/${inspectionId}`, { method: 'PUT', headers: { cookie: cookies.inspector!, 'content-type': 'application/json' }, body: JSON.stringify({ baseVersion: 0, data: surveyData }) }], 409],
    ['a report download refused to someone without the grant', () => [`/api/reports/${reportId}/pdf`, { headers: { cookie: cookies.dealer! } }], 404],
    ['an export refused to a signed-out visitor', () => ['/api/compare/export', {}], 401],
  ] as const)('marks %s private, no-store', async (_what, request, status) => {
    const [address, init] = request() as [string, RequestInit];
    const response = await fetch(`${APP_URL}${address}`, { redirect: 'manual', ...init });
    expect(response.status).toBe(status);
    expect(response.headers.get('cache-control')).toBe('private, no-store');
  });
});
