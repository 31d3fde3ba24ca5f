import { z } from 'zod';

export const signInSchema = z.object({
  email: z.string().trim().toLowerCase().pipe(z.email('Enter the e-mail address you signed up with')),
  password: z.string().min(1, 'Enter your password').max(200),
  callbackUrl: z.string().optional(),
});
