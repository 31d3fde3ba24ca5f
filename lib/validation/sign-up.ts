import { z } from 'zod';
import { emailAddress } from './email-address';
import { PASSWORDS_DIFFER, passwordSchema, passwordsMatch } from './password';

/** Roles a person may choose for themselves; inspectors and coordinators are invited. */
export const SELF_SERVICE_ROLES = ['seller', 'buyer', 'dealer'] as const;

export const SELF_SERVICE_ROLE_TEXT: Record<(typeof SELF_SERVICE_ROLES)[number], { title: string; text: string }> = {
  seller: { title: 'I sell machines', text: 'List used lathes and ask for an independent inspection.' },
  buyer: { title: 'I buy a machine', text: 'Find inspected machines and pay to download their reports.' },
  dealer: { title: 'I trade machines', text: 'Buy reports and compare many inspected machines side by side.' },
};

const requiredText = (label: string, max: number) =>
  z.string().trim().min(1, `Enter ${label}`).max(max, `Keep ${label} under ${max} characters`);

export const signUpSchema = z
  .object({
    role: z.enum(SELF_SERVICE_ROLES, 'Choose what you will use Waygrade for'),
    name: requiredText('your name', 120),
    businessName: requiredText('the name of your business', 160),
    town: requiredText('your town', 120),
    region: requiredText('your region', 120),
    email: emailAddress,
    password: passwordSchema,
    passwordAgain: z.string(),
  })
  .refine(passwordsMatch, PASSWORDS_DIFFER);

export type SignUpInput = z.input<typeof signUpSchema>;
