'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Button } from '@/components/ui/button';
import { applyFieldErrors } from '@/components/forms/apply-field-errors';
import { Field, FormMessage, INPUT_CLASS } from '@/components/forms/field';
import { SALE_TERMS, SALE_TERM_LABELS, USAGE_KINDS, USAGE_LABELS } from '@/lib/decision/seller-disclosure';
import { sellerDisclosureSchema, type SellerDisclosureForm, type SellerDisclosureFormInput } from '@/lib/validation/seller-disclosure';
import { saveDisclosureAction } from './actions';

const FIELDS = [
  'hasKnownFaults', 'knownFaults', 'hasRepairs', 'repairsAndRebuilds', 'hasCrashes', 'crashesOrDrops',
  'usage', 'usageNotes', 'supplyVoltage', 'supplyPhases', 'included', 'saleTerm',
] as const;

/** What each sale term promises, in the trade's usual sense. */
const SALE_TERM_HINTS: Record<(typeof SALE_TERMS)[number], string> = {
  'as-is': 'Sold as it stands, with no claim about its working state',
  'tested-under-power': 'You have run it under power: spindle, feeds and brake',
  reconditioned: 'Worn parts replaced or adjusted, ways and spindle brought back into order',
  rebuilt: 'Taken down and rebuilt: ways reground or scraped, spindle bearings renewed',
};

type YesNo = { answer: 'hasKnownFaults' | 'hasRepairs' | 'hasCrashes'; text: 'knownFaults' | 'repairsAndRebuilds' | 'crashesOrDrops'; question: string; no: string; describe: string };
const YES_NO: YesNo[] = [
  { answer: 'hasKnownFaults', text: 'knownFaults', question: 'Do you know of any faults?', no: 'No known faults', describe: 'Describe the faults' },
  { answer: 'hasRepairs', text: 'repairsAndRebuilds', question: 'Has it been repaired or rebuilt?', no: 'None known', describe: 'What was done, by whom, when' },
  { answer: 'hasCrashes', text: 'crashesOrDrops', question: 'Has it been crashed or dropped?', no: 'None known', describe: 'What happened' },
];

export function DisclosureForm({ machineId, defaults }: { machineId: number; defaults?: Partial<SellerDisclosureFormInput> }) {
  const router = useRouter();
  const [message, setMessage] = useState<string | null>(null);
  const { register, handleSubmit, setError, watch, formState: { errors, isSubmitting } } = useForm<SellerDisclosureFormInput, unknown, SellerDisclosureForm>({
    resolver: zodResolver(sellerDisclosureSchema),
    defaultValues: { usage: 'not-known', ...defaults },
  });
  const err = (name: (typeof FIELDS)[number]) => errors[name]?.message as string | undefined;

  const onSubmit = handleSubmit(async (values) => {
    setMessage(null);
    const result = await saveDisclosureAction({ ...values, machineId });
    if (!result.ok) return setMessage(applyFieldErrors(result, setError, FIELDS));
    router.push(`/machines/${machineId}`);
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-8">
      {YES_NO.map((q) => (
        <fieldset key={q.answer} className="space-y-3">
          <legend className="text-lg font-semibold">{q.question}</legend>
          <div className="flex flex-wrap gap-4">
            <label className="flex min-h-touch items-center gap-2">
              <input type="radio" value="no" {...register(q.answer)} className="h-5 w-5 accent-copper" /> {q.no}
            </label>
            <label className="flex min-h-touch items-center gap-2">
              <input type="radio" value="yes" {...register(q.answer)} className="h-5 w-5 accent-copper" /> Yes
            </label>
          </div>
          {err(q.answer) ? <p className="text-sm font-medium text-band-rebuild">{err(q.answer)}</p> : null}
          {watch(q.answer) === 'yes' ? (
            <Field id={q.text} label={q.describe} error={err(q.text)}>
              <textarea id={q.text} rows={3} {...register(q.text)} aria-invalid={Boolean(errors[q.text])} className={`${INPUT_CLASS} py-2`} />
            </Field>
          ) : null}
        </fieldset>
      ))}

      <fieldset className="grid gap-5 sm:grid-cols-2">
        <legend className="mb-3 text-lg font-semibold">How it was used and its supply</legend>
        <Field id="usage" label="Use" error={err('usage')}>
          <select id="usage" {...register('usage')} className={INPUT_CLASS}>
            {USAGE_KINDS.map((u) => (
              <option key={u} value={u}>{USAGE_LABELS[u]}</option>
            ))}
          </select>
        </Field>
        <Field id="usageNotes" label="More about its use" hint="Shifts a day, typical work, years in use" error={err('usageNotes')}>
          <input id="usageNotes" {...register('usageNotes')} className={INPUT_CLASS} />
        </Field>
        <Field id="supplyVoltage" label="Power supply (V)" hint="As on the nameplate" error={err('supplyVoltage')}>
          <input id="supplyVoltage" inputMode="numeric" {...register('supplyVoltage')} aria-invalid={Boolean(errors.supplyVoltage)} className={`${INPUT_CLASS} figures`} />
        </Field>
        <Field id="supplyPhases" label="Phases" error={err('supplyPhases')}>
          <select id="supplyPhases" {...register('supplyPhases')} className={INPUT_CLASS}>
            <option value="">Not known</option>
            <option value="1">Single phase</option>
            <option value="3">Three phase</option>
          </select>
        </Field>
        <Field id="included" label="What is included" hint="Chucks, rests, tool post, collets, DRO, manuals" error={err('included')} className="sm:col-span-2">
          <textarea id="included" rows={3} {...register('included')} className={`${INPUT_CLASS} py-2`} />
        </Field>
      </fieldset>

      <fieldset className="space-y-3">
        <legend className="text-lg font-semibold">Terms of sale</legend>
        {SALE_TERMS.map((term) => (
          <label key={term} className="flex min-h-touch items-start gap-3">
            <input type="radio" value={term} {...register('saleTerm')} className="mt-1.5 h-5 w-5 accent-copper" />
            <span>
              <span className="font-medium">{SALE_TERM_LABELS[term]}</span>
              <span className="block text-sm text-ink-soft">{SALE_TERM_HINTS[term]}</span>
            </span>
          </label>
        ))}
        {err('saleTerm') ? <p className="text-sm font-medium text-band-rebuild">{err('saleTerm')}</p> : null}
      </fieldset>

      <FormMessage message={message} />
      <div className="flex gap-3">
        <Button type="submit" disabled={isSubmitting}>{isSubmitting ? 'Saving…' : 'Save disclosure'}</Button>
        <Button type="button" variant="secondary" onClick={() => router.back()}>Cancel</Button>
      </div>
    </form>
  );
}
