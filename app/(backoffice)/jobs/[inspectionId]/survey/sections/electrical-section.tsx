'use client';

import { DeviceField, QuantityField, RatingField } from '../fields/bound-fields';
import type { SurveyForm } from '../fields/survey-form';
import { CABLES } from './rubrics';
import { FieldGroup } from './field-group';

const at = (...path: string[]) => ['electricalAndSafety', ...path];

export function ElectricalSection({ form }: { form: SurveyForm }) {
  return (
    <div className="flex flex-col gap-5">
      <FieldGroup title="Safety functions" hint="A fault here is reported as “fix before use”, whatever the grade.">
        <DeviceField form={form} path={at('emergencyStop')} label="Emergency stop" hint="Stops the spindle from every speed; must be reset before a restart" />
        <DeviceField form={form} path={at('chuckGuardInterlock')} label="Chuck guard and interlock" hint="Spindle will not start with the guard open" />
        <DeviceField form={form} path={at('brakeWorks')} label="Spindle brake" />
        <QuantityField form={form} path={at('brakeStoppingTime')} label="Stopping time from top speed" unit="s" bounds={{ min: 0, max: 3600 }} />
        <DeviceField form={form} path={at('coversInPlace')} label="Guards and covers fitted and closed" />
      </FieldGroup>
      <FieldGroup title="Electrical tests" hint="By a qualified person, machine isolated.">
        <QuantityField form={form} path={at('earthContinuity')} label="Protective-earth continuity" unit="Ω" bounds={{ min: 0, max: 1_000_000 }} />
        <QuantityField form={form} path={at('insulationResistance')} label="Insulation resistance at 500 V DC" unit="MΩ" bounds={{ min: 0, max: 1_000_000 }} />
        <RatingField form={form} path={at('cables')} label="Cables and glands" rubric={CABLES} />
      </FieldGroup>
    </div>
  );
}
