import type { Metadata } from 'next';
import { notFound, redirect } from 'next/navigation';
import { db } from '@/db/client';
import { listSurveyPhotos } from '@/db/queries/survey-photos';
import { findInspectionWithMachine, findSurvey } from '@/db/queries/surveys';
import { requirePageSession } from '@/lib/auth/session';
import { can } from '@/lib/roles';
import { publicFileUrl } from '@/lib/storage/file-url';
import type { DraftSurvey } from '@/lib/survey/draft-survey-schema';
import { SURVEY_SECTIONS } from '@/lib/survey/survey-sections';
import { SurveyWorkspace } from './survey-workspace';

export const metadata: Metadata = { title: 'Survey' };

export default async function SurveyPage({ params, searchParams }: { params: Promise<{ inspectionId: string }>; searchParams: Promise<{ section?: string }> }) {
  const user = await requirePageSession();
  const { inspectionId: rawId } = await params;
  const inspectionId = Number(rawId);
  if (!can(user.role, 'survey.edit.assigned') || !Number.isInteger(inspectionId)) notFound();
  const inspection = await findInspectionWithMachine(db, inspectionId);
  if (!inspection || inspection.inspectorId !== user.id) notFound();
  if (inspection.status !== 'on_site') redirect(`/jobs/${inspectionId}`);
  const survey = await findSurvey(db, inspectionId);
  if (!survey) redirect(`/jobs/${inspectionId}`);
  const photos = await listSurveyPhotos(db, inspectionId);
  const { section } = await searchParams;
  const step = section === 'submit' ? SURVEY_SECTIONS.length : Math.max(0, SURVEY_SECTIONS.findIndex((s) => s.id === section));

  return (
    <SurveyWorkspace
      inspectionId={inspectionId}
      machineTitle={`${inspection.maker} ${inspection.model} · ${inspection.town}`}
      initialVersion={survey.version}
      initialData={survey.data as DraftSurvey}
      initialStep={step}
      initialPhotos={photos.map((photo) => ({
        id: photo.id,
        section: photo.section ?? 'identity',
        caption: photo.caption,
        displayUrl: publicFileUrl(photo.displayKey ?? photo.fileKey),
        thumbUrl: publicFileUrl(photo.thumbKey ?? photo.fileKey),
        widthPx: photo.widthPx ?? 1,
        heightPx: photo.heightPx ?? 1,
      }))}
    />
  );
}
