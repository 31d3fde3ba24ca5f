import { z } from 'zod';

// Length over symbols: a long phrase a person can remember beats a short jumble they must write down.
// bcrypt reads only the first 72 bytes, so longer passwords would silently lose their tail.
export const PASSWORD_MIN_LENGTH = 12;
export const PASSWORD_MAX_BYTES = 72;

export const PASSWORD_HINT = `At least ${PASSWORD_MIN_LENGTH} characters. A few words in a row works well; no symbols required.`;

export const passwordSchema = z
  .string()
  .min(PASSWORD_MIN_LENGTH, `Use at least ${PASSWORD_MIN_LENGTH} characters — a short phrase is fine`)
  .refine((value) => new TextEncoder().encode(value).length <= PASSWORD_MAX_BYTES, 'Use at most 72 characters (fewer with accents or emoji)')
  .refine((value) => new Set(value).size > 2, 'Use more than one or two different characters');

/** A new password typed twice; the second must match. */
export const newPasswordFields = z.object({
  password: passwordSchema,
  passwordAgain: z.string(),
});

export function passwordsMatch(value: { password: string; passwordAgain: string }) {
  return value.password === value.passwordAgain;
}

export const PASSWORDS_DIFFER = { message: 'The two passwords differ', path: ['passwordAgain'] };
