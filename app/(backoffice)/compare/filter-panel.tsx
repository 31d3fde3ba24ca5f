'use client';

import { useId, type FormEvent } from 'react';
import { GradeGauge } from '@/components/ui/grade-chip';
import { LATHE_KIND_LABELS } from '@/lib/comparison/comparison-row';
import { CONDITION_GRADES } from '@/lib/scoring/grading/condition-scale';
import { SUBSYSTEM_TABLE, SUBSYSTEMS } from '@/lib/scoring/subsystems';
import { SUBSYSTEM_KEYS } from '@/lib/validation/comparison-query';
import { listParam, toggleInList, type ParamPatch } from './use-comparison-url';

/** The typed filters: [label, from key, to key, unit, input mode]. Applied together with "Apply". */
const RANGES: ReadonlyArray<{ label: string; from: string; to: string; unit: string; step?: string; type?: 'date' }> = [
  { label: 'Swing over bed', from: 'swingMin', to: 'swingMax', unit: 'mm' },
  { label: 'Between centres', from: 'centresMin', to: 'centresMax', unit: 'mm' },
  { label: 'Year built', from: 'yearMin', to: 'yearMax', unit: 'year' },
  { label: 'Confidence', from: 'confidenceMin', to: 'confidenceMax', unit: '%' },
  { label: 'Asking price', from: 'priceMin', to: 'priceMax', unit: '€' },
  { label: 'Fair market value', from: 'valueMin', to: 'valueMax', unit: '€' },
  { label: 'Price ÷ value', from: 'ratioMin', to: 'ratioMax', unit: '×', step: '0.01' },
  { label: 'Repair estimate', from: 'repairMin', to: 'repairMax', unit: '€' },
  { label: 'Landed cost', from: 'landedMin', to: 'landedMax', unit: '€' },
  { label: 'Inclusions value', from: 'inclusionsMin', to: 'inclusionsMax', unit: '€' },
  { label: 'Days listed', from: 'daysListedMin', to: 'daysListedMax', unit: 'days' },
  { label: 'Report age', from: 'reportAgeMin', to: 'reportAgeMax', unit: 'days since inspection' },
  { label: 'Report released', from: 'releasedFrom', to: 'releasedTo', unit: '', type: 'date' },
];
export const TYPED_FILTER_KEYS = ['q', ...RANGES.flatMap((r) => [r.from, r.to])];

const chip = 'inline-flex min-h-touch cursor-pointer items-center gap-2 rounded-lg border px-3 text-sm has-[:checked]:border-copper has-[:checked]:bg-copper-light';

function CheckboxGroup({
  legend,
  options,
  value,
  onToggle,
}: {
  legend: string;
  options: ReadonlyArray<{ value: string; label: string; gauge?: boolean }>;
  value: string | undefined;
  onToggle: (item: string) => void;
}) {
  const chosen = listParam(value);
  return (
    <fieldset>
      <legend className="mb-1 text-sm font-semibold">{legend}</legend>
      <div className="flex flex-wrap gap-1.5">
        {options.map((o) => (
          <label key={o.value} className={`${chip} border-line-strong bg-paper-raised`}>
            <input type="checkbox" className="h-4 w-4 accent-copper" checked={chosen.includes(o.value)} onChange={() => onToggle(o.value)} />
            {o.gauge ? <GradeGauge grade={o.value as (typeof CONDITION_GRADES)[number]} /> : null}
            {o.label}
          </label>
        ))}
      </div>
    </fieldset>
  );
}

/** The has-deal-breakers toggle: [URL value, words]; '' leaves it off. */
const DEAL_BREAKER_CHOICES: ReadonlyArray<[string, string]> = [
  ['', 'Either'],
  ['none', 'None recorded'],
  ['any', 'At least one'],
];

const GRADE_OPTIONS = CONDITION_GRADES.map((g) => ({ value: g, label: g, gauge: true }));

