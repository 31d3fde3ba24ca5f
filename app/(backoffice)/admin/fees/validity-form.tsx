'use client';

import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Field, FormMessage, INPUT_CLASS } from '@/components/forms/field';
import { setReportValidityAction } from './validity-actions';

export function ValidityForm({ validityDays }: { validityDays: number }) {
  const [value, setValue] = useState(String(validityDays));
  const [error, setError] = useState<string | undefined>();
  const [message, setMessage] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  const [pending, setPending] = useState(false);
  return (
    <form
      noValidate
      className="flex flex-wrap items-end gap-3"
      onSubmit={async (event) => {
        event.preventDefault();
        setPending(true);
        setSaved(false);
        const result = await setReportValidityAction({ validityDays: value });
        setPending(false);
        if (!result.ok) {
          setError(result.fieldErrors?.validityDays?.[0]);
          return setMessage(result.fieldErrors?.validityDays ? null : result.message);
        }
        setError(undefined);
        setMessage(null);
        setSaved(true);
      }}
    >
      <Field id="validityDays" label="Reports stay current for (days)" error={error}>
        <input id="validityDays" inputMode="numeric" value={value} onChange={(e) => setValue(e.target.value)} aria-invalid={Boolean(error)} className={`${INPUT_CLASS} figures w-40`} />
      </Field>
      <Button type="submit" disabled={pending}>{pending ? 'Saving…' : 'Save'}</Button>
      <FormMessage message={message} />
      {saved ? <p role="status" className="w-full text-band-true">Saved. Reports older than this show a stale banner.</p> : null}
    </form>
  );
}
