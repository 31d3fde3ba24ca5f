'use server';

import { revalidatePath } from 'next/cache';
import { runAsCurrentUser } from '@/lib/auth/adapters';
import { bookInspection, cancelInspection } from '@/lib/workflow/inspections';
import { releaseReport, reopenForCorrection, sendSurveyBack } from '@/lib/workflow/review';

function refresh(result: { ok: boolean }) {
  if (result.ok) revalidatePath('/inspections', 'layout');
  return result;
}

export async function bookInspectionAction(input: unknown) {
  return refresh(await runAsCurrentUser(bookInspection, input)) as Awaited<ReturnType<typeof bookInspection.execute>>;
}

export async function cancelBookingAction(input: unknown) {
  return refresh(await runAsCurrentUser(cancelInspection, input)) as Awaited<ReturnType<typeof cancelInspection.execute>>;
}

export async function releaseReportAction(input: unknown) {
  return refresh(await runAsCurrentUser(releaseReport, input)) as Awaited<ReturnType<typeof releaseReport.execute>>;
}

export async function sendSurveyBackAction(input: unknown) {
  return refresh(await runAsCurrentUser(sendSurveyBack, input)) as Awaited<ReturnType<typeof sendSurveyBack.execute>>;
}

export async function reopenForCorrectionAction(input: unknown) {
  return refresh(await runAsCurrentUser(reopenForCorrection, input)) as Awaited<ReturnType<typeof reopenForCorrection.execute>>;
}
