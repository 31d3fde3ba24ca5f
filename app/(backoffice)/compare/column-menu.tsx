'use client';

import type { VisibilityState } from '@tanstack/react-table';
import { COMPARISON_COLUMNS, type ColumnMeta } from './comparison-columns';

const GROUPS: ReadonlyArray<[ColumnMeta['group'], string]> = [
  ['machine', 'Machine'],
  ['grades', 'Grades'],
  ['money', 'Price and value'],
];

/** Which columns show; kept in this browser, since it is a reading preference rather than a view to share. */
export function ColumnMenu({ visibility, onChange }: { visibility: VisibilityState; onChange: (next: VisibilityState) => void }) {
  const hidden = Object.values(visibility).filter((v) => v === false).length;
  return (
    <details className="relative hidden md:block">
      <summary className="inline-flex min-h-touch cursor-pointer list-none items-center gap-2 rounded-lg border border-line-strong bg-paper-raised px-4 font-medium hover:bg-paper-sunken">
        Columns{hidden ? <span className="figures text-sm text-ink-soft">({hidden} hidden)</span> : null}
      </summary>
      <div className="absolute right-0 z-30 mt-2 w-72 rounded-card border border-line bg-paper-raised p-4 shadow-lg">
        {GROUPS.map(([group, title]) => (
          <fieldset key={group} className="mb-3">
            <legend className="text-sm font-semibold text-ink-soft">{title}</legend>
            {COMPARISON_COLUMNS.filter((c) => (c.meta as ColumnMeta).group === group && c.id !== 'machine').map((c) => (
              <label key={c.id} className="flex min-h-9 items-center gap-2">
                <input
                  type="checkbox"
                  className="h-4 w-4 accent-copper"
                  checked={visibility[c.id!] !== false}
                  onChange={(event) => onChange({ ...visibility, [c.id!]: event.target.checked })}
                />
                {(c.meta as ColumnMeta).label}
              </label>
            ))}
          </fieldset>
        ))}
        <button type="button" onClick={() => onChange({})} className="min-h-touch text-sm font-medium text-copper hover:underline">
          Show all columns
        </button>
      </div>
    </details>
  );
}
