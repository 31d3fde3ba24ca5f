'use client';

import type { Length } from '@/lib/scoring';
import { ChoiceField, LengthField } from '../fields/bound-fields';
import type { SurveyForm } from '../fields/survey-form';
import { TwoCollarLiveResult } from '../live/two-collar-live-result';
import { FieldGroup } from './field-group';

const at = (...path: string[]) => ['testCuts', ...path];

export function TestCutsSection({ form }: { form: SurveyForm }) {
  const length = (...path: string[]) => form.get(at(...path)) as Length | undefined;
  const setup = form.get(at('twoCollar', 'setup')) as 'between-centres' | 'in-chuck' | undefined;
  return (
    <div className="flex flex-col gap-5">
      <FieldGroup title="Two-collar test" hint="Turn two collars at one tool setting, without touching the cross-slide between them. Measure both with the same micrometer.">
        <ChoiceField
          form={form}
          path={at('twoCollar', 'setup')}
          label="Work held"
          choices={[
            { value: 'between-centres', label: 'Between centres' },
            { value: 'in-chuck', label: 'In the chuck' },
          ]}
        />
        <LengthField form={form} path={at('twoCollar', 'diameterNearHeadstock')} label="Diameter near the headstock" positive />
        <LengthField form={form} path={at('twoCollar', 'diameterNearTailstock')} label="Diameter near the tailstock" positive />
        <LengthField form={form} path={at('twoCollar', 'collarDistance')} label="Distance between the collars" positive />
        {setup === 'between-centres' ? <LengthField form={form} path={at('twoCollar', 'centresDistance')} label="Distance between the centres" hint="For the set-over at the tailstock centre" positive /> : null}
        <TwoCollarLiveResult
          setup={setup}
          nearHeadstock={length('twoCollar', 'diameterNearHeadstock')}
          nearTailstock={length('twoCollar', 'diameterNearTailstock')}
          collarDistance={length('twoCollar', 'collarDistance')}
          centresDistance={length('twoCollar', 'centresDistance')}
          unit={form.unit}
        />
      </FieldGroup>
      <FieldGroup title="Facing test" hint="Face a disc; straight-edge or indicator across the face. A face may only be concave.">
        <LengthField form={form} path={at('facing', 'diameter')} label="Diameter faced" positive />
        <LengthField form={form} path={at('facing', 'centreDeviation')} label="Deviation at the centre" hint="Positive = centre low (concave)" signed />
      </FieldGroup>
    </div>
  );
}
