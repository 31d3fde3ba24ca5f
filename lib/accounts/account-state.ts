/** Where an account stands, as the people list and a person's page show it. */
export type AccountState = 'active' | 'invited' | 'unconfirmed' | 'deactivated';

export function accountState(account: { emailVerified: Date | null; deactivatedAt: Date | null; hasPassword: boolean }): AccountState {
  if (account.deactivatedAt) return 'deactivated';
  if (!account.hasPassword) return 'invited';
  if (!account.emailVerified) return 'unconfirmed';
  return 'active';
}

/** Each state has a word and a mark, never colour alone. */
export const ACCOUNT_STATE_LOOK: Record<AccountState, { label: string; mark: string; className: string }> = {
  active: { label: 'Active', mark: '●', className: 'border-band-true/40 text-band-true' },
  invited: { label: 'Invited', mark: '✉', className: 'border-line-strong text-ink-soft' },
  unconfirmed: { label: 'Address not confirmed', mark: '◌', className: 'border-band-worn/50 text-band-worn' },
  deactivated: { label: 'Deactivated', mark: '⊘', className: 'border-band-rebuild/40 text-band-rebuild' },
};
