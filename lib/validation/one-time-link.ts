import { z } from 'zod';
import { PASSWORDS_DIFFER, passwordSchema, passwordsMatch } from './password';

// Tokens are 32 random bytes in base64url: 43 characters.
export const linkToken = z.string().trim().regex(/^[A-Za-z0-9_-]{32,64}$/, 'This link is incomplete. Copy the whole address from the mail.');

export const confirmEmailSchema = z.object({ token: linkToken });

/** Choosing a password from a mailed link: a reset or an invitation. */
export const passwordFromLinkSchema = z
  .object({ token: linkToken, password: passwordSchema, passwordAgain: z.string() })
  .refine(passwordsMatch, PASSWORDS_DIFFER);