export function FilterPanel({
  params,
  regions,
  fieldErrors,
  onChange,
  onClear,
}: {
  params: Record<string, string>;
  regions: string[];
  fieldErrors: Record<string, string[]>;
  onChange: (patch: ParamPatch) => void;
  onClear: () => void;
}) {
  const id = useId();
  const toggle = (key: string) => (item: string) => onChange({ [key]: toggleInList(params[key], item) });
  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const data = new FormData(event.currentTarget);
    onChange(Object.fromEntries(TYPED_FILTER_KEYS.map((key) => [key, String(data.get(key) ?? '').trim() || null])));
  };
  // Inputs are keyed by the URL's value, so "Clear" and the back button reset what they show.
  const field = (key: string) => ({ name: key, defaultValue: params[key] ?? '', 'aria-invalid': fieldErrors[key] ? true : undefined });
  const keyOf = (key: string) => `${key}=${params[key] ?? ''}`;
  const input = 'figures min-h-touch w-full min-w-0 rounded-lg border border-line-strong bg-paper-raised px-2 aria-[invalid=true]:border-band-rebuild';
  const subsystemFilters = SUBSYSTEMS.filter((s) => params[`grade.${SUBSYSTEM_KEYS[s]}`]).length;

  return (
    <div className="space-y-5">
      <form onSubmit={submit} className="space-y-4" aria-label="Search and ranges">
        <label className="block">
          <span className="mb-1 block text-sm font-semibold">Maker or model</span>
          <input key={keyOf('q')} {...field('q')} type="search" placeholder="e.g. Corvane CL-330" className={`${input} px-3`} />
        </label>
        <div className="grid gap-3">
          {RANGES.map((range) => (
            <fieldset key={range.from}>
              <legend className="mb-1 text-sm font-semibold">
                {range.label}
                {range.unit && range.unit !== 'year' ? <span className="font-normal text-ink-soft"> ({range.unit})</span> : null}
              </legend>
              <div className="grid grid-cols-[minmax(0,1fr)_auto_minmax(0,1fr)] items-center gap-2">
                <input key={keyOf(range.from)} {...field(range.from)} type={range.type ?? 'number'} step={range.step} inputMode={range.type ? undefined : 'decimal'} aria-label={`${range.label} from`} placeholder="from" className={input} />
                <span aria-hidden="true" className="text-ink-soft">
                  –
                </span>
                <input key={keyOf(range.to)} {...field(range.to)} type={range.type ?? 'number'} step={range.step} inputMode={range.type ? undefined : 'decimal'} aria-label={`${range.label} to`} placeholder="to" className={input} />
              </div>
              {[range.from, range.to].flatMap((key) => fieldErrors[key] ?? []).map((message) => (
                <p key={message} className="mt-1 text-sm text-band-rebuild">
                  {message}
                </p>
              ))}
            </fieldset>
          ))}
        </div>
        <p id={`${id}-hint`} className="text-xs text-ink-soft">
          Value, price ÷ value, repairs, landed cost and inclusions filter the reports you have bought.
        </p>
        <button type="submit" className="inline-flex min-h-touch w-full items-center justify-center rounded-lg border border-copper bg-copper px-4 font-medium text-white hover:bg-copper-dark">
          Apply filters
        </button>
      </form>

      <fieldset>
        <legend className="mb-1 text-sm font-semibold">Deal-breakers</legend>
        <div className="flex flex-wrap gap-1.5">
          {DEAL_BREAKER_CHOICES.map(([value, label]) => (
            <label key={label} className={`${chip} border-line-strong bg-paper-raised`}>
              <input
                type="radio"
                name={`${id}-deal-breakers`}
                className="h-4 w-4 accent-copper"
                checked={(params.dealBreakers ?? '') === value}
                onChange={() => onChange({ dealBreakers: value || null })}
              />
              {label}
            </label>
          ))}
        </div>
        {(fieldErrors.dealBreakers ?? []).map((message) => (
          <p key={message} className="mt-1 text-sm text-band-rebuild">
            {message}
          </p>
        ))}
      </fieldset>

      <CheckboxGroup legend="Overall condition" options={GRADE_OPTIONS} value={params.condition} onToggle={toggle('condition')} />
      <CheckboxGroup legend="Type" options={Object.entries(LATHE_KIND_LABELS).map(([value, label]) => ({ value, label }))} value={params.kind} onToggle={toggle('kind')} />
      {regions.length ? <CheckboxGroup legend="Region" options={regions.map((r) => ({ value: r, label: r }))} value={params.region} onToggle={toggle('region')} /> : null}

      <details className="rounded-lg border border-line bg-paper-raised p-3" open={subsystemFilters > 0}>
        <summary className="min-h-touch cursor-pointer content-center font-semibold">
          Subsystem grades{subsystemFilters ? <span className="font-normal text-ink-soft"> · {subsystemFilters} set</span> : null}
        </summary>
        <div className="mt-3 space-y-4">
          {SUBSYSTEMS.map((s) => {
            const key = `grade.${SUBSYSTEM_KEYS[s]}`;
            return <CheckboxGroup key={s} legend={SUBSYSTEM_TABLE[s].label} options={GRADE_OPTIONS} value={params[key]} onToggle={toggle(key)} />;
          })}
        </div>
      </details>

      <button type="button" onClick={onClear} className="inline-flex min-h-touch items-center rounded-lg px-3 font-medium text-ink-soft hover:bg-paper-sunken hover:text-ink">
        Clear all filters
      </button>
    </div>
  );
}
