import { SURVEY_SECTIONS } from '@/lib/survey/survey-sections';
import type { SectionThermalState } from '@/lib/survey/thermal-state';
import { ThermalStateMark } from '../../../reports/[id]/thermal-state-mark';

/**
 * The raw survey as the inspector entered it, section by section, so the reviewer can set each
 * graded result beside the reading it came from.
 */

// Section titles as the inspector saw them; the survey format's own members for the rest.
const SECTION_LABELS: Record<string, string> = {
  ...Object.fromEntries(SURVEY_SECTIONS.map((section) => [section.id, section.title])),
  machine: 'Identity',
  instruments: 'Instruments',
  notes: 'Notes',
};

function words(key: string) {
  return key.replace(/([A-Z])/g, ' $1').replace(/^./, (c) => c.toUpperCase());
}

function isQuantity(value: unknown): value is { value: number; unit: string } {
  return typeof value === 'object' && value !== null && 'value' in value && 'unit' in value && Object.keys(value).length === 2;
}

function flatten(value: unknown, path: string[] = []): Array<[string, string]> {
  if (isQuantity(value)) return [[path.map(words).join(' › '), `${value.value} ${value.unit}`]];
  if (Array.isArray(value)) {
    if (value.every((v) => typeof v === 'number')) return [[path.map(words).join(' › '), value.join('  ')]];
    return value.flatMap((item, i) => flatten(item, [...path, `#${i + 1}`]));
  }
  if (value && typeof value === 'object') return Object.entries(value).flatMap(([k, v]) => flatten(v, [...path, k]));
  return [[path.map(words).join(' › '), String(value)]];
}

export function SurveyReadings({ data, thermalStates = [] }: { data: Record<string, unknown>; thermalStates?: readonly SectionThermalState[] }) {
  const sections = Object.entries(data).filter(([key]) => key in SECTION_LABELS);
  const thermalOf = new Map(thermalStates.map((t) => [t.section as string, t]));
  return (
    <div className="space-y-4">
      {sections.map(([key, value]) => (
        <details key={key} className="rounded-lg border border-line" open={key === 'bedAndWays'}>
          <summary className="min-h-touch cursor-pointer px-4 py-2.5 font-medium">
            {SECTION_LABELS[key]}
            {thermalOf.get(key) ? (
              <span className="ml-3 text-sm" data-thermal-section={key}>
                <ThermalStateMark state={thermalOf.get(key)!} />
              </span>
            ) : null}
          </summary>
          {thermalOf.get(key) ? <p className="px-4 pb-2 text-sm text-ink-soft">{thermalOf.get(key)!.explanation}.</p> : null}
          <dl className="figures grid grid-cols-1 gap-x-4 gap-y-1 px-4 pb-3 text-sm sm:grid-cols-[minmax(0,2fr)_minmax(0,3fr)]">
            {flatten(value).map(([label, text]) => (
              <div key={label} className="contents">
                <dt className="text-ink-soft">{label || SECTION_LABELS[key]}</dt>
                <dd className="break-words">{text}</dd>
              </div>
            ))}
          </dl>
        </details>
      ))}
    </div>
  );
}
