'use client';

import { useState, useTransition } from 'react';
import { deleteShortlistAction } from './actions';

export type ShortlistSummary = { id: number; name: string; machines: number };

/** Shows one saved shortlist in the table (as a filter in the URL), or every machine. */
export function ShortlistPicker({ shortlists, value, onChange }: { shortlists: ShortlistSummary[]; value: string | undefined; onChange: (id: string | null) => void }) {
  const [pending, start] = useTransition();
  const [message, setMessage] = useState<string | null>(null);
  if (shortlists.length === 0 && !value) return null;
  const current = shortlists.find((s) => String(s.id) === value);
  return (
    <div className="flex items-center gap-2">
      <label className="flex items-center gap-2">
        <span className="text-sm text-ink-soft">Show</span>
        <select
          value={value ?? ''}
          onChange={(event) => onChange(event.target.value || null)}
          className="min-h-touch max-w-56 rounded-lg border border-line-strong bg-paper-raised px-2"
          aria-label="Shortlist shown"
        >
          <option value="">All machines</option>
          {shortlists.map((s) => (
            <option key={s.id} value={s.id}>
              {s.name} ({s.machines})
            </option>
          ))}
        </select>
      </label>
      {current ? (
        <button
          type="button"
          disabled={pending}
          onClick={() =>
            start(async () => {
              if (!window.confirm(`Delete the shortlist “${current.name}”? The machines stay in the table.`)) return;
              const result = await deleteShortlistAction({ shortlistId: current.id });
              if (result.ok) onChange(null);
              else setMessage(result.message);
            })
          }
          className="min-h-touch rounded-lg px-3 text-sm font-medium text-ink-soft hover:bg-paper-sunken hover:text-band-rebuild"
        >
          Delete shortlist
        </button>
      ) : null}
      {message ? (
        <span role="alert" className="text-sm text-band-rebuild">
          {message}
        </span>
      ) : null}
    </div>
  );
}
