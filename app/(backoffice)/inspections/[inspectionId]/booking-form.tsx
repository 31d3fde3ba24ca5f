'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { Button } from '@/components/ui/button';
import { applyFieldErrors } from '@/components/forms/apply-field-errors';
import { Field, FormMessage, INPUT_CLASS } from '@/components/forms/field';
import { bookingSchema } from '@/lib/validation/inspection';
import { bookInspectionAction } from '../actions';

type FormIn = z.input<typeof bookingSchema>;
type FormOut = z.output<typeof bookingSchema>;

export type InspectorOption = { id: string; name: string; jobs: Array<{ when: string; town: string }> };

export function BookingForm({
  inspectionId,
  inspectors,
  defaults,
  feeHint,
  minDate,
}: {
  inspectionId: number;
  inspectors: InspectorOption[];
  defaults: Partial<FormIn>;
  feeHint: string;
  minDate: string;
}) {
  const router = useRouter();
  const [message, setMessage] = useState<{ text: string; tone: 'error' | 'ok' } | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    watch,
    formState: { errors, isSubmitting },
  } = useForm<FormIn, unknown, FormOut>({ resolver: zodResolver(bookingSchema), defaultValues: { inspectionId, ...defaults } });
  const chosen = inspectors.find((i) => i.id === watch('inspectorId'));

  const onSubmit = handleSubmit(async (values) => {
    const result = await bookInspectionAction(values);
    if (!result.ok) {
      const text = applyFieldErrors(result, setError, Object.keys(bookingSchema.shape));
      return setMessage(text ? { text, tone: 'error' } : null);
    }
    setMessage({ text: 'Booked. The seller and the inspector have been e-mailed.', tone: 'ok' });
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-5">
      <div className="grid gap-5 sm:grid-cols-2">
        <Field id="date" label="Date" error={errors.date?.message}>
          <input id="date" type="date" min={minDate} {...register('date')} className={`${INPUT_CLASS} figures`} />
        </Field>
        <Field id="time" label="Arrival time (UTC)" error={errors.time?.message}>
          <input id="time" type="time" step={900} {...register('time')} className={`${INPUT_CLASS} figures`} />
        </Field>
        <Field id="inspectorId" label="Inspector" error={errors.inspectorId?.message}>
          <select id="inspectorId" {...register('inspectorId')} className={INPUT_CLASS}>
            <option value="">Choose…</option>
            {inspectors.map((i) => (
              <option key={i.id} value={i.id}>
                {i.name} — {i.jobs.length} upcoming
              </option>
            ))}
          </select>
        </Field>
        <Field id="feeEuros" label="Inspection fee (€)" hint={feeHint} error={errors.feeEuros?.message}>
          <input id="feeEuros" inputMode="decimal" {...register('feeEuros')} className={`${INPUT_CLASS} figures`} />
        </Field>
      </div>
      {chosen ? (
        <div className="rounded-lg bg-paper-sunken p-3 text-sm">
          <p className="font-medium">{chosen.name}&apos;s booked jobs</p>
          {chosen.jobs.length === 0 ? (
            <p className="text-ink-soft">Nothing booked.</p>
          ) : (
            <ul className="figures mt-1 space-y-0.5">
              {chosen.jobs.map((job, i) => (
                <li key={i}>
                  {job.when} · {job.town}
                </li>
              ))}
            </ul>
          )}
        </div>
      ) : null}
      <FormMessage message={message?.text} tone={message?.tone} />
      <Button type="submit" disabled={isSubmitting}>
        {isSubmitting ? 'Booking…' : defaults.inspectorId ? 'Move the booking' : 'Book and assign'}
      </Button>
    </form>
  );
}
