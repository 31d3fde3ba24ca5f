import { MACHINE_STATE_WORDS, type SectionThermalState } from '@/lib/survey/thermal-state';

/** Cold, warm or not known, each with its own shape beside the word, never colour alone. */
export function ThermalStateMark({ state }: { state: SectionThermalState }) {
  const word = state.state ? MACHINE_STATE_WORDS[state.state] : 'Not known';
  return (
    <span className="inline-flex items-center gap-1.5 font-medium" data-machine-state={state.state ?? 'not-known'}>
      <svg aria-hidden="true" width="14" height="14" viewBox="0 0 16 16">
        {state.state === 'warm' ? (
          <circle cx="8" cy="8" r="6" fill="currentColor" />
        ) : state.state === 'cold' ? (
          <circle cx="8" cy="8" r="5.5" fill="none" stroke="currentColor" strokeWidth="2" />
        ) : (
          <path d="M3 8h10" stroke="currentColor" strokeWidth="2.4" strokeLinecap="round" />
        )}
      </svg>
      {word}
      {state.source === 'inspector' ? <span className="font-normal text-ink-soft">(set by the inspector)</span> : null}
    </span>
  );
}
