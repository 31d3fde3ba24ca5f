'use server';

import { deactivateAccount, reactivateAccount } from '@/lib/accounts/account-status';
import { changeRole } from '@/lib/accounts/change-role';
import { inviteUser } from '@/lib/accounts/invite-user';
import { runAsCurrentUser } from '@/lib/auth/adapters';

export async function inviteUserAction(input: unknown) {
  return runAsCurrentUser(inviteUser, input);
}

export async function changeRoleAction(input: unknown) {
  return runAsCurrentUser(changeRole, input);
}

export async function deactivateAccountAction(input: unknown) {
  return runAsCurrentUser(deactivateAccount, input);
}

export async function reactivateAccountAction(input: unknown) {
  return runAsCurrentUser(reactivateAccount, input);
}
