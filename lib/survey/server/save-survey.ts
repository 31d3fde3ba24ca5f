import 'server-only';
import { findInspectionWithMachine, findSurvey, updateSurveyIfCurrent } from '@/db/queries/surveys';
import { defineOperation } from '@/lib/auth/operation';
import { AppError } from '@/lib/errors';
import { saveSurveySchema } from '@/lib/validation/survey';
import { isAssignedInspector } from './assigned-inspection';

export const SURVEY_CHANGED_ELSEWHERE =
  'This survey was changed on another device since this one last saved. Your edits here are kept: load the other device’s version, or keep yours and save over it.';

/**
 * PUT /api/surveys/:id — autosave of the whole survey. A save names the version it was made on;
 * when the server holds a newer one the save is refused (409) and nothing is overwritten.
 * Autosaves are not written to the audit log one by one: the survey row keeps its version and who
 * saved it last, and submitting is audited.
 */
export const saveSurvey = defineOperation({
  name: 'survey.save',
  entityType: 'survey',
  access: 'survey.edit.assigned',
  input: saveSurveySchema,
  authorize: isAssignedInspector,
  auditSuccess: false,
  async run({ actor, input, tx }) {
    // The survey row is locked first, as submitting locks it: a save waiting on a submission then
    // finds it submitted and is refused, instead of being stored after the report was scored.
    const current = await findSurvey(tx, input.inspectionId, { lock: true });
    const inspection = await findInspectionWithMachine(tx, input.inspectionId);
    if (!inspection) throw new AppError('not_found');
    if (current?.submittedAt) throw new AppError('conflict', 'This survey has been submitted; it can no longer be changed here.');
    if (inspection.status !== 'on_site') {
      throw new AppError('conflict', 'This survey is no longer open for changes: it has been submitted or the visit has not started.');
    }
    if (!current) throw new AppError('not_found', 'This survey starts when you start the visit.');
    if (current.version !== input.baseVersion) throw new AppError('conflict', SURVEY_CHANGED_ELSEWHERE);
    const version = await updateSurveyIfCurrent(tx, { inspectionId: input.inspectionId, baseVersion: input.baseVersion, data: input.data, userId: actor!.id });
    if (version === null) throw new AppError('conflict', SURVEY_CHANGED_ELSEWHERE);
    return { data: { version }, entityId: input.inspectionId };
  },
});
