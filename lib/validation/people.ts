import { z } from 'zod';
import { ROLES } from '@/db/schema/users';
import { emailAddress } from './email-address';

/** Roles only a coordinator can hand out. */
export const INVITED_ROLES = ['inspector', 'admin'] as const;

export const inviteUserSchema = z.object({
  name: z.string().trim().min(1, 'Enter the person’s name').max(120, 'Keep the name under 120 characters'),
  email: emailAddress,
  role: z.enum(INVITED_ROLES, 'Choose inspector or coordinator'),
});

const userId = z.uuid('Unknown account');

export const changeRoleSchema = z.object({ userId, role: z.enum(ROLES, 'Choose a role') });

export const accountStatusSchema = z.object({ userId });
