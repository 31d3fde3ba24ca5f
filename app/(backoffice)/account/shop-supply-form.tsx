'use client';

import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Button } from '@/components/ui/button';
import { applyFieldErrors } from '@/components/forms/apply-field-errors';
import { Field, FormMessage, INPUT_CLASS } from '@/components/forms/field';
import { shopSupplySchema, type ShopSupplyForm as ShopSupplyValues, type ShopSupplyFormInput } from '@/lib/validation/shop-supply';
import { saveShopSupplyAction } from './shop-supply-actions';

export function ShopSupplyForm({ defaults }: { defaults: Partial<ShopSupplyFormInput> }) {
  const [message, setMessage] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  const { register, handleSubmit, setError, formState: { errors, isSubmitting } } = useForm<ShopSupplyFormInput, unknown, ShopSupplyValues>({
    resolver: zodResolver(shopSupplySchema),
    defaultValues: { supplyPhases: 3, ...defaults },
  });
  const onSubmit = handleSubmit(async (values) => {
    setMessage(null);
    setSaved(false);
    const result = await saveShopSupplyAction(values);
    if (!result.ok) return setMessage(applyFieldErrors(result, setError, ['supplyVoltage', 'supplyPhases']));
    setSaved(true);
  });
  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-4 sm:grid-cols-2">
      <Field id="shopVoltage" label="Voltage (V)" error={errors.supplyVoltage?.message}>
        <input id="shopVoltage" inputMode="numeric" {...register('supplyVoltage')} aria-invalid={Boolean(errors.supplyVoltage)} className={`${INPUT_CLASS} figures`} />
      </Field>
      <Field id="shopPhases" label="Phases" error={errors.supplyPhases?.message}>
        <select id="shopPhases" {...register('supplyPhases')} className={INPUT_CLASS}>
          <option value="1">Single phase</option>
          <option value="3">Three phase</option>
        </select>
      </Field>
      <div className="sm:col-span-2">
        <FormMessage message={message} />
        {saved ? <p role="status" className="mb-2 text-band-true">Saved. Reports now say whether each machine runs on this supply.</p> : null}
        <Button type="submit" disabled={isSubmitting}>{isSubmitting ? 'Saving…' : 'Save supply'}</Button>
      </div>
    </form>
  );
}
