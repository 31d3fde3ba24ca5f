'use client';

import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { applyFieldErrors } from '@/components/forms/apply-field-errors';
import { FormAlert } from '@/components/forms/form-alert';
import { TextField } from '@/components/forms/text-field';
import { Button } from '@/components/ui/button';
import type { OperationResult } from '@/lib/auth/operation';
import { emailRequestSchema } from '@/lib/validation/email-request';

type Schema = typeof emailRequestSchema;

/** Asks for an address and answers the same whether it has an account or not. */
export function EmailRequestForm({
  action,
  submitLabel,
  pendingLabel,
  sentText,
}: {
  action: (input: unknown) => Promise<OperationResult<{ email: string }>>;
  submitLabel: string;
  pendingLabel: string;
  sentText: (email: string) => string;
}) {
  const { register, handleSubmit, formState, setError } = useForm<z.input<Schema>, unknown, z.output<Schema>>({ resolver: zodResolver(emailRequestSchema) });
  const [message, setMessage] = useState<string | null>(null);
  const [sentTo, setSentTo] = useState<string | null>(null);

  const onSubmit = handleSubmit(async (values) => {
    setMessage(null);
    const result = await action(values);
    if (result.ok) setSentTo(result.data.email);
    else setMessage(applyFieldErrors(result, setError, ['email']));
  });

  if (sentTo) return <FormAlert tone="success">{sentText(sentTo)}</FormAlert>;
  return (
    <form onSubmit={onSubmit} className="space-y-5" noValidate>
      <TextField label="E-mail" type="email" autoComplete="email" {...register('email')} error={formState.errors.email?.message} />
      {message ? <FormAlert tone="error">{message}</FormAlert> : null}
      <Button type="submit" disabled={formState.isSubmitting} className="w-full">
        {formState.isSubmitting ? pendingLabel : submitLabel}
      </Button>
    </form>
  );
}
