import { afterAll, describe, expect, it } from 'vitest';
import { closeDatabase } from '@/db/client';
import { authenticate } from '@/lib/auth/credentials';
import { createAccount, type TestAccount } from '../support/accounts';

// Through the running app: the sign-in endpoint sets the known-device cookie, and that cookie lets
// the owner in while strangers' wrong passwords are slowing the account down.
const APP_URL = process.env.APP_URL!;

function cookiesOf(response: Response) {
  return response.headers.getSetCookie();
}

/** One sign-in through Auth.js's credentials endpoint, as the sign-in form's action makes it. */
async function signIn(account: TestAccount, extraCookie = '') {
  const csrf = await fetch(`${APP_URL}/api/auth/csrf`);
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  const csrfCookie = cookiesOf(csrf).map((c) => c.split(';')[0]).join('; ');
  const response = await fetch(`${APP_URL}/api/auth/callback/credentials`, {
    method: 'POST',
    redirect: 'manual',
    headers: { 'content-type': 'application/x-www-form-urlencoded', cookie: [csrfCookie, extraCookie].filter(Boolean).join('; ') },
    body: new URLSearchParams({ email: account.email, password: account.password, csrfToken, callbackUrl: `${APP_URL}/dashboard` }),
  });
  const set = cookiesOf(response);
  return {
    location: response.headers.get('location') ?? '',
    session: set.some((c) => c.startsWith('authjs.session-token=') && !c.startsWith('authjs.session-token=;')),
    device: set.find((c) => c.startsWith('waygrade-known-device=')),
  };
}

afterAll(closeDatabase);

describe('signing in from a known device', () => {
  it('remembers the browser at sign-in in a signed, http-only cookie', async () => {
    const owner = await createAccount('buyer');
    const first = await signIn(owner);
    expect(first.session).toBe(true);
    expect(first.device).toMatch(/^waygrade-known-device=[^;]+;/);
    expect(first.device).toMatch(/HttpOnly/i);
    expect(first.device).toMatch(/SameSite=lax/i);
  });

  it('lets the owner’s browser in while strangers’ wrong passwords slow the account down, and no other browser', async () => {
    const owner = await createAccount('buyer');
    const first = await signIn(owner);
    const deviceCookie = first.device!.split(';')[0]!;
    // 14 wrong passwords 61 s apart (each after the longest wait, so each is judged), the last one now:
    // the account now makes everyone but a known device wait 32 s (2^(14 − 9) s, rate-limit.ts).
    const now = Date.now();
    for (let i = 1; i <= 14; i += 1) {
      await authenticate({ email: owner.email, password: `guess ${i}` }, { ip: `203.0.113.${i}`, now: new Date(now - (14 - i) * 61_000), knownDeviceAccountId: null });
    }

    const stranger = await signIn(owner);
    expect(stranger.session).toBe(false);
    expect(stranger.location).toContain('code=rate_limited');

    const ownersBrowser = await signIn(owner, deviceCookie);
    expect(ownersBrowser.session).toBe(true);
    expect(ownersBrowser.location).toContain('/dashboard');
  });
});
