import 'server-only';
import { env } from '@/lib/env';

/**
 * Public address of a stored file. With the local upload stand-in the base is UPLOADS_PUBLIC_URL;
 * with uploadthing itself files are served from the app's own ufs.sh host, named by the app id
 * inside the token.
 */
export function publicFileUrl(key: string): string {
  const { UPLOADS_PUBLIC_URL, UPLOADTHING_TOKEN } = env();
  if (UPLOADS_PUBLIC_URL) return `${UPLOADS_PUBLIC_URL.replace(/\/$/, '')}/f/${encodeURIComponent(key)}`;
  const appId = appIdFromToken(UPLOADTHING_TOKEN);
  return `https://${appId}.ufs.sh/f/${encodeURIComponent(key)}`;
}

/** The one origin stored files are served from; the app fetches files from nowhere else. */
export function uploadsOrigin(): string {
  return new URL(publicFileUrl('file')).origin;
}

function appIdFromToken(token: string | undefined): string {
  if (!token) throw new Error('UPLOADTHING_TOKEN is not set: photos cannot be addressed.');
  const decoded = JSON.parse(Buffer.from(token, 'base64').toString('utf8')) as { appId?: string };
  if (!decoded.appId) throw new Error('UPLOADTHING_TOKEN carries no appId.');
  return decoded.appId;
}
