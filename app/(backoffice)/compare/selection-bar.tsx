'use client';

import Link from 'next/link';
import { useQueryClient } from '@tanstack/react-query';
import { useState, useTransition, type FormEvent } from 'react';
import type { ComparisonRow } from '@/lib/comparison/comparison-row';
import { addToShortlistAction, createShortlistAction } from './actions';
import type { ShortlistSummary } from './shortlist-picker';

const MIN_COMPARE = 2;
const MAX_COMPARE = 4;

/** What is ticked in the table: compare 2–4 side by side, or keep them on a shortlist. */
export function SelectionBar({
  selected,
  shortlists,
  onRemove,
  onClear,
}: {
  selected: ComparisonRow[];
  shortlists: ShortlistSummary[];
  onRemove: (row: ComparisonRow) => void;
  onClear: () => void;
}) {
  const queryClient = useQueryClient();
  const [pending, start] = useTransition();
  const [feedback, setFeedback] = useState<{ ok: boolean; text: string } | null>(null);
  if (selected.length === 0) {
    return <p className="text-sm text-ink-soft">Tick machines to compare two to four side by side or to keep them on a shortlist.</p>;
  }
  const canCompare = selected.length >= MIN_COMPARE && selected.length <= MAX_COMPARE;
  const machineIds = selected.map((r) => r.machineId);

  const save = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const data = new FormData(event.currentTarget);
    const target = String(data.get('target') ?? 'new');
    const name = String(data.get('name') ?? '');
    start(async () => {
      const result =
        target === 'new' ? await createShortlistAction({ name, machineIds }) : await addToShortlistAction({ shortlistId: Number(target), machineIds });
      if (result.ok) {
        setFeedback({ ok: true, text: target === 'new' ? `Saved “${name.trim()}” with ${machineIds.length} machines.` : `Added ${machineIds.length} machines.` });
        await queryClient.invalidateQueries({ queryKey: ['compare'] });
      } else {
        setFeedback({ ok: false, text: Object.values(result.fieldErrors ?? {}).flat()[0] ?? result.message });
      }
    });
  };

  return (
    <div className="rounded-card border border-copper/40 bg-copper-light/60 p-3" aria-label="Selected machines">
      <div className="flex flex-wrap items-center gap-2">
        <span className="figures font-semibold">{selected.length} selected</span>
        {selected.map((r) => (
          <span key={r.reportId} className="inline-flex items-center gap-1 rounded-full border border-line-strong bg-paper-raised py-0.5 pl-3 pr-1 text-sm">
            {r.maker} {r.model}
            <button type="button" onClick={() => onRemove(r)} aria-label={`Unselect ${r.maker} ${r.model}`} className="min-h-8 min-w-8 rounded-full text-ink-soft hover:bg-paper-sunken">
              ×
            </button>
          </span>
        ))}
        <button type="button" onClick={onClear} className="min-h-touch px-2 text-sm font-medium text-ink-soft hover:text-ink">
          Clear
        </button>
      </div>
      <div className="mt-2 flex flex-wrap items-center gap-3">
        {canCompare ? (
          <Link
            href={`/compare/side-by-side?reports=${selected.map((r) => r.reportId).join(',')}`}
            className="inline-flex min-h-touch items-center rounded-lg border border-copper bg-copper px-4 font-medium text-white hover:bg-copper-dark"
          >
            Compare {selected.length} side by side
          </Link>
        ) : (
          <span className="text-sm text-ink-soft">
            {selected.length < MIN_COMPARE ? 'Tick one more to compare side by side.' : `Side by side takes at most ${MAX_COMPARE}; untick ${selected.length - MAX_COMPARE}.`}
          </span>
        )}
        <form onSubmit={save} className="flex flex-wrap items-center gap-2">
          <label className="sr-only" htmlFor="shortlist-target">
            Shortlist
          </label>
          <select id="shortlist-target" name="target" className="min-h-touch rounded-lg border border-line-strong bg-paper-raised px-2" defaultValue="new">
            <option value="new">New shortlist named…</option>
            {shortlists.map((s) => (
              <option key={s.id} value={s.id}>
                Add to “{s.name}”
              </option>
            ))}
          </select>
          <input name="name" aria-label="New shortlist name" placeholder="e.g. Spring auction" maxLength={80} className="min-h-touch w-44 rounded-lg border border-line-strong bg-paper-raised px-3" />
          <button type="submit" disabled={pending} className="min-h-touch rounded-lg border border-line-strong bg-paper-raised px-4 font-medium hover:bg-paper-sunken disabled:opacity-60">
            {pending ? 'Saving…' : 'Save to shortlist'}
          </button>
        </form>
        {feedback ? (
          <span role={feedback.ok ? 'status' : 'alert'} className={`text-sm ${feedback.ok ? 'text-band-true' : 'text-band-rebuild'}`}>
            {feedback.ok ? '✓ ' : ''}
            {feedback.text}
          </span>
        ) : null}
      </div>
    </div>
  );
}
