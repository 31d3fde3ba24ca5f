'use client';

import { SAFETY_GATE_ITEMS, safetyGateConfirmed } from '@/lib/survey/safety-gate';
import { SAFETY_DEFERRAL } from '@/lib/survey/safety-cautions';
import type { SurveyForm } from './fields/survey-form';

/**
 * The gate before any step that powers the machine. Until every item is ticked the power-on
 * sections show this instead of their inputs; once confirmed it stays confirmed for the survey.
 */
export function SafetyGate({ form }: { form: SurveyForm }) {
  const gate = (form.get(['safetyGate']) as Record<string, boolean> | undefined) ?? {};
  const confirmed = safetyGateConfirmed(form.data);
  return (
    <section aria-label="Safety gate" data-testid="safety-gate" data-confirmed={confirmed} className="rounded-card border-2 border-band-rebuild bg-paper-raised p-4">
      <h2 className="flex items-center gap-2 text-lg font-semibold">
        <svg aria-hidden="true" viewBox="0 0 24 24" className="h-6 w-6 text-band-rebuild">
          <rect x="3" y="10" width="18" height="12" rx="2" fill="currentColor" />
          <path d="M7 10V7a5 5 0 0 1 10 0v3" fill="none" stroke="currentColor" strokeWidth="2.4" />
        </svg>
        Before the machine is powered
      </h2>
      <p className="mt-1 text-ink-soft">Confirm each item. The steps that run the machine stay locked until all are ticked.</p>
      <div className="mt-3 flex flex-col gap-2">
        {SAFETY_GATE_ITEMS.map((item) => {
          const ticked = gate[item.id] === true;
          return (
            <label key={item.id} className="flex min-h-[52px] cursor-pointer items-start gap-3 rounded-lg border border-line-strong p-3 has-[:checked]:border-copper has-[:checked]:bg-copper-light/40">
              <input
                type="checkbox"
                className="mt-1 h-6 w-6 shrink-0 accent-copper"
                checked={ticked}
                onChange={(event) => {
                  const next = { ...gate, [item.id]: event.target.checked };
                  // Keep all five members once any is ticked, so the saved gate is always complete.
                  const full = Object.fromEntries(SAFETY_GATE_ITEMS.map((i) => [i.id, next[i.id] === true]));
                  form.set(['safetyGate'], Object.values(full).some(Boolean) ? full : undefined);
                }}
              />
              <span>
                <span className="font-semibold">{item.label}</span>
                <span className="block text-sm text-ink-soft">{item.hint}</span>
              </span>
            </label>
          );
        })}
      </div>
      <p className="mt-3 text-sm text-ink-soft">{SAFETY_DEFERRAL}</p>
      {confirmed ? (
        <p role="status" className="mt-2 font-semibold text-band-true">
          <span aria-hidden="true">✓ </span>Confirmed: the power-on steps are open.
        </p>
      ) : null}
    </section>
  );
}
