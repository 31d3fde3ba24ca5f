'use client';

import { useState } from 'react';
import Link from 'next/link';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { applyFieldErrors } from '@/components/forms/apply-field-errors';
import { FormAlert } from '@/components/forms/form-alert';
import { TextField } from '@/components/forms/text-field';
import { Button } from '@/components/ui/button';
import { ROLE_LABELS } from '@/lib/roles';
import { INVITED_ROLES, inviteUserSchema } from '@/lib/validation/people';
import { inviteUserAction } from '../actions';

type Schema = typeof inviteUserSchema;

const ROLE_TEXT: Record<(typeof INVITED_ROLES)[number], string> = {
  inspector: 'Surveys the machines assigned to them.',
  admin: 'Books inspections, manages people and releases reports.',
};

export function InviteForm() {
  const { register, handleSubmit, formState, setError, reset } = useForm<z.input<Schema>, unknown, z.output<Schema>>({
    resolver: zodResolver(inviteUserSchema),
    defaultValues: { role: 'inspector' },
  });
  const [message, setMessage] = useState<string | null>(null);
  const [invited, setInvited] = useState<{ id: string; email: string } | null>(null);

  const onSubmit = handleSubmit(async (values) => {
    setMessage(null);
    const result = await inviteUserAction(values);
    if (result.ok) {
      setInvited({ id: result.data.id, email: values.email });
      reset({ role: values.role, name: '', email: '' });
    } else setMessage(applyFieldErrors(result, setError, ['name', 'email', 'role']));
  });

  return (
    <form onSubmit={onSubmit} className="space-y-5" noValidate>
      {invited ? (
        <FormAlert tone="success">
          Invitation sent to <strong>{invited.email}</strong>.{' '}
          <Link href={`/admin/people/${invited.id}`} className="font-semibold underline underline-offset-4">
            Open their page
          </Link>
        </FormAlert>
      ) : null}
      <TextField label="Name" autoComplete="off" {...register('name')} error={formState.errors.name?.message} />
      <TextField label="E-mail" type="email" autoComplete="off" {...register('email')} error={formState.errors.email?.message} />
      <fieldset>
        <legend className="font-medium">Role</legend>
        <div className="mt-2 grid gap-2 sm:grid-cols-2">
          {INVITED_ROLES.map((role) => (
            <label
              key={role}
              className="flex min-h-touch cursor-pointer items-start gap-3 rounded-lg border border-line-strong bg-paper-raised px-3 py-2 has-[:checked]:border-copper has-[:checked]:bg-copper-light/40"
            >
              <input type="radio" value={role} {...register('role')} className="mt-1.5 h-5 w-5 accent-copper" />
              <span>
                <span className="block font-medium">{ROLE_LABELS[role]}</span>
                <span className="block text-sm text-ink-soft">{ROLE_TEXT[role]}</span>
              </span>
            </label>
          ))}
        </div>
        {formState.errors.role ? <p className="mt-1 text-sm font-medium text-band-rebuild">{formState.errors.role.message}</p> : null}
      </fieldset>
      {message ? <FormAlert tone="error">{message}</FormAlert> : null}
      <Button type="submit" disabled={formState.isSubmitting} className="w-full sm:w-auto">
        {formState.isSubmitting ? 'Sending…' : 'Send invitation'}
      </Button>
    </form>
  );
}
