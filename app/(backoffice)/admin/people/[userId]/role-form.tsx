'use client';

import { useState, useTransition } from 'react';
import { useRouter } from 'next/navigation';
import { FormAlert } from '@/components/forms/form-alert';
import { SelectField } from '@/components/forms/select-field';
import { Button } from '@/components/ui/button';
import { ROLE_LABELS, type Role } from '@/lib/roles';
import { changeRoleAction } from '../actions';

const OPTIONS = Object.entries(ROLE_LABELS).map(([value, label]) => ({ value, label }));

export function RoleForm({ userId, role }: { userId: string; role: Role }) {
  const router = useRouter();
  const [chosen, setChosen] = useState<Role>(role);
  const [pending, startTransition] = useTransition();
  const [result, setResult] = useState<{ tone: 'success' | 'error'; text: string } | null>(null);

  const save = () =>
    startTransition(async () => {
      const outcome = await changeRoleAction({ userId, role: chosen });
      setResult(outcome.ok ? { tone: 'success', text: `Role changed to ${ROLE_LABELS[chosen].toLowerCase()}.` } : { tone: 'error', text: outcome.message });
      if (outcome.ok) router.refresh();
    });

  return (
    <form
      className="space-y-4"
      onSubmit={(event) => {
        event.preventDefault();
        save();
      }}
    >
      <SelectField label="Role" options={OPTIONS} value={chosen} onChange={(event) => setChosen(event.target.value as Role)} />
      <p className="text-sm text-ink-soft">The change applies on their next page: what they see and may do follows the new role.</p>
      {result ? <FormAlert tone={result.tone}>{result.text}</FormAlert> : null}
      <Button type="submit" variant="secondary" disabled={pending || chosen === role}>
        {pending ? 'Saving…' : 'Change role'}
      </Button>
    </form>
  );
}
