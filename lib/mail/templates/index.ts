import type { RenderedMail } from '../render';
import { accountExists } from './account-exists';
import { inspectionBooked } from './inspection-booked';
import { inspectionCancelled } from './inspection-cancelled';
import { invitation } from './invitation';
import { paymentReceipt } from './payment-receipt';
import { refund } from './refund';
import { reinspectionPaid } from './reinspection-paid';
import { reinspectionReportReady } from './reinspection-report-ready';
import { reportReleased } from './report-released';
import { resetPassword } from './reset-password';
import { surveyReturned } from './survey-returned';
import { surveySubmitted } from './survey-submitted';
import { verifyEmail } from './verify-email';

/** Every mail Waygrade sends, by the name stored in email_outbox.template. */
export const MAIL_TEMPLATES = {
  'verify-email': verifyEmail,
  'reset-password': resetPassword,
  invitation,
  'account-exists': accountExists,
  'inspection-booked': inspectionBooked,
  'inspection-cancelled': inspectionCancelled,
  'survey-submitted': surveySubmitted,
  'survey-returned': surveyReturned,
  'report-released': reportReleased,
  'payment-receipt': paymentReceipt,
  refund,
  'reinspection-paid': reinspectionPaid,
  'reinspection-report-ready': reinspectionReportReady,
} as const satisfies Record<string, (data: never) => RenderedMail>;

export type MailTemplateName = keyof typeof MAIL_TEMPLATES;
export type MailTemplateData<N extends MailTemplateName> = Parameters<(typeof MAIL_TEMPLATES)[N]>[0];

export function renderTemplate<N extends MailTemplateName>(template: N, data: MailTemplateData<N>): RenderedMail {
  const render = MAIL_TEMPLATES[template] as (data: MailTemplateData<N>) => RenderedMail;
  return render(data);
}
