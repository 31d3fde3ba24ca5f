import type { StoredFile } from './file-store.js';
import { signPayload } from './signing.js';
import type { UploadRegistration } from './upload-registry.js';

export interface FileUrls {
  url: string;
  appUrl: string;
  ufsUrl: string;
}

/**
 * The body uploadthing's route handler expects on its "callback" hook: it validates
 * status, file (UploadedFileData), origin and metadata, runs onUploadComplete and then
 * posts { fileKey, callbackData } to `${origin}/callback-result`.
 */
export function buildCallbackBody(file: StoredFile, urls: FileUrls, registration: UploadRegistration): string {
  return JSON.stringify({
    status: 'uploaded',
    metadata: registration.metadata,
    origin: registration.origin,
    file: {
      name: file.name,
      size: file.size,
      type: file.type,
      customId: file.customId,
      key: file.key,
      url: urls.url,
      appUrl: urls.appUrl,
      ufsUrl: urls.ufsUrl,
      fileHash: file.fileHash,
    },
  });
}

/** The route handler reads the slug from the query string, as the SDK's own dev hook does. */
export function callbackTarget(registration: UploadRegistration): string {
  const target = new URL(registration.callbackUrl);
  target.searchParams.set('slug', registration.callbackSlug);
  return target.href;
}

/** Production path: the ingest calls the app directly, signing the body with the shared apiKey. */
export async function postCallbackToApp(body: string, registration: UploadRegistration, apiKey: string): Promise<void> {
  const response = await fetch(callbackTarget(registration), {
    method: 'POST',
    headers: {
      'content-type': 'application/json',
      'uploadthing-hook': 'callback',
      'x-uploadthing-signature': signPayload(body, apiKey),
    },
    body,
  });
  // The body is drained so the connection can be reused; its content (null) carries nothing.
  await response.arrayBuffer();
  if (!response.ok) throw new Error(`The app answered the upload callback with ${response.status}`);
}

/**
 * Development path: the app's route handler forwards each JSON line it reads from its
 * open /route-metadata request to its own callback URL, so the ingest never has to reach the app.
 */
export function writeDevCallbackLine(body: string, registration: UploadRegistration, apiKey: string): void {
  const stream = registration.devStream;
  if (!stream) return;
  const line = JSON.stringify({ payload: body, signature: signPayload(body, apiKey), hook: 'callback' });
  stream.response.write(line + '\n');
}
