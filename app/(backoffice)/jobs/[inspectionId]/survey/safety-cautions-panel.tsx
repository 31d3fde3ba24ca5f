import { SAFETY_CAUTIONS, SAFETY_DEFERRAL, type Hazard } from '@/lib/survey/safety-cautions';

/** The usual cautions for this screen's steps, shown before its inputs. */
export function SafetyCautionsPanel({ hazards }: { hazards: readonly Hazard[] }) {
  if (hazards.length === 0) return null;
  return (
    <aside aria-label="Safety before you start" className="rounded-card border-2 border-band-worn bg-[#fbf3e2] p-4" data-testid="safety-cautions">
      <p className="flex items-center gap-2 text-lg font-semibold text-ink">
        <svg aria-hidden="true" viewBox="0 0 24 24" className="h-6 w-6 text-band-worn">
          <path d="M12 2.5l10 18H2z" fill="currentColor" />
          <path d="M12 9v5.5M12 17.2v.3" stroke="white" strokeWidth="2.4" strokeLinecap="round" />
        </svg>
        Safety before you start
      </p>
      <div className="mt-2 flex flex-col gap-3">
        {hazards.map((hazard) => (
          <div key={hazard}>
            <p className="font-semibold">{SAFETY_CAUTIONS[hazard].title}</p>
            <ul className="ml-5 list-disc text-ink">
              {SAFETY_CAUTIONS[hazard].points.map((point) => (
                <li key={point}>{point}</li>
              ))}
            </ul>
          </div>
        ))}
      </div>
      <p className="mt-3 text-sm text-ink-soft">{SAFETY_DEFERRAL}</p>
    </aside>
  );
}
