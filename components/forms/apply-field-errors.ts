import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';

type Refusal = { ok: false; message: string; fieldErrors?: Record<string, string[]> };

/**
 * Shows the server's per-field answers next to the fields; returns the message to show above the
 * form when the server named no field (or a field this form does not have).
 */
export function applyFieldErrors<T extends FieldValues>(result: Refusal, setError: UseFormSetError<T>, fields: readonly string[]): string | null {
  let unplaced = false;
  for (const [field, messages] of Object.entries(result.fieldErrors ?? {})) {
    if (fields.includes(field)) setError(field as Path<T>, { type: 'server', message: messages[0] });
    else unplaced = true;
  }
  return !result.fieldErrors || unplaced ? result.message : null;
}
