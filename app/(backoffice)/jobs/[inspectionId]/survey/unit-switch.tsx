'use client';

import { SECTION_UNITS, type SectionUnit } from '@/lib/survey/section-unit';

/** The instrument's unit for this screen, chosen once; every length here is typed and stored in it. */
export function UnitSwitch({ unit, onChange }: { unit: SectionUnit; onChange: (unit: SectionUnit) => void }) {
  return (
    <div className="flex flex-wrap items-center justify-between gap-2 rounded-card border border-line bg-paper-raised px-4 py-3">
      <p id="unit-switch-label" className="font-medium">
        Instrument reads in
      </p>
      <div role="radiogroup" aria-labelledby="unit-switch-label" className="grid grid-cols-2 overflow-hidden rounded-lg border border-line-strong">
        {SECTION_UNITS.map((option) => (
          <button
            key={option.unit}
            type="button"
            role="radio"
            aria-checked={unit === option.unit}
            onClick={() => onChange(option.unit)}
            className={`min-h-touch min-w-[6.5rem] px-3 font-semibold ${unit === option.unit ? 'bg-ink text-paper' : 'bg-paper-raised text-ink hover:bg-paper-sunken'}`}
          >
            {option.label} <span className="font-normal">({option.hint})</span>
          </button>
        ))}
      </div>
    </div>
  );
}
