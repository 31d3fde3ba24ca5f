'use client';

import { EmailRequestForm } from '../email-request-form';
import { requestPasswordResetAction } from './actions';

export function ForgotPasswordForm() {
  return (
    <EmailRequestForm
      action={requestPasswordResetAction}
      submitLabel="Mail me a link"
      pendingLabel="Sending…"
      sentText={(email) => `If ${email} belongs to a Waygrade account, a link to choose a new password is on its way. It works for an hour.`}
    />
  );
}
