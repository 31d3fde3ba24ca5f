import 'server-only';
import { findInspectionWithMachine, findSurvey, insertSurvey } from '@/db/queries/surveys';
import { moveInspection } from '@/lib/workflow/status-events';
import { defineOperation } from '@/lib/auth/operation';
import { AppError } from '@/lib/errors';
import { INSPECTION_STATUS_LABELS } from '@/lib/inspection-status';
import { mayTransition } from '@/lib/roles';
import { SURVEY_FORMAT_VERSION } from '@/lib/scoring';
import { inspectionAddressSchema } from '@/lib/validation/survey';
import { startingSurvey } from '../starting-survey';
import { isAssignedInspector } from './assigned-inspection';

/** The inspector arrives: booked → on site, and the survey opens with the listing's facts filled in. */
export const startVisit = defineOperation({
  name: 'inspection.start-visit',
  entityType: 'inspection',
  access: 'survey.edit.assigned',
  input: inspectionAddressSchema,
  authorize: isAssignedInspector,
  async run({ actor, input, tx }) {
    const inspection = await findInspectionWithMachine(tx, input.inspectionId, { lock: true });
    if (!inspection) throw new AppError('not_found');
    if (!mayTransition(actor!.role, inspection.status, 'on_site')) {
      throw new AppError('conflict', `This inspection is “${INSPECTION_STATUS_LABELS[inspection.status]}”; the visit cannot be started now.`);
    }
    await moveInspection(tx, { inspectionId: inspection.id, from: inspection.status, to: 'on_site', actorId: actor!.id });
    if (!(await findSurvey(tx, inspection.id))) {
      const today = new Date().toISOString().slice(0, 10);
      await insertSurvey(tx, { inspectionId: inspection.id, formatVersion: SURVEY_FORMAT_VERSION, data: startingSurvey(inspection, today), userId: actor!.id });
    }
    return { data: { inspectionId: inspection.id }, entityId: inspection.id };
  },
});
