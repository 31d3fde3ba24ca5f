import { ACCOUNT_STATE_LOOK, type AccountState } from '@/lib/accounts/account-state';

export function AccountStateBadge({ state }: { state: AccountState }) {
  const look = ACCOUNT_STATE_LOOK[state];
  return (
    <span className={`inline-flex items-center gap-1 whitespace-nowrap rounded-full border px-2 py-0.5 text-sm font-medium ${look.className}`}>
      <span aria-hidden="true">{look.mark}</span>
      {look.label}
    </span>
  );
}
