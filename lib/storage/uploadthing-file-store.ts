import 'server-only';
import { UTApi, UTFile } from 'uploadthing/server';
import type { PhotoFileStore } from '@/lib/photos/ingest-survey-photo';
import { uploadsOrigin } from './file-url';

/**
 * Photo files through uploadthing's server API (configured by the UPLOADTHING_* environment).
 * A file is read back only from the upload service's own origin (`fileOrigin`, by default the one
 * `publicFileUrl` addresses): the address comes in the upload's completion callback, and the app
 * must not be made to request anything else, such as an address inside its own network.
 */
export function uploadthingFileStore(api = new UTApi(), fileOrigin?: string): PhotoFileStore {
  return {
    async read(url) {
      assertUploadsAddress(url, fileOrigin ?? uploadsOrigin());
      const response = await fetch(url);
      if (!response.ok) throw new Error(`The uploaded photo could not be read back (${response.status}).`);
      return new Uint8Array(await response.arrayBuffer());
    },
    async put(files) {
      const results = await api.uploadFiles(files.map((file) => new UTFile([new Uint8Array(file.bytes)], file.name, { type: file.contentType })));
      return results.map((result) => {
        if (result.error) throw new Error(`Storing a processed photo failed: ${result.error.message}`);
        return { key: result.data.key, url: result.data.ufsUrl };
      });
    },
    async remove(keys) {
      if (keys.length) await api.deleteFiles(keys);
    },
  };
}

export class ForeignFileAddressError extends Error {}

function assertUploadsAddress(url: string, origin: string) {
  let parsed: URL;
  try {
    parsed = new URL(url);
  } catch {
    throw new ForeignFileAddressError('The upload service named a file address that is not a URL; nothing was fetched.');
  }
  if (parsed.origin !== origin) {
    throw new ForeignFileAddressError(`The upload service named a file at ${parsed.origin}, not at the upload service's own address (${origin}); nothing was fetched.`);
  }
}
