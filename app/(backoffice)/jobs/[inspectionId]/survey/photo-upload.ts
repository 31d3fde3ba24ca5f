import { genUploader } from 'uploadthing/client';
import type { SurveyPhotoResult, SurveyPhotoRouter } from '@/lib/storage/survey-photo-router';
import type { SurveySectionId } from '@/lib/survey/survey-sections';

/**
 * Sends one survey photo through uploadthing's client. This module (and uploadthing's client with
 * it) is loaded only when the inspector reaches for a photo control (section-photos.tsx), because
 * it is a large share of the survey's JavaScript and most screens never send a photo.
 */
const { uploadFiles } = genUploader<SurveyPhotoRouter>({ url: '/api/uploadthing' });

export async function uploadSurveyPhoto(
  file: File,
  target: { inspectionId: number; section: SurveySectionId },
  onProgress: (percent: number) => void,
): Promise<SurveyPhotoResult | null> {
  const [uploaded] = await uploadFiles('surveyPhoto', {
    files: [file],
    input: target,
    // Per cent of this file's bytes sent, whole numbers: one photo goes per request.
    onUploadProgress: ({ progress }) => onProgress(Math.round(progress)),
  });
  return uploaded?.serverData ?? null;
}
