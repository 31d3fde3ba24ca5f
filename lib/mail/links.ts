import { env } from '@/lib/env';

/** An absolute address in the app for a link in a mail, e.g. appLink('/reset-password', { token }). */
export function appLink(path: string, query: Record<string, string> = {}) {
  const url = new URL(path, env().APP_URL);
  for (const [key, value] of Object.entries(query)) url.searchParams.set(key, value);
  return url.toString();
}
