import 'server-only';
import { createUploadthing, type FileRouter } from 'uploadthing/next';
import { UploadThingError } from 'uploadthing/server';
import { currentActor } from '@/lib/auth/current-actor';
import type { Actor } from '@/lib/auth/operation';
import type { Role } from '@/lib/roles';
import { ingestSurveyPhoto } from '@/lib/photos/ingest-survey-photo';
import { recordSurveyPhoto } from '@/lib/survey/server/record-survey-photo';
import { authorizeSurveyPhoto } from '@/lib/survey/server/survey-photo-access';
import { surveyPhotoTargetSchema } from '@/lib/validation/survey';
import { uploadthingFileStore } from './uploadthing-file-store';

const upload = createUploadthing();

export type SurveyPhotoResult =
  | { ok: true; photo: { id: number; section: string; caption: string | null; displayUrl: string; thumbUrl: string; widthPx: number; heightPx: number } }
  | { ok: false; message: string };

/**
 * Survey photos: one image per request, up to 16 MB (a phone's full-size photo). The middleware
 * runs the same checks as every other operation (session, role, assignment, visit under way);
 * onUploadComplete runs the photo pipeline and answers the phone with the stored photo or a
 * plain refusal.
 */
export const surveyPhotoRouter = {
  surveyPhoto: upload({ image: { maxFileSize: '16MB', maxFileCount: 1 } })
    .input(surveyPhotoTargetSchema)
    .middleware(async ({ input }) => {
      const actor = await currentActor();
      const allowed = await authorizeSurveyPhoto.execute(actor, input);
      if (!allowed.ok) throw new UploadThingError({ code: allowed.code === 'unauthenticated' ? 'FORBIDDEN' : 'BAD_REQUEST', message: allowed.message });
      return { inspectionId: allowed.data.inspectionId, section: allowed.data.section, actorId: actor!.id, actorRole: actor!.role as string };
    })
    .onUploadComplete(async ({ metadata, file }): Promise<SurveyPhotoResult> => {
      const target = { inspectionId: metadata.inspectionId, section: metadata.section };
      const outcome = await ingestSurveyPhoto(uploadthingFileStore(), { key: file.key, name: file.name, url: file.ufsUrl }, target);
      if (!outcome.ok) return outcome;
      // The actor was checked by the middleware; uploadthing carries the metadata back signed.
      const actor: Actor = { id: metadata.actorId, role: metadata.actorRole as Role };
      const recorded = await recordSurveyPhoto.execute(actor, { ...target, ...outcome.files });
      if (!recorded.ok) return { ok: false, message: recorded.message };
      return { ok: true, photo: recorded.data };
    }),
} satisfies FileRouter;

export type SurveyPhotoRouter = typeof surveyPhotoRouter;
