import 'server-only';
import { cookies } from 'next/headers';
import { issueKnownDeviceToken, KNOWN_DEVICE_COOKIE, KNOWN_DEVICE_MAX_AGE_MS, knownDeviceAccount } from './known-device';
import { usesSecureCookies } from './read-session';

/** The account this browser's known-device cookie vouches for, if any. */
export async function readKnownDevice(): Promise<string | null> {
  try {
    return knownDeviceAccount((await cookies()).get(KNOWN_DEVICE_COOKIE)?.value);
  } catch {
    // Outside a request (a script, a test) there is no browser to know.
    return null;
  }
}

/** Remembers this browser for the account, after a sign-in or a completed password reset. */
export async function rememberDevice(userId: string) {
  try {
    (await cookies()).set(KNOWN_DEVICE_COOKIE, issueKnownDeviceToken(userId), {
      httpOnly: true,
      secure: usesSecureCookies(),
      sameSite: 'lax',
      path: '/',
      maxAge: KNOWN_DEVICE_MAX_AGE_MS / 1000,
    });
  } catch {
    // Outside a request there is no browser to remember; and not remembering one must not undo the
    // sign-in or the reset it follows.
  }
}
