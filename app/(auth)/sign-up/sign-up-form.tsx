'use client';

import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { applyFieldErrors } from '@/components/forms/apply-field-errors';
import { FormAlert } from '@/components/forms/form-alert';
import { TextField } from '@/components/forms/text-field';
import { Button } from '@/components/ui/button';
import { PASSWORD_HINT } from '@/lib/validation/password';
import { SELF_SERVICE_ROLES, SELF_SERVICE_ROLE_TEXT, signUpSchema } from '@/lib/validation/sign-up';
import { signUpAction } from './actions';

type Schema = typeof signUpSchema;
const FIELDS = ['role', 'name', 'businessName', 'town', 'region', 'email', 'password', 'passwordAgain'] as const;

export function SignUpForm() {
  const form = useForm<z.input<Schema>, unknown, z.output<Schema>>({ resolver: zodResolver(signUpSchema), mode: 'onTouched' });
  const { register, handleSubmit, formState, setError } = form;
  const errors = formState.errors;
  const [message, setMessage] = useState<string | null>(null);
  const [sentTo, setSentTo] = useState<string | null>(null);

  const onSubmit = handleSubmit(async (values) => {
    setMessage(null);
    const result = await signUpAction(values);
    if (result.ok) setSentTo(result.data.email);
    else setMessage(applyFieldErrors(result, setError, FIELDS));
  });

  if (sentTo) {
    return (
      <FormAlert tone="success">
        <p className="font-semibold">Check your inbox</p>
        <p className="mt-1">
          We sent a link to <strong>{sentTo}</strong>. Open it to confirm your address, then sign in. The link works for two days; if nothing arrives
          within a few minutes, look in the spam folder.
        </p>
      </FormAlert>
    );
  }

  return (
    <form onSubmit={onSubmit} className="space-y-5" noValidate>
      <fieldset>
        <legend className="font-medium">What will you use Waygrade for?</legend>
        <div className="mt-2 grid gap-2">
          {SELF_SERVICE_ROLES.map((role) => (
            <label
              key={role}
              className="flex min-h-touch cursor-pointer items-start gap-3 rounded-lg border border-line-strong bg-paper-raised px-3 py-2 has-[:checked]:border-copper has-[:checked]:bg-copper-light/40"
            >
              <input type="radio" value={role} {...register('role')} className="mt-1.5 h-5 w-5 accent-copper" />
              <span>
                <span className="block font-medium">{SELF_SERVICE_ROLE_TEXT[role].title}</span>
                <span className="block text-sm text-ink-soft">{SELF_SERVICE_ROLE_TEXT[role].text}</span>
              </span>
            </label>
          ))}
        </div>
        {errors.role ? <p className="mt-1 text-sm font-medium text-band-rebuild">{errors.role.message}</p> : null}
      </fieldset>
      <TextField label="Your name" autoComplete="name" {...register('name')} error={errors.name?.message} />
      <TextField label="Business name" autoComplete="organization" {...register('businessName')} error={errors.businessName?.message} />
      <div className="grid gap-5 sm:grid-cols-2">
        <TextField label="Town" autoComplete="address-level2" {...register('town')} error={errors.town?.message} />
        <TextField label="Region" autoComplete="address-level1" {...register('region')} error={errors.region?.message} />
      </div>
      <TextField label="E-mail" type="email" autoComplete="email" {...register('email')} error={errors.email?.message} />
      <TextField label="Password" type="password" autoComplete="new-password" hint={PASSWORD_HINT} {...register('password')} error={errors.password?.message} />
      <TextField label="Password again" type="password" autoComplete="new-password" {...register('passwordAgain')} error={errors.passwordAgain?.message} />
      {message ? <FormAlert tone="error">{message}</FormAlert> : null}
      <Button type="submit" disabled={formState.isSubmitting} className="w-full">
        {formState.isSubmitting ? 'Creating your account…' : 'Create account'}
      </Button>
    </form>
  );
}
