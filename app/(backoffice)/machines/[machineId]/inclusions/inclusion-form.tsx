'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Button } from '@/components/ui/button';
import { applyFieldErrors } from '@/components/forms/apply-field-errors';
import { Field, FormMessage, INPUT_CLASS } from '@/components/forms/field';
import { INCLUSION_CONDITIONS, INCLUSION_KINDS } from '@/db/schema/machine-inclusions';
import { INCLUSION_CONDITION_LABELS } from '@/lib/decision/inclusions-value';
import { inclusionSchema, type InclusionForm as InclusionValues, type InclusionFormInput } from '@/lib/validation/inclusion';
import { INCLUSION_KIND_LABELS } from './inclusion-kind-labels';
import { addInclusionAction } from './actions';

export function InclusionForm({ machineId }: { machineId: number }) {
  const router = useRouter();
  const [message, setMessage] = useState<string | null>(null);
  const { register, handleSubmit, setError, reset, formState: { errors, isSubmitting } } = useForm<InclusionFormInput, unknown, InclusionValues>({
    resolver: zodResolver(inclusionSchema),
    defaultValues: { kind: 'chuck', condition: 'good' },
  });
  const onSubmit = handleSubmit(async (values) => {
    setMessage(null);
    const result = await addInclusionAction({ ...values, machineId });
    if (!result.ok) return setMessage(applyFieldErrors(result, setError, Object.keys(inclusionSchema.shape)));
    reset({ kind: values.kind, condition: 'good', description: '', replacementCost: '' });
    router.refresh();
  });
  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-4 sm:grid-cols-2">
      <Field id="kind" label="What it is" error={errors.kind?.message}>
        <select id="kind" {...register('kind')} className={INPUT_CLASS}>
          {INCLUSION_KINDS.map((k) => (
            <option key={k} value={k}>{INCLUSION_KIND_LABELS[k]}</option>
          ))}
        </select>
      </Field>
      <Field id="description" label="Description" error={errors.description?.message}>
        <input id="description" {...register('description')} aria-invalid={Boolean(errors.description)} className={INPUT_CLASS} />
      </Field>
      <Field id="condition" label="Condition" error={errors.condition?.message}>
        <select id="condition" {...register('condition')} className={INPUT_CLASS}>
          {INCLUSION_CONDITIONS.map((c) => (
            <option key={c} value={c}>{INCLUSION_CONDITION_LABELS[c]}</option>
          ))}
        </select>
      </Field>
      <Field id="replacementCost" label="Replacement cost new (€)" hint="Whole euros; leave empty if not known" error={errors.replacementCost?.message}>
        <input id="replacementCost" inputMode="numeric" {...register('replacementCost')} aria-invalid={Boolean(errors.replacementCost)} className={`${INPUT_CLASS} figures`} />
      </Field>
      <div className="sm:col-span-2">
        <FormMessage message={message} />
        <Button type="submit" disabled={isSubmitting}>{isSubmitting ? 'Adding…' : 'Add item'}</Button>
      </div>
    </form>
  );
}
