'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { applyFieldErrors } from '@/components/forms/apply-field-errors';
import { Field, INPUT_CLASS } from '@/components/forms/field';
import { Button } from '@/components/ui/button';
import { CONDITION_GRADES } from '@/lib/scoring/grading/condition-scale';
import { comparableSaleSchema, SALE_KIND_LABELS } from '@/lib/validation/comparable-sale';
import { recordComparableSaleAction } from './actions';

type FormIn = z.input<typeof comparableSaleSchema>;
type FormOut = z.output<typeof comparableSaleSchema>;

const TEXT_FIELDS: Array<{ name: keyof FormIn; label: string; hint?: string; numeric?: boolean; type?: string; wide?: boolean }> = [
  { name: 'description', label: 'Machine sold', hint: 'Maker, model, year — as the sale listed it', wide: true },
  { name: 'swingMm', label: 'Swing over bed (mm)', numeric: true },
  { name: 'betweenCentresMm', label: 'Between centres (mm)', numeric: true },
  { name: 'yearBuilt', label: 'Year built', numeric: true },
  { name: 'price', label: 'Price (whole units)', numeric: true },
  { name: 'currency', label: 'Currency', hint: 'Three letters, e.g. EUR' },
  { name: 'soldOn', label: 'Date sold', type: 'date' },
  { name: 'region', label: 'Region' },
  { name: 'source', label: 'Source', hint: 'Where the sale is documented' },
];

/** One comparable sale typed in by a coordinator. */
export function ComparableSaleForm() {
  const router = useRouter();
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting },
  } = useForm<FormIn, unknown, FormOut>({ resolver: zodResolver(comparableSaleSchema), defaultValues: { currency: 'EUR', saleKind: 'dealer_retail' } });

  const onSubmit = handleSubmit(async (values) => {
    setMessage(null);
    const result = await recordComparableSaleAction(values);
    if (!result.ok) {
      setMessage({ ok: false, text: applyFieldErrors(result, setError, Object.keys(comparableSaleSchema.shape)) ?? 'Some fields need attention.' });
      return;
    }
    reset({ currency: values.currency, saleKind: values.saleKind });
    setMessage({ ok: true, text: `Recorded “${values.description}”. It counts for reports scored from now on.` });
    router.refresh();
  });
  const err = (name: keyof FormIn) => errors[name]?.message as string | undefined;

  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-4 sm:grid-cols-2" aria-label="Record a comparable sale">
      {TEXT_FIELDS.map((f) => (
        <Field key={f.name} id={`sale-${f.name}`} label={f.label} hint={f.hint} error={err(f.name)} className={f.wide ? 'sm:col-span-2' : ''}>
          <input
            id={`sale-${f.name}`}
            type={f.type ?? 'text'}
            inputMode={f.numeric ? 'numeric' : undefined}
            {...register(f.name)}
            aria-invalid={Boolean(errors[f.name])}
            className={`${INPUT_CLASS} ${f.numeric ? 'figures' : ''}`}
          />
        </Field>
      ))}
      <Field id="sale-saleKind" label="Kind of sale" error={err('saleKind')}>
        <select id="sale-saleKind" {...register('saleKind')} className={INPUT_CLASS}>
          {Object.entries(SALE_KIND_LABELS).map(([value, label]) => (
            <option key={value} value={value}>
              {label}
            </option>
          ))}
        </select>
      </Field>
      <Field id="sale-condition" label="Condition when sold" error={err('condition')}>
        <select id="sale-condition" {...register('condition')} className={INPUT_CLASS}>
          <option value="">Not known</option>
          {CONDITION_GRADES.map((g) => (
            <option key={g} value={g}>
              {g}
            </option>
          ))}
        </select>
      </Field>
      <div className="flex flex-wrap items-center gap-3 sm:col-span-2">
        <Button type="submit" disabled={isSubmitting}>
          {isSubmitting ? 'Saving…' : 'Record sale'}
        </Button>
        {message ? (
          <p role={message.ok ? 'status' : 'alert'} className={`text-sm ${message.ok ? 'text-band-true' : 'text-band-rebuild'}`}>
            {message.ok ? '✓ ' : ''}
            {message.text}
          </p>
        ) : null}
      </div>
    </form>
  );
}
