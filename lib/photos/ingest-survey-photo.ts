import 'server-only';
import type { SurveyPhotoTarget } from '@/lib/validation/survey';
import { NotAPhotoError, processPhoto, type PhotoVariant } from './process-photo';

/** Where photo files live: the uploadthing file API in the app, the same API in tests. */
export interface PhotoFileStore {
  read(url: string): Promise<Uint8Array>;
  put(files: Array<{ name: string; contentType: string; bytes: Buffer }>): Promise<Array<{ key: string; url: string }>>;
  remove(keys: string[]): Promise<void>;
}

export interface UploadedOriginal {
  key: string;
  name: string;
  url: string;
}

export interface ProcessedPhotoFiles {
  fileKey: string;
  originalUrl: string;
  displayKey: string;
  thumbKey: string;
  widthPx: number;
  heightPx: number;
  bytes: number;
}

export type IngestOutcome = { ok: true; files: ProcessedPhotoFiles } | { ok: false; message: string };

const VARIANT_ORDER: readonly PhotoVariant[] = ['full', 'display', 'thumb'];

function baseName(name: string) {
  return (name.replace(/\.[^.]*$/, '') || 'photo').replace(/[^\w.-]+/g, '-').slice(0, 80);
}

/**
 * The photo pipeline after an upload lands: read the original, process it, store the cleaned
 * sizes, then delete the original — it still carries the camera's location. A file that is not an
 * image is deleted and refused with a message the inspector can act on.
 */
export async function ingestSurveyPhoto(store: PhotoFileStore, original: UploadedOriginal, target: SurveyPhotoTarget): Promise<IngestOutcome> {
  const bytes = await store.read(original.url);
  let processed;
  try {
    processed = await processPhoto(bytes);
  } catch (error) {
    await store.remove([original.key]);
    if (error instanceof NotAPhotoError) return { ok: false, message: `“${original.name}”: ${error.message}` };
    throw error;
  }
  const stem = `inspection-${target.inspectionId}-${target.section}-${baseName(original.name)}`;
  const stored = await store.put(
    VARIANT_ORDER.map((variant) => ({
      name: `${stem}-${variant}.${processed[variant].extension}`,
      contentType: processed[variant].contentType,
      bytes: processed[variant].bytes,
    })),
  );
  await store.remove([original.key]);
  const [full, display, thumb] = stored as [{ key: string; url: string }, { key: string; url: string }, { key: string; url: string }];
  return {
    ok: true,
    files: {
      fileKey: full.key,
      originalUrl: full.url,
      displayKey: display.key,
      thumbKey: thumb.key,
      widthPx: processed.full.widthPx,
      heightPx: processed.full.heightPx,
      bytes: processed.full.bytes.byteLength,
    },
  };
}
