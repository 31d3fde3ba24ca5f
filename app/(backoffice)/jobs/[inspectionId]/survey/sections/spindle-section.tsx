'use client';

import { ChoiceField, LengthField, QuantityField } from '../fields/bound-fields';
import type { SurveyForm } from '../fields/survey-form';
import { FieldGroup } from './field-group';

const at = (...path: string[]) => ['spindle', ...path];

export function SpindleSection({ form }: { form: SurveyForm }) {
  return (
    <div className="flex flex-col gap-5">
      <FieldGroup title="Run-out" hint="Turn the spindle by hand, machine isolated. Total indicator reading.">
        <LengthField form={form} path={at('noseRunout')} label="Spindle nose centring diameter" />
        <LengthField form={form} path={at('testBarRunoutAtNose')} label="Test bar at the nose" />
        <LengthField form={form} path={at('testBarRunoutFar', 'runout')} label="Test bar away from the nose" />
        <LengthField form={form} path={at('testBarRunoutFar', 'distanceFromNose')} label="…measured this far from the nose" hint="Usually 300 mm" positive />
      </FieldGroup>
      <FieldGroup title="Play">
        <LengthField form={form} path={at('axialSlip')} label="Axial play" hint="Indicator on the nose face, end load applied" />
        <LengthField form={form} path={at('liftPlay')} label="Lift test" hint="Bar levered up at the nose" />
        <ChoiceField
          form={form}
          path={at('bearings')}
          label="Spindle bearings"
          hint="Sets the lift-test limit"
          columns={2}
          choices={[
            { value: 'plain', label: 'Plain', meaning: 'bronze or white-metal bushes' },
            { value: 'rolling', label: 'Rolling', meaning: 'preloaded taper-roller or angular-contact' },
          ]}
        />
      </FieldGroup>
      <FieldGroup title="Spindle to carriage" hint="Indicator on the carriage along a test bar. Vertical: positive = free end higher. Horizontal: positive = free end toward the tool.">
        <LengthField form={form} path={at('parallelismVertical', 'deviation')} label="Vertical deviation" signed />
        <LengthField form={form} path={at('parallelismVertical', 'over')} label="…over carriage travel" positive />
        <LengthField form={form} path={at('parallelismHorizontal', 'deviation')} label="Horizontal deviation" signed />
        <LengthField form={form} path={at('parallelismHorizontal', 'over')} label="…over carriage travel" positive />
      </FieldGroup>
      <FieldGroup title="Running" hint="After 30 minutes at mid speed.">
        <QuantityField form={form} path={at('temperatureRise')} label="Bearing housing temperature rise" unit="K" bounds={{ min: -50, max: 200 }} />
        <QuantityField form={form} path={at('vibration')} label="Vibration on the headstock (RMS)" unit="mm/s" bounds={{ min: 0, max: 1000 }} />
      </FieldGroup>
    </div>
  );
}
