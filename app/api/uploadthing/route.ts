import { createRouteHandler } from 'uploadthing/next';
import { surveyPhotoRouter } from '@/lib/storage/survey-photo-router';

// Survey photo uploads (and, through the same route, the upload service's completion callbacks).
export const { GET, POST } = createRouteHandler({ router: surveyPhotoRouter });
