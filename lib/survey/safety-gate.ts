import type { DraftSurvey } from './draft-survey-schema';

/**
 * The safety gate before any step that powers the machine: the inspector confirms each item on
 * site, in this order, before the power-on sections open. The items are the usual checks before
 * starting a lathe; they stand beside, never above, local codes, the maker's instructions and
 * licensed practice.
 */
export const SAFETY_GATE_ITEMS = [
  { id: 'guardsOn', label: 'Guards and covers on', hint: 'Chuck guard, belt and gear covers fitted and closed.' },
  { id: 'chuckKeyOut', label: 'Chuck key out', hint: 'The key is out of the chuck and in your hand or on the bench.' },
  { id: 'workAndChuckSecure', label: 'Work and chuck secure', hint: 'Chuck fully on its nose and locked; any work or test bar gripped firmly.' },
  { id: 'emergencyStopAndBrakeTested', label: 'Emergency stop and brake tested', hint: 'Started at the lowest speed: the emergency stop stops the spindle and the brake holds.' },
  { id: 'earthChecked', label: 'Earth checked', hint: 'Protective earth connected and its continuity checked by a qualified person.' },
] as const;

export type SafetyGateItemId = (typeof SAFETY_GATE_ITEMS)[number]['id'];

/** Whether every gate item has been confirmed in this survey. */
export function safetyGateConfirmed(survey: DraftSurvey): boolean {
  const gate = survey.safetyGate as Partial<Record<SafetyGateItemId, boolean>> | undefined;
  return SAFETY_GATE_ITEMS.every((item) => gate?.[item.id] === true);
}

/** A power-run log can only have been written under power, so it needs the gate behind it. */
export function powerRunRecorded(survey: DraftSurvey): boolean {
  const run = survey.powerRun;
  return Boolean(run) && typeof run === 'object' && Object.keys(run).length > 0;
}
