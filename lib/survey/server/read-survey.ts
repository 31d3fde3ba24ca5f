import 'server-only';
import { findInspectionWithMachine, findSurvey } from '@/db/queries/surveys';
import { defineOperation } from '@/lib/auth/operation';
import { AppError } from '@/lib/errors';
import { inspectionAddressSchema } from '@/lib/validation/survey';
import { isAssignedInspector } from './assigned-inspection';

/** GET /api/surveys/:id — the saved survey and its version, as the autosave client starts from. */
export const readSurvey = defineOperation({
  name: 'survey.read',
  entityType: 'survey',
  access: 'survey.edit.assigned',
  input: inspectionAddressSchema,
  authorize: isAssignedInspector,
  auditSuccess: false,
  async run({ input, tx }) {
    const inspection = await findInspectionWithMachine(tx, input.inspectionId);
    const survey = await findSurvey(tx, input.inspectionId);
    if (!inspection || !survey) throw new AppError('not_found', 'This survey starts when you start the visit.');
    return {
      data: {
        inspectionId: input.inspectionId,
        status: inspection.status,
        version: survey.version,
        data: survey.data,
        submittedAt: survey.submittedAt?.toISOString() ?? null,
        updatedAt: survey.updatedAt.toISOString(),
      },
    };
  },
});
