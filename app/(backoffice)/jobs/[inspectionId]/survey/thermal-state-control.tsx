'use client';

import { ChoiceInput } from './fields/choice-input';
import { MeasuredAtInput } from './measured-at-input';
import type { SurveyForm } from './fields/survey-form';
import { MACHINE_STATE_WORDS, sectionThermalState, type MachineState, type ThermalSectionKey } from '@/lib/survey/thermal-state';

const CHOICES = [
  { value: 'cold' as const, label: 'Cold' },
  { value: 'warm' as const, label: 'Warm' },
];

/**
 * Cold or warm while this section's readings are taken: derived from the power-run log and the
 * time the inspector states for the section, with one tap to set it by hand (tap again to go back
 * to the derived state).
 */
export function ThermalStateControl({ form, section }: { form: SurveyForm; section: ThermalSectionKey }) {
  const sectionData = form.get([section]);
  const derived = sectionThermalState(section, { ...((sectionData as object | undefined) ?? {}), thermal: { ...((form.get([section, 'thermal']) as object | undefined) ?? {}), machineState: undefined } }, form.get(['powerRun']));
  const chosen = form.get([section, 'thermal', 'machineState']) as MachineState | undefined;
  const startedAt = form.get(['powerRun', 'startedAt']);
  const day = typeof startedAt === 'string' && startedAt.length >= 10 ? startedAt.slice(0, 10) : new Date().toISOString().slice(0, 10);
  return (
    <section aria-label="Machine cold or warm" data-thermal-section={section} className="flex flex-col gap-2 rounded-card border border-line bg-paper-raised p-4">
      <p className="font-medium" data-thermal-state={chosen ?? derived.state ?? 'not-known'}>
        {chosen ? `${MACHINE_STATE_WORDS[chosen]}, set by you` : derived.state ? `${MACHINE_STATE_WORDS[derived.state]}, from the power-run log` : 'Cold or warm: not known yet'}
      </p>
      <p className="text-sm text-ink-soft">{derived.explanation}.</p>
      <MeasuredAtInput value={form.get([section, 'thermal', 'measuredAt']) as string | undefined} day={day} onChange={(value) => form.set([section, 'thermal', 'measuredAt'], value)} />
      <ChoiceInput
        label="Machine while these readings were taken"
        hint="Tap only if the log is wrong for this section; tap again to go back to the log."
        value={chosen}
        onChange={(value) => form.set([section, 'thermal', 'machineState'], value)}
        choices={CHOICES}
      />
    </section>
  );
}
