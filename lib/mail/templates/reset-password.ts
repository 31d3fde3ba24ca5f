import { greet, renderMail } from '../render';

export type ResetPasswordData = { name: string | null; url: string; expiresInMinutes: number };

export function resetPassword(data: ResetPasswordData) {
  return renderMail({
    subject: 'Choose a new Waygrade password',
    greeting: greet(data.name),
    paragraphs: [
      'Someone — hopefully you — asked to reset the password of your Waygrade account.',
      `Choose a new one with the link below. It works once and for ${data.expiresInMinutes} minutes. Choosing a new password signs you out everywhere else.`,
    ],
    action: { label: 'Choose a new password', url: data.url },
    footnote: 'If you did not ask for this, ignore this mail: your password stays as it is.',
  });
}
