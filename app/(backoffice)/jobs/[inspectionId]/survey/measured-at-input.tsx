'use client';

import { useId } from 'react';

/** "08:45" from an ISO time, in UTC as the power-run log keeps it; "" when none. */
function timeOf(iso: string | undefined): string {
  return iso && iso.length >= 16 ? iso.slice(11, 16) : '';
}

/**
 * The inspector's own time for a section's readings (UTC, the day of the power run): with the
 * power-run log's start it decides cold or warm, whenever the readings are typed.
 */
export function MeasuredAtInput({ value, day, onChange }: { value: string | undefined; day: string; onChange: (value: string | undefined) => void }) {
  const id = useId();
  const set = (hhmm: string) => onChange(/^\d{2}:\d{2}$/.test(hhmm) ? `${day}T${hhmm}:00.000Z` : undefined);
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="font-medium">
        Measured at (UTC)
      </label>
      <p className="-mt-0.5 text-sm text-ink-soft">The time you took these readings, not when you type them.</p>
      <div className="flex gap-2">
        <input id={id} type="time" value={timeOf(value)} onChange={(e) => set(e.target.value)} className="min-h-[52px] rounded-lg border border-line-strong bg-paper-raised px-3 py-2 text-lg" />
        <button type="button" onClick={() => set(new Date().toISOString().slice(11, 16))} className="min-h-[44px] rounded-lg border border-line-strong px-4 font-medium">
          Now
        </button>
      </div>
    </div>
  );
}
