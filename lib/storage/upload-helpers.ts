'use client';

import { generateReactHelpers } from '@uploadthing/react';
import type { SurveyPhotoRouter } from './survey-photo-router';

/** uploadthing's React hooks, typed by the app's file routes. */
export const { useUploadThing } = generateReactHelpers<SurveyPhotoRouter>({ url: '/api/uploadthing' });
