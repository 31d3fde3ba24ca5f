'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { Button } from '@/components/ui/button';
import { applyFieldErrors } from '@/components/forms/apply-field-errors';
import { Field, FormMessage, INPUT_CLASS } from '@/components/forms/field';
import { machineFormSchema } from '@/lib/validation/machine';
import { createMachineAction, updateMachineAction } from './actions';

type FormIn = z.input<typeof machineFormSchema>;
type FormOut = z.output<typeof machineFormSchema>;

const NUMBER_FIELDS: Array<{ name: keyof FormIn; label: string; unit: string; hint?: string; required?: boolean }> = [
  { name: 'swingMm', label: 'Swing over bed', unit: 'mm', hint: 'Twice the centre height above the bed', required: true },
  { name: 'betweenCentresMm', label: 'Distance between centres', unit: 'mm', required: true },
  { name: 'spindleBoreMm', label: 'Spindle bore', unit: 'mm' },
  { name: 'yearBuilt', label: 'Year built', unit: '', hint: 'From the nameplate or the maker’s records' },
  { name: 'motorKw', label: 'Main motor', unit: 'kW' },
  { name: 'supplyVoltage', label: 'Supply voltage', unit: 'V' },
];

export function MachineForm({ machineId, defaults }: { machineId?: number; defaults?: Partial<FormIn> }) {
  const router = useRouter();
  const [message, setMessage] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<FormIn, unknown, FormOut>({
    resolver: zodResolver(machineFormSchema),
    defaultValues: { latheKind: 'general_purpose', listingStatus: 'listed', ...defaults },
  });

  const onSubmit = handleSubmit(async (values) => {
    setMessage(null);
    const result = machineId ? await updateMachineAction({ ...values, machineId }) : await createMachineAction(values);
    if (!result.ok) {
      setMessage(applyFieldErrors(result, setError, Object.keys(machineFormSchema.shape)));
      return;
    }
    router.push(`/machines/${result.data.machineId}`);
    router.refresh();
  });

  const err = (name: keyof FormIn) => errors[name]?.message as string | undefined;
  const aria = (name: keyof FormIn) => ({ 'aria-invalid': Boolean(errors[name]), 'aria-describedby': errors[name] ? `${name}-error` : undefined });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-8">
      <fieldset className="grid gap-5 sm:grid-cols-2">
        <legend className="mb-3 text-lg font-semibold">Identity</legend>
        <Field id="maker" label="Maker" error={err('maker')}>
          <input id="maker" {...register('maker')} {...aria('maker')} className={INPUT_CLASS} autoComplete="off" />
        </Field>
        <Field id="model" label="Model" error={err('model')}>
          <input id="model" {...register('model')} {...aria('model')} className={INPUT_CLASS} autoComplete="off" />
        </Field>
        <Field id="serialNumber" label="Serial number" hint="As stamped on the nameplate or the bed" error={err('serialNumber')}>
          <input id="serialNumber" {...register('serialNumber')} className={INPUT_CLASS} autoComplete="off" />
        </Field>
        <Field id="latheKind" label="Type" error={err('latheKind')}>
          <select id="latheKind" {...register('latheKind')} className={INPUT_CLASS}>
            <option value="general_purpose">General-purpose centre lathe</option>
            <option value="toolroom">Toolroom lathe</option>
          </select>
        </Field>
      </fieldset>

      <fieldset className="grid gap-5 sm:grid-cols-2">
        <legend className="mb-3 text-lg font-semibold">Size and supply</legend>
        {NUMBER_FIELDS.map((f) => (
          <Field key={f.name} id={f.name} label={f.unit ? `${f.label} (${f.unit})` : f.label} hint={f.hint} error={err(f.name)}>
            <input id={f.name} inputMode="decimal" {...register(f.name)} {...aria(f.name)} className={`${INPUT_CLASS} figures`} />
          </Field>
        ))}
        <Field id="supplyPhases" label="Phases" error={err('supplyPhases')}>
          <select id="supplyPhases" {...register('supplyPhases')} className={INPUT_CLASS}>
            <option value="">Not known</option>
            <option value="1">Single phase</option>
            <option value="3">Three phase</option>
          </select>
        </Field>
      </fieldset>

      <fieldset className="grid gap-5 sm:grid-cols-2">
        <legend className="mb-3 text-lg font-semibold">Location and sale</legend>
        <Field id="town" label="Town" error={err('town')}>
          <input id="town" {...register('town')} {...aria('town')} className={INPUT_CLASS} />
        </Field>
        <Field id="region" label="Region" error={err('region')}>
          <input id="region" {...register('region')} {...aria('region')} className={INPUT_CLASS} />
        </Field>
        <Field id="askingPrice" label="Asking price (€)" hint="Whole euros; leave empty for offers" error={err('askingPrice')}>
          <input id="askingPrice" inputMode="numeric" {...register('askingPrice')} {...aria('askingPrice')} className={`${INPUT_CLASS} figures`} />
        </Field>
        <Field id="listingStatus" label="Listing" error={err('listingStatus')}>
          <select id="listingStatus" {...register('listingStatus')} className={INPUT_CLASS}>
            <option value="draft">Draft — only you see it</option>
            <option value="listed">Listed for sale</option>
            <option value="sold">Sold</option>
            <option value="withdrawn">Withdrawn</option>
          </select>
        </Field>
        <Field id="accessories" label="Accessories included" hint="Chucks, steadies, tool post, DRO, manuals…" error={err('accessories')} className="sm:col-span-2">
          <textarea id="accessories" rows={3} {...register('accessories')} className={`${INPUT_CLASS} py-2`} />
        </Field>
        <Field id="description" label="Description" error={err('description')} className="sm:col-span-2">
          <textarea id="description" rows={4} {...register('description')} className={`${INPUT_CLASS} py-2`} />
        </Field>
      </fieldset>

      <FormMessage message={message} />
      <div className="flex gap-3">
        <Button type="submit" disabled={isSubmitting}>
          {isSubmitting ? 'Saving…' : machineId ? 'Save changes' : 'Add machine'}
        </Button>
        <Button type="button" variant="secondary" onClick={() => router.back()}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
