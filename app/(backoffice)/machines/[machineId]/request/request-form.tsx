'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { Button } from '@/components/ui/button';
import { applyFieldErrors } from '@/components/forms/apply-field-errors';
import { Field, FormMessage, INPUT_CLASS } from '@/components/forms/field';
import { inspectionRequestSchema } from '@/lib/validation/inspection';
import { requestInspectionAction } from '../../actions';

type FormIn = z.input<typeof inspectionRequestSchema>;
type FormOut = z.output<typeof inspectionRequestSchema>;

export function RequestInspectionForm({ machineId, contactName, minDate }: { machineId: number; contactName: string; minDate: string }) {
  const router = useRouter();
  const [message, setMessage] = useState<string | null>(null);
  const [dates, setDates] = useState<string[]>(['', '', '']);
  const {
    register,
    handleSubmit,
    setError,
    setValue,
    formState: { errors, isSubmitting },
  } = useForm<FormIn, unknown, FormOut>({
    resolver: zodResolver(inspectionRequestSchema),
    defaultValues: { machineId, preferredDates: [], siteContactName: contactName },
  });

  const setDate = (index: number, value: string) => {
    const next = dates.map((d, i) => (i === index ? value : d));
    setDates(next);
    setValue('preferredDates', next.filter(Boolean), { shouldValidate: false });
  };

  const onSubmit = handleSubmit(async (values) => {
    const result = await requestInspectionAction(values);
    if (!result.ok) {
      setMessage(applyFieldErrors(result, setError, Object.keys(inspectionRequestSchema.shape)));
      return;
    }
    router.push(`/machines/${machineId}`);
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-6">
      <fieldset>
        <legend className="font-medium">Dates that suit you</legend>
        <p className="text-sm text-ink-soft">Offer up to three. The coordinator confirms one and tells you the time.</p>
        <div className="mt-2 grid gap-3 sm:grid-cols-3">
          {dates.map((value, i) => (
            <input
              key={i}
              type="date"
              min={minDate}
              aria-label={`Preferred date ${i + 1}`}
              value={value}
              onChange={(e) => setDate(i, e.target.value)}
              className={`${INPUT_CLASS} figures`}
            />
          ))}
        </div>
        {errors.preferredDates ? <p className="mt-1 text-sm font-medium text-band-rebuild">{errors.preferredDates.message ?? errors.preferredDates.root?.message}</p> : null}
      </fieldset>
      <div className="grid gap-5 sm:grid-cols-2">
        <Field id="siteContactName" label="Who meets the inspector" error={errors.siteContactName?.message}>
          <input id="siteContactName" {...register('siteContactName')} className={INPUT_CLASS} />
        </Field>
        <Field id="siteContactPhone" label="Their phone" error={errors.siteContactPhone?.message}>
          <input id="siteContactPhone" type="tel" {...register('siteContactPhone')} className={INPUT_CLASS} />
        </Field>
      </div>
      <Field id="siteAccessNotes" label="Access and site notes" hint="Opening hours, gate, forklift, where the isolator is" error={errors.siteAccessNotes?.message}>
        <textarea id="siteAccessNotes" rows={3} {...register('siteAccessNotes')} className={`${INPUT_CLASS} py-2`} />
      </Field>
      <div className="rounded-lg border border-copper/40 bg-copper-light/40 p-4 text-sm">
        <p className="font-semibold">Before the visit</p>
        <p>
          The inspector runs the machine under power and opens covers and the electrical cabinet. Please have it connected, clean,
          and free to run, and have someone there who may isolate it. Electrical work stays with your qualified electrician.
        </p>
      </div>
      <FormMessage message={message} />
      <Button type="submit" disabled={isSubmitting}>
        {isSubmitting ? 'Sending…' : 'Request the inspection'}
      </Button>
    </form>
  );
}
