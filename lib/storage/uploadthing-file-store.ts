import 'server-only';
import { UTApi, UTFile } from 'uploadthing/server';
import type { PhotoFileStore } from '@/lib/photos/ingest-survey-photo';

/** Photo files through uploadthing's server API (configured by the UPLOADTHING_* environment). */
export function uploadthingFileStore(api = new UTApi()): PhotoFileStore {
  return {
    async read(url) {
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
