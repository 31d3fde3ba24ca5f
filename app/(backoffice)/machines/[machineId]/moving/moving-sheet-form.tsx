'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Button } from '@/components/ui/button';
import { applyFieldErrors } from '@/components/forms/apply-field-errors';
import { Field, FormMessage, INPUT_CLASS } from '@/components/forms/field';
import { SITE_ACCESS, SITE_ACCESS_LABELS } from '@/lib/decision/rigging-estimate';
import { movingSheetSchema, type MovingSheetForm as MovingSheetValues, type MovingSheetFormInput } from '@/lib/validation/moving-sheet';
import { saveMovingSheetAction } from './actions';

const NUMBERS = [
  { name: 'weightKg', label: 'Weight (kg)', hint: 'From the maker’s data or a weighbridge ticket' },
  { name: 'lengthMm', label: 'Length (mm)' },
  { name: 'widthMm', label: 'Width (mm)' },
  { name: 'heightMm', label: 'Height (mm)' },
] as const;

export function MovingSheetForm({ machineId, defaults }: { machineId: number; defaults: Partial<MovingSheetFormInput> }) {
  const router = useRouter();
  const [message, setMessage] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState: { errors, isSubmitting } } = useForm<MovingSheetFormInput, unknown, MovingSheetValues>({
    resolver: zodResolver(movingSheetSchema),
    defaultValues: { heavyEnd: 'headstock', siteAccess: 'ground-level-wide', ...defaults },
  });
  const onSubmit = handleSubmit(async (values) => {
    setMessage(null);
    const result = await saveMovingSheetAction({ ...values, machineId });
    if (!result.ok) return setMessage(applyFieldErrors(result, setError, Object.keys(movingSheetSchema.shape)));
    router.push(`/machines/${machineId}`);
    router.refresh();
  });
  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-5 sm:grid-cols-2">
      {NUMBERS.map((f) => (
        <Field key={f.name} id={f.name} label={f.label} hint={'hint' in f ? f.hint : undefined} error={errors[f.name]?.message}>
          <input id={f.name} inputMode="numeric" {...register(f.name)} aria-invalid={Boolean(errors[f.name])} className={`${INPUT_CLASS} figures`} />
        </Field>
      ))}
      <Field id="heavyEnd" label="Heavy end" error={errors.heavyEnd?.message}>
        <select id="heavyEnd" {...register('heavyEnd')} className={INPUT_CLASS}>
          <option value="headstock">Headstock end</option>
          <option value="tailstock">Tailstock end</option>
          <option value="even">Evenly balanced</option>
        </select>
      </Field>
      <Field id="siteAccess" label="Site access" error={errors.siteAccess?.message}>
        <select id="siteAccess" {...register('siteAccess')} className={INPUT_CLASS}>
          {SITE_ACCESS.map((a) => (
            <option key={a} value={a}>{SITE_ACCESS_LABELS[a]}</option>
          ))}
        </select>
      </Field>
      <Field id="accessNotes" label="About the way out" hint="Door width, steps, crane or forklift on site" error={errors.accessNotes?.message} className="sm:col-span-2">
        <input id="accessNotes" {...register('accessNotes')} className={INPUT_CLASS} />
      </Field>
      <Field id="removalBy" label="Must be removed by" error={errors.removalBy?.message}>
        <input id="removalBy" type="date" {...register('removalBy')} className={`${INPUT_CLASS} figures`} />
      </Field>
      <div className="sm:col-span-2">
        <FormMessage message={message} />
        <div className="flex gap-3">
          <Button type="submit" disabled={isSubmitting}>{isSubmitting ? 'Saving…' : 'Save moving sheet'}</Button>
          <Button type="button" variant="secondary" onClick={() => router.back()}>Cancel</Button>
        </div>
      </div>
    </form>
  );
}
