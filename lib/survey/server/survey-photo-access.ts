import 'server-only';
import { findInspectionWithMachine } from '@/db/queries/surveys';
import { defineOperation } from '@/lib/auth/operation';
import { AppError } from '@/lib/errors';
import { surveyPhotoTargetSchema } from '@/lib/validation/survey';
import { isAssignedInspector } from './assigned-inspection';

/** Before any bytes move: may this person add a photo to this section of this survey now? */
export const authorizeSurveyPhoto = defineOperation({
  name: 'survey.photo.authorize',
  entityType: 'survey',
  access: 'survey.edit.assigned',
  input: surveyPhotoTargetSchema,
  authorize: isAssignedInspector,
  auditSuccess: false,
  async run({ input, tx }) {
    const inspection = await findInspectionWithMachine(tx, input.inspectionId);
    if (!inspection) throw new AppError('not_found');
    if (inspection.status !== 'on_site') throw new AppError('conflict', 'Photos can be added while the visit is under way.');
    return { data: { inspectionId: input.inspectionId, section: input.section } };
  },
});
