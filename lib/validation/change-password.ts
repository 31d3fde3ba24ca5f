import { z } from 'zod';
import { PASSWORDS_DIFFER, passwordSchema, passwordsMatch } from './password';

export const changePasswordSchema = z
  .object({
    currentPassword: z.string().min(1, 'Enter your current password').max(200),
    password: passwordSchema,
    passwordAgain: z.string(),
  })
  .refine(passwordsMatch, PASSWORDS_DIFFER);
