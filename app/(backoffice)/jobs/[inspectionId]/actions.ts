'use server';

import { revalidatePath } from 'next/cache';
import { runAsCurrentUser } from '@/lib/auth/adapters';
import { startVisit } from '@/lib/survey/server/start-visit';
import { submitSurvey } from '@/lib/survey/server/submit-survey';

/** The inspector starts the visit on arrival: booked → on site, the survey opens. */
export async function startVisitAction(inspectionId: number) {
  const result = await runAsCurrentUser(startVisit, { inspectionId });
  if (result.ok) revalidatePath('/jobs');
  return result;
}

/** Submit the saved survey (the version the phone last saw confirmed) for review. */
export async function submitSurveyAction(input: { inspectionId: number; baseVersion: number }) {
  const result = await runAsCurrentUser(submitSurvey, input);
  if (result.ok) revalidatePath('/jobs');
  return result;
}
