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
import type { OperationResult } from '@/lib/auth/operation';
import { PASSWORD_HINT } from '@/lib/validation/password';
import { passwordFromLinkSchema } from '@/lib/validation/one-time-link';

type Schema = typeof passwordFromLinkSchema;

/** Choosing a password from a mailed link (reset or invitation), then on to sign-in. */
export function PasswordFromLinkForm({
  token,
  email,
  action,
  submitLabel,
}: {
  token: string;
  email: string | null;
  action: (input: unknown) => Promise<OperationResult<{ email: string }>>;
  submitLabel: string;
}) {
  const router = useRouter();
  const { register, handleSubmit, formState, setError } = useForm<z.input<Schema>, unknown, z.output<Schema>>({
    resolver: zodResolver(passwordFromLinkSchema),
    defaultValues: { token },
    mode: 'onTouched',
  });
  const [message, setMessage] = useState<string | null>(null);

  const onSubmit = handleSubmit(async (values) => {
    setMessage(null);
    const result = await action(values);
    if (result.ok) router.push('/sign-in?notice=password-set');
    else setMessage(applyFieldErrors(result, setError, ['password', 'passwordAgain']));
  });

  return (
    <form onSubmit={onSubmit} className="space-y-5" noValidate>
      {/* Lets password managers file the new password under the right account. */}
      {email ? <input type="email" name="username" autoComplete="username" value={email} readOnly hidden /> : null}
      <input type="hidden" {...register('token')} />
      <TextField label="New password" type="password" autoComplete="new-password" hint={PASSWORD_HINT} {...register('password')} error={formState.errors.password?.message} />
      <TextField label="New password again" type="password" autoComplete="new-password" {...register('passwordAgain')} error={formState.errors.passwordAgain?.message} />
      {message ? <FormAlert tone="error">{message}</FormAlert> : null}
      <Button type="submit" disabled={formState.isSubmitting} className="w-full">
        {formState.isSubmitting ? 'Saving…' : submitLabel}
      </Button>
    </form>
  );
}
