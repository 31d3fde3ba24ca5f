import { createUploadthing, UploadThingError, type FileRouter } from 'uploadthing/server';

/** What onUploadComplete saw, kept so tests can compare it with what the browser was told. */
export interface CompletedPhoto {
  key: string;
  name: string;
  size: number;
  type: string;
  ufsUrl: string;
  fileHash: string;
  metadata: Record<string, unknown>;
}

const photo = createUploadthing();

/**
 * The file routes an inspection app would define: site photos of a lathe up to 4 MB,
 * tagged by the middleware with the inspection they belong to.
 */
export function createInspectionPhotoRouter(completed: CompletedPhoto[]) {
  const recordAndAnswer = ({ file, metadata }: { file: Omit<CompletedPhoto, 'metadata'>; metadata: Record<string, unknown> }) => {
    completed.push({ key: file.key, name: file.name, size: file.size, type: file.type, ufsUrl: file.ufsUrl, fileHash: file.fileHash, metadata });
    return { photoKey: file.key, inspectionId: String(metadata.inspectionId), bytesReceived: file.size };
  };
  const tagWithInspection = ({ req }: { req: Request }) => {
    const inspectionId = req.headers.get('x-inspection-id');
    if (!inspectionId) throw new UploadThingError({ code: 'BAD_REQUEST', message: 'Photos belong to an inspection' });
    return { inspectionId, inspector: 'inspector-17' };
  };
  return {
    inspectionPhoto: photo({ image: { maxFileSize: '4MB', maxFileCount: 4 } })
      .middleware(tagWithInspection)
      .onUploadComplete(recordAndAnswer),
    // Presigned URLs for this route lapse after one second, to exercise the ingest's expiry check.
    briefInspectionPhoto: photo({ image: { maxFileSize: '4MB' } }, { presignedURLTTL: 1 })
      .middleware(tagWithInspection)
      .onUploadComplete(recordAndAnswer),
  } satisfies FileRouter;
}

export type InspectionPhotoRouter = ReturnType<typeof createInspectionPhotoRouter>;
