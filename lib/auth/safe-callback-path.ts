const PROBE_ORIGIN = 'http://waygrade.invalid';

/**
 * A same-site path to go to after signing in, or `fallback`. The value is read the way a browser's
 * URL parser would read it in a Location header: spaces and control characters at either end
 * dropped, tab, line feed and carriage return removed anywhere, a backslash taken for a slash. So
 * `/\evil.example/x`, `/<tab>/evil.example` and ` //evil.example` are seen as the off-site addresses
 * they are. What is followed is the parsed path itself, never the raw text, and never one that
 * parsing turned into `//host` (as `/.//evil.example` becomes).
 */
export function safeCallbackPath(raw: unknown, fallback = '/dashboard'): string {
  if (typeof raw !== 'string' || raw.length > 2048) return fallback;
  const normalised = raw
    .replace(/^[\u0000-\u0020]+|[\u0000-\u0020]+$/g, '')
    .replace(/[\t\n\r]/g, '')
    .replace(/\\/g, '/');
  if (!normalised.startsWith('/') || normalised.startsWith('//')) return fallback;
  // Any other control character has no place in an address of ours.
  if (/[\u0000-\u001f\u007f]/.test(normalised)) return fallback;
  let url: URL;
  try {
    url = new URL(normalised, PROBE_ORIGIN);
  } catch {
    return fallback;
  }
  if (url.origin !== PROBE_ORIGIN) return fallback;
  const path = `${url.pathname}${url.search}${url.hash}`;
  return path.startsWith('//') ? fallback : path;
}

/**
 * Auth.js's `redirect` callback: an address on this site (absolute with our origin, or a path) is
 * followed as its safe path; anything else goes to the site's root.
 */
export function redirectWithinSite({ url, baseUrl }: { url: string; baseUrl: string }): string {
  const origin = new URL(baseUrl).origin;
  let candidate: string = url;
  if (/^[a-z][a-z0-9+.-]*:/i.test(url.trim())) {
    let absolute: URL;
    try {
      absolute = new URL(url);
    } catch {
      return `${origin}/`;
    }
    if (absolute.origin !== origin) return `${origin}/`;
    candidate = `${absolute.pathname}${absolute.search}${absolute.hash}`;
  }
  return `${origin}${safeCallbackPath(candidate, '/')}`;
}
