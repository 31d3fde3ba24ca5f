'use client';

import { useRouter } from 'next/navigation';
import { useState, useTransition, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import type { CsvRejection } from '@/lib/market/parse-comparable-sales-csv';
import { importComparableSalesAction } from './actions';

type Outcome = { imported: number; rejected: CsvRejection[]; problems: string[] } | { error: string; lines: Array<[string, string[]]> };

/** Imports a spreadsheet of comparable sales and reports, line by line, what was left out and why. */
export function CsvImportForm({ templateHeaders }: { templateHeaders: string[] }) {
  const router = useRouter();
  const [pending, start] = useTransition();
  const [outcome, setOutcome] = useState<Outcome | null>(null);

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const file = new FormData(event.currentTarget).get('file');
    if (!(file instanceof File) || file.size === 0) {
      setOutcome({ error: 'Choose a CSV file first.', lines: [] });
      return;
    }
    start(async () => {
      const result = await importComparableSalesAction({ csv: await file.text() });
      if (result.ok) {
        setOutcome(result.data);
        router.refresh();
      } else {
        const lines = Object.entries(result.fieldErrors ?? {}).filter(([key]) => key.startsWith('line '));
        setOutcome({ error: result.message, lines });
      }
    });
  };

  const rejectedLines: Array<[string, string[]]> =
    outcome && 'imported' in outcome ? outcome.rejected.map((r) => [`line ${r.line}`, r.errors]) : outcome ? outcome.lines : [];

  return (
    <div className="space-y-4">
      <form onSubmit={submit} className="flex flex-wrap items-end gap-3" aria-label="Import comparable sales">
        <label className="block">
          <span className="font-medium">CSV file</span>
          <input name="file" type="file" accept=".csv,text/csv" className="mt-1 block min-h-touch text-sm file:mr-3 file:min-h-touch file:rounded-lg file:border file:border-line-strong file:bg-paper-raised file:px-4 file:font-medium" />
        </label>
        <Button type="submit" variant="secondary" disabled={pending}>
          {pending ? 'Importing…' : 'Import'}
        </Button>
      </form>
      <p className="text-sm text-ink-soft">
        Columns (first row): <code className="figures break-words rounded bg-paper-sunken px-1">{templateHeaders.join(',')}</code>. Price in whole units; dates as
        YYYY-MM-DD; sale kind one of dealer_retail, private, auction, liquidation. Good rows are imported, the others are listed below.
      </p>
      {outcome ? (
        <div role="status" className="rounded-card border border-line bg-paper p-4">
          {'imported' in outcome ? (
            <p className="font-semibold text-band-true">
              ✓ Imported {outcome.imported} sale{outcome.imported === 1 ? '' : 's'}
              {outcome.rejected.length ? <span className="text-band-worn"> · ▲ {outcome.rejected.length} rejected</span> : null}
            </p>
          ) : (
            <p className="font-semibold text-band-rebuild">✕ {outcome.error}</p>
          )}
          {'problems' in outcome && outcome.problems.length ? <p className="mt-1 text-sm text-ink-soft">{outcome.problems.join(' · ')}</p> : null}
          {rejectedLines.length ? (
            <table className="mt-3 w-full text-left text-sm">
              <caption className="sr-only">Rejected rows</caption>
              <thead className="text-ink-soft">
                <tr>
                  <th scope="col" className="py-1 pr-3 font-medium">
                    Row
                  </th>
                  <th scope="col" className="py-1 font-medium">
                    Why it was left out
                  </th>
                </tr>
              </thead>
              <tbody>
                {rejectedLines.map(([line, errors]) => (
                  <tr key={line} className="border-t border-line" data-rejected-line={line}>
                    <td className="figures whitespace-nowrap py-1 pr-3 align-top">{line}</td>
                    <td className="py-1">{errors.join('; ')}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          ) : null}
        </div>
      ) : null}
    </div>
  );
}
