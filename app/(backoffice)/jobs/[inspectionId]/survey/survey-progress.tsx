'use client';

import { SURVEY_SECTIONS, type SurveySectionId } from '@/lib/survey/survey-sections';

/** Where the inspector is in the on-site order, and which sections already hold readings. */
export function SurveyProgress({ current, started, onGo }: { current: number; started: ReadonlySet<SurveySectionId>; onGo: (index: number) => void }) {
  const total = SURVEY_SECTIONS.length + 1;
  return (
    <div className="flex flex-col gap-2">
      <ol className="flex gap-1" aria-label="Survey progress">
        {[...SURVEY_SECTIONS.map((s) => s.id), 'submit' as const].map((id, index) => {
          const done = id !== 'submit' && started.has(id);
          return (
            <li
              key={id}
              aria-current={index === current ? 'step' : undefined}
              className={`h-2.5 flex-1 rounded-full ${index === current ? 'bg-copper ring-2 ring-copper ring-offset-1 ring-offset-paper-raised' : done ? 'bg-ink-soft' : 'bg-line'}`}
            />
          );
        })}
      </ol>
      <details className="group">
        <summary className="flex min-h-touch cursor-pointer list-none items-center justify-between rounded-lg px-1 font-medium text-ink-soft">
          <span className="figures">
            Step {current + 1} of {total} · {started.size} of {SURVEY_SECTIONS.length} sections started
          </span>
          <span aria-hidden="true" className="text-copper group-open:rotate-180">▾</span>
          <span className="sr-only">All sections</span>
        </summary>
        <ul className="mt-1 flex flex-col">
          {SURVEY_SECTIONS.map((section, index) => (
            <li key={section.id}>
              <button type="button" onClick={() => onGo(index)} className={`flex min-h-touch w-full items-center justify-between rounded-lg px-3 text-left hover:bg-paper-sunken ${index === current ? 'font-semibold' : ''}`}>
                <span>
                  {index + 1}. {section.title}
                </span>
                <span className="text-sm text-ink-soft">{started.has(section.id) ? '✓ started' : 'not started'}</span>
              </button>
            </li>
          ))}
          <li>
            <button type="button" onClick={() => onGo(SURVEY_SECTIONS.length)} className="flex min-h-touch w-full items-center rounded-lg px-3 text-left hover:bg-paper-sunken">
              {SURVEY_SECTIONS.length + 1}. Check and submit
            </button>
          </li>
        </ul>
      </details>
    </div>
  );
}
