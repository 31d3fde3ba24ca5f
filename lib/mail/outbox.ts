import 'server-only';
import { emailOutbox } from '@/db/schema';
import type { Database } from '@/db/client';
import { renderTemplate, type MailTemplateName, type MailTemplateData } from './templates';

type Writer = Pick<Database, 'insert'>;

export type QueuedEmail<N extends MailTemplateName> = { to: string; template: N; data: MailTemplateData<N> };

/**
 * Renders a mail and queues it in the caller's transaction: it is sent only if the change that
 * caused it commits, and a mail outage later cannot undo or fail that change.
 */
export async function enqueueEmail<N extends MailTemplateName>(writer: Writer, email: QueuedEmail<N>) {
  const rendered = renderTemplate(email.template, email.data);
  await writer.insert(emailOutbox).values({
    toAddress: email.to,
    template: email.template,
    subject: rendered.subject,
    textBody: rendered.text,
    htmlBody: rendered.html,
    status: 'pending',
    nextAttemptAt: new Date(),
  });
}
