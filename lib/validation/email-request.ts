import { z } from 'zod';
import { emailAddress } from './email-address';

/** Forms that only ask for an address: forgotten password, a new confirmation link. */
export const emailRequestSchema = z.object({ email: emailAddress });
