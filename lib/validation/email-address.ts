import { z } from 'zod';

/** E-mail addresses are compared in lower case; surrounding spaces from copy and paste are dropped. */
export const emailAddress = z
  .string()
  .trim()
  .toLowerCase()
  .max(254, 'That address is too long')
  .pipe(z.email('Enter an e-mail address such as name@workshop.example'));
