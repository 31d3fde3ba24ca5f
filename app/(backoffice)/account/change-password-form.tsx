'use client';

import { useState } from 'react';
import { useRouter } from 'next/navigation';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { applyFieldErrors } from '@/components/forms/apply-field-errors';
import { FormAlert } from '@/components/forms/form-alert';
import { TextField } from '@/components/forms/text-field';
import { Button } from '@/components/ui/button';
import { changePasswordSchema } from '@/lib/validation/change-password';
import { PASSWORD_HINT } from '@/lib/validation/password';
import { changePasswordAction } from './actions';

type Schema = typeof changePasswordSchema;

export function ChangePasswordForm({ email }: { email: string | null }) {
  const router = useRouter();
  const { register, handleSubmit, formState, setError } = useForm<z.input<Schema>, unknown, z.output<Schema>>({ resolver: zodResolver(changePasswordSchema), mode: 'onTouched' });
  const [message, setMessage] = useState<string | null>(null);

  const onSubmit = handleSubmit(async (values) => {
    setMessage(null);
    const result = await changePasswordAction(values);
    // The session ended with the change: on to sign-in with a notice.
    if (result.ok) router.push('/sign-in?notice=password-changed');
    else setMessage(applyFieldErrors(result, setError, ['currentPassword', 'password', 'passwordAgain']));
  });

  return (
    <form onSubmit={onSubmit} className="space-y-5" noValidate>
      {email ? <input type="email" name="username" autoComplete="username" value={email} readOnly hidden /> : null}
      <TextField label="Current password" type="password" autoComplete="current-password" {...register('currentPassword')} error={formState.errors.currentPassword?.message} />
      <TextField label="New password" type="password" autoComplete="new-password" hint={PASSWORD_HINT} {...register('password')} error={formState.errors.password?.message} />
      <TextField label="New password again" type="password" autoComplete="new-password" {...register('passwordAgain')} error={formState.errors.passwordAgain?.message} />
      {message ? <FormAlert tone="error">{message}</FormAlert> : null}
      <Button type="submit" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? 'Saving…' : 'Change password'}
      </Button>
    </form>
  );
}
