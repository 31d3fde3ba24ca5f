'use client';

import { AREA_LABELS } from '@/lib/scoring/grading/not-inspected';
import { NOT_INSPECTED_AREAS } from '@/lib/scoring/survey/checklist-items';
import { ChoiceField, TextField } from './fields/bound-fields';
import type { SurveyForm } from './fields/survey-form';

type Entry = { area?: string; reason?: string };

/**
 * What was not inspected, and why: each area set aside with the reason, printed in the report
 * beside the grade so a buyer sees the gaps (no power on site, no test bar, seller declined).
 */
export function NotInspectedFields({ form }: { form: SurveyForm }) {
  const entries = (form.get(['notInspected']) as Entry[] | undefined) ?? [];
  const used = new Set(entries.map((e) => e.area));
  const free = NOT_INSPECTED_AREAS.filter((area) => !used.has(area));
  return (
    <section aria-label="Not inspected" className="flex flex-col gap-4 rounded-card border border-line bg-paper-raised p-4" data-testid="not-inspected">
      <div>
        <h3 className="text-lg font-semibold">Not inspected, and why</h3>
        <p className="text-sm text-ink-soft">Each area you could not inspect, with the reason. The report lists them beside the grade.</p>
      </div>
      {entries.map((entry, index) => (
        <div key={`${entry.area ?? 'new'}-${index}`} className="flex flex-col gap-3 rounded-lg border border-line p-3">
          <ChoiceField
            form={form}
            path={['notInspected', index, 'area']}
            label="Area"
            columns={2}
            choices={NOT_INSPECTED_AREAS.filter((area) => area === entry.area || !used.has(area)).map((area) => ({ value: area, label: AREA_LABELS[area] ?? area }))}
          />
          <TextField form={form} path={['notInspected', index, 'reason']} label="Why not" maxLength={300} />
          <button type="button" onClick={() => form.set(['notInspected', index], undefined)} className="min-h-touch self-start rounded-lg px-3 font-medium text-ink-soft hover:bg-paper-sunken">
            Remove
          </button>
        </div>
      ))}
      {free.length ? (
        <button
          type="button"
          // A new entry starts on the first free area, so it is never an empty group the survey would drop.
          onClick={() => form.set(['notInspected', entries.length], { area: free[0] })}
          className="min-h-touch self-start rounded-lg border border-line-strong bg-paper-raised px-4 font-medium hover:bg-paper-sunken"
        >
          + Add an area not inspected
        </button>
      ) : null}
    </section>
  );
}
