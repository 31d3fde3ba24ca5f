'use client';

import { beltSpanMm, deflectionBySixtyFourthRule } from '@/lib/scoring/measure/v-belt';
import { fromMillimetres, toMillimetres, type Length } from '@/lib/scoring/units/length';
import { LengthField, RatingField } from '../fields/bound-fields';
import type { SurveyForm } from '../fields/survey-form';
import { formatLength } from '../live/format-length';
import { BELT, NOISE } from './rubrics';
import { FieldGroup } from './field-group';

const at = (...path: string[]) => ['drive', ...path];

export function DriveSection({ form }: { form: SurveyForm }) {
  const belt = form.get(at('belt')) as { centreDistance?: Length; driverPulleyDiameter?: Length; drivenPulleyDiameter?: Length } | undefined;
  const geometry =
    belt?.centreDistance?.value && belt.driverPulleyDiameter?.value && belt.drivenPulleyDiameter?.value
      ? beltSpanMm({
          centreDistanceMm: toMillimetres(belt.centreDistance),
          smallPulleyDiameterMm: Math.min(toMillimetres(belt.driverPulleyDiameter), toMillimetres(belt.drivenPulleyDiameter)),
          largePulleyDiameterMm: Math.max(toMillimetres(belt.driverPulleyDiameter), toMillimetres(belt.drivenPulleyDiameter)),
        })
      : null;
  return (
    <div className="flex flex-col gap-5">
      <FieldGroup title="V-belt" hint="Cover off with the machine isolated. Press the belt at mid-span with a moderate thumb force.">
        <RatingField form={form} path={at('belt', 'condition')} label="Belt condition" rubric={BELT} />
        <LengthField form={form} path={at('belt', 'centreDistance')} label="Distance between pulley centres" positive />
        <LengthField form={form} path={at('belt', 'driverPulleyDiameter')} label="Motor pulley diameter" positive />
        <LengthField form={form} path={at('belt', 'drivenPulleyDiameter')} label="Driven pulley diameter" positive />
        {geometry !== null ? (
          <p className="figures rounded-lg bg-paper-sunken px-3 py-2">
            Span {formatLength(fromMillimetres(geometry, form.unit), form.unit)} · target deflection about{' '}
            <strong>{formatLength(fromMillimetres(deflectionBySixtyFourthRule(geometry), form.unit), form.unit)}</strong> (1/64 of the span)
          </p>
        ) : null}
        <LengthField form={form} path={at('belt', 'measuredDeflection')} label="Measured mid-span deflection" />
      </FieldGroup>
      <FieldGroup title="Motor">
        <RatingField form={form} path={at('motorNoise')} label="Motor noise" rubric={NOISE} />
      </FieldGroup>
    </div>
  );
}
