import { greet, renderMail } from '../render';

export type VerifyEmailData = { name: string | null; url: string; expiresInHours: number };

export function verifyEmail(data: VerifyEmailData) {
  return renderMail({
    subject: 'Confirm your e-mail address for Waygrade',
    greeting: greet(data.name),
    paragraphs: [
      'Thank you for signing up to Waygrade. Please confirm that this address is yours, so we can send you inspection dates, reports and receipts.',
      `The link works once and for ${data.expiresInHours} hours.`,
    ],
    action: { label: 'Confirm my address', url: data.url },
    footnote: 'If you did not sign up to Waygrade, ignore this mail: no account becomes usable without this step.',
  });
}
