import { greet, renderMail } from '../render';

export type AccountExistsData = { name: string | null; signInUrl: string; resetUrl: string };

/** Sent instead of a second sign-up, so the sign-up page never reveals which addresses have accounts. */
export function accountExists(data: AccountExistsData) {
  return renderMail({
    subject: 'You already have a Waygrade account',
    greeting: greet(data.name),
    paragraphs: [
      'Someone tried to sign up to Waygrade with this address, but it already has an account.',
      `If that was you, sign in at ${data.signInUrl}, or choose a new password with the link below if you have forgotten it.`,
    ],
    action: { label: 'Choose a new password', url: data.resetUrl },
    footnote: 'If it was not you, ignore this mail: nothing about your account has changed.',
  });
}
