'use client';

import type { ComponentType } from 'react';
import type { SurveyForm } from './fields/survey-form';
import { ThermalStateControl } from './thermal-state-control';
import type { ThermalSectionKey } from '@/lib/survey/thermal-state';
import type { SurveyPath } from '@/lib/survey/survey-paths';

/**
 * A measured section's screen with its cold/warm control on top. Every reading typed in the
 * section stamps when it was typed (a record of entry); cold or warm comes from the power-run log
 * and the time the inspector states for the section.
 */
export function withThermalState(Screen: ComponentType<{ form: SurveyForm }>, section: ThermalSectionKey): ComponentType<{ form: SurveyForm }> {
  function ThermalSectionScreen({ form }: { form: SurveyForm }) {
    const stamping: SurveyForm = {
      ...form,
      set: (path: SurveyPath, value: unknown) => {
        form.set(path, value);
        if (path[0] === section && path[1] !== 'thermal' && value !== undefined) form.set([section, 'thermal', 'readingsAt'], new Date().toISOString());
      },
    };
    return (
      <div className="flex flex-col gap-5">
        <ThermalStateControl form={form} section={section} />
        <Screen form={stamping} />
      </div>
    );
  }
  ThermalSectionScreen.displayName = `WithThermalState(${section})`;
  return ThermalSectionScreen;
}
