// Bundled for the browser by build-browser-uploader.ts: it runs uploadthing's real client
// (genUploader, which PUTs with XMLHttpRequest) inside the page, from the app's origin.
import { genUploader } from 'uploadthing/client';
import type { InspectionPhotoRouter } from './inspection-photo-router.js';

export interface PhotoToUpload {
  name: string;
  type: string;
  base64: string;
}

export type BrowserUploadOutcome =
  | {
      ok: true;
      files: Array<{ key: string; name: string; size: number; type: string; ufsUrl: string; fileHash: string; serverData: unknown }>;
      progressEvents: number;
    }
  | { ok: false; code: string; message: string };

declare global {
  interface Window {
    uploadInspectionPhotos: (inspectionId: string, photos: PhotoToUpload[]) => Promise<BrowserUploadOutcome>;
  }
}

const { uploadFiles } = genUploader<InspectionPhotoRouter>({ url: '/api/uploadthing', package: 'waygrade-inspection-app' });

window.uploadInspectionPhotos = async (inspectionId, photos) => {
  const files = photos.map(
    (photo) => new File([Uint8Array.from(atob(photo.base64), (c) => c.charCodeAt(0))], photo.name, { type: photo.type }),
  );
  let progressEvents = 0;
  try {
    const uploaded = await uploadFiles('inspectionPhoto', {
      files,
      headers: { 'x-inspection-id': inspectionId },
      onUploadProgress: () => {
        progressEvents += 1;
      },
    });
    return {
      ok: true,
      progressEvents,
      // Only plain fields: url and appUrl are deprecated getters that log when read.
      files: uploaded.map((file) => ({
        key: file.key,
        name: file.name,
        size: file.size,
        type: file.type,
        ufsUrl: file.ufsUrl,
        fileHash: file.fileHash,
        serverData: file.serverData,
      })),
    };
  } catch (error) {
    const { code = 'UNKNOWN', message = String(error) } = error as { code?: string; message?: string };
    return { ok: false, code, message };
  }
};
