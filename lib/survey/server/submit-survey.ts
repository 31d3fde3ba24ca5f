import 'server-only';
import { insertDraftReport } from '@/db/queries/report-writes';
import { loadScoreOptions } from '@/db/queries/scoring-inputs';
import { countSurveyPhotos, countSurveyPhotosBySection } from '@/db/queries/survey-photos';
import { findInspectionWithMachine, findSurvey, listActiveCoordinators, markSurveySubmitted } from '@/db/queries/surveys';
import { moveInspection } from '@/lib/workflow/status-events';
import { defineOperation } from '@/lib/auth/operation';
import { AppError } from '@/lib/errors';
import { INSPECTION_STATUS_LABELS } from '@/lib/inspection-status';
import { appLink } from '@/lib/mail/links';
import { enqueueEmail } from '@/lib/mail/outbox';
import { mayTransition } from '@/lib/roles';
import { scoreSurvey, toMillimetres, type LatheSurvey } from '@/lib/scoring';
import { submitSurveySchema } from '@/lib/validation/survey';
import { draftSurveySchema } from '../draft-survey-schema';
import { submissionBlockers } from '../submission-blockers';
import { sectionById } from '../survey-sections';
import { isAssignedInspector } from './assigned-inspection';
import { SURVEY_CHANGED_ELSEWHERE } from './save-survey';

/**
 * Submit: the saved survey (exactly the version the inspector saw) is checked for what is missing,
 * scored on the server with the scoring library, stored as a draft report with the scoring version,
 * and the inspection moves on site → in review for the coordinator.
 */
export const submitSurvey = defineOperation({
  name: 'survey.submit',
  entityType: 'survey',
  access: 'survey.submit.assigned',
  input: submitSurveySchema,
  authorize: isAssignedInspector,
  async run({ actor, input, tx }) {
    const inspection = await findInspectionWithMachine(tx, input.inspectionId, { lock: true });
    if (!inspection) throw new AppError('not_found');
    if (!mayTransition(actor!.role, inspection.status, 'in_review')) {
      throw new AppError('conflict', `This inspection is “${INSPECTION_STATUS_LABELS[inspection.status]}”; it cannot be submitted now.`);
    }
    // Locked: an autosave on the same version waits for this submission and is then refused, so the
    // report is scored from exactly the version the survey keeps.
    const survey = await findSurvey(tx, inspection.id, { lock: true });
    if (!survey) throw new AppError('not_found', 'This survey starts when you start the visit.');
    if (survey.version !== input.baseVersion) throw new AppError('conflict', SURVEY_CHANGED_ELSEWHERE);

    const draft = draftSurveySchema.safeParse(survey.data);
    const blockers = draft.success
      ? submissionBlockers(draft.data, {
          photoCount: await countSurveyPhotos(tx, inspection.id),
          sectionPhotoCounts: await countSurveyPhotosBySection(tx, inspection.id),
        })
      : [{ section: 'identity' as const, text: 'The saved survey could not be read; open it again and re-enter the last values.' }];
    if (blockers.length > 0) {
      const bySection: Record<string, string[]> = {};
      for (const blocker of blockers) (bySection[blocker.section] ??= []).push(blocker.text);
      const sections = Object.keys(bySection).map((id) => sectionById(id)?.title ?? id);
      throw new AppError(
        'invalid_input',
        `The survey cannot be submitted yet: ${blockers.length} ${blockers.length === 1 ? 'item is' : 'items are'} missing (${sections.join(', ')}).`,
        bySection,
      );
    }

    const data = survey.data as LatheSurvey;
    const inspectedYear = Number((data.inspectedOn ?? new Date().toISOString()).slice(0, 4));
    const options = await loadScoreOptions(tx, toMillimetres(data.machine.swingOverBed), inspectedYear);
    const result = scoreSurvey(data, options);
    const report = await insertDraftReport(tx, {
      inspectionId: inspection.id,
      machineId: inspection.machineId,
      surveyVersion: survey.version,
      inspectorId: actor!.id,
      result,
    });
    const submittedAt = new Date();
    await markSurveySubmitted(tx, inspection.id, submittedAt);
    await moveInspection(tx, { inspectionId: inspection.id, from: inspection.status, to: 'in_review', actorId: actor!.id, note: 'Survey submitted' });
    // Queued in this transaction: the coordinators hear of it only if the submission commits.
    const findingsOutOfTolerance = result.checks.filter((check) => check.q !== null && check.q > 1).length;
    for (const coordinator of await listActiveCoordinators(tx)) {
      await enqueueEmail(tx, {
        to: coordinator.email,
        template: 'survey-submitted',
        data: {
          coordinatorName: coordinator.name,
          machine: { maker: inspection.maker, model: inspection.model, serialNumber: data.machine.serialNumber ?? inspection.serialNumber },
          inspectorName: actor!.name ?? 'The inspector',
          submittedAt,
          findingsOutOfTolerance,
          url: appLink(`/inspections/${inspection.id}/review`),
        },
      });
    }
    return {
      data: {
        inspectionId: inspection.id,
        reportId: report.reportId,
        reportVersion: report.version,
        scoringVersion: result.scoringVersion,
        overallCondition: result.overall.condition,
        submittedAt: submittedAt.toISOString(),
      },
      entityId: inspection.id,
      detail: { surveyVersion: survey.version, scoringVersion: result.scoringVersion, reportId: report.reportId },
    };
  },
});
