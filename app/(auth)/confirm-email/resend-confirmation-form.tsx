'use client';

import { EmailRequestForm } from '../email-request-form';
import { resendConfirmationAction } from './actions';

export function ResendConfirmationForm() {
  return (
    <EmailRequestForm
      action={resendConfirmationAction}
      submitLabel="Send a new link"
      pendingLabel="Sending…"
      sentText={(email) => `If ${email} has an account waiting for confirmation, a new link is on its way. It works for two days.`}
    />
  );
}
