import 'server-only';
import { insertSurveyPhoto } from '@/db/queries/survey-photos';
import { findInspectionWithMachine } from '@/db/queries/surveys';
import { defineOperation } from '@/lib/auth/operation';
import { AppError } from '@/lib/errors';
import { publicFileUrl } from '@/lib/storage/file-url';
import { surveyPhotoRecordSchema } from '@/lib/validation/survey';
import { isAssignedInspector } from './assigned-inspection';

/** Records a processed survey photo (its cleaned full-size, display and thumbnail files). */
export const recordSurveyPhoto = defineOperation({
  name: 'survey.photo.add',
  entityType: 'photo',
  access: 'survey.edit.assigned',
  input: surveyPhotoRecordSchema,
  authorize: isAssignedInspector,
  async run({ actor, input, tx }) {
    const inspection = await findInspectionWithMachine(tx, input.inspectionId);
    if (!inspection) throw new AppError('not_found');
    const id = await insertSurveyPhoto(tx, {
      machineId: inspection.machineId,
      inspectionId: input.inspectionId,
      section: input.section,
      caption: input.caption ?? null,
      fileKey: input.fileKey,
      originalUrl: input.originalUrl,
      displayKey: input.displayKey,
      thumbKey: input.thumbKey,
      widthPx: input.widthPx,
      heightPx: input.heightPx,
      bytes: input.bytes,
      uploadedById: actor!.id,
    });
    return {
      data: {
        id,
        section: input.section,
        caption: input.caption ?? null,
        widthPx: input.widthPx,
        heightPx: input.heightPx,
        displayUrl: publicFileUrl(input.displayKey),
        thumbUrl: publicFileUrl(input.thumbKey),
      },
      entityId: id,
      detail: { inspectionId: input.inspectionId, section: input.section },
    };
  },
});
