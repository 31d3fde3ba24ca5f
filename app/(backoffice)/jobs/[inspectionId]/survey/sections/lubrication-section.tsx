'use client';

import { DeviceField, OilLevelField, PlainNumberField, QuantityField, RatingField, YesNoField } from '../fields/bound-fields';
import type { SurveyForm } from '../fields/survey-form';
import { DEBRIS, FILTER_SCREEN, LEAKS, OIL_CONDITION } from './rubrics';
import { FieldGroup } from './field-group';

const at = (...path: string[]) => ['lubrication', ...path];

export function LubricationSection({ form }: { form: SurveyForm }) {
  return (
    <div className="flex flex-col gap-5">
      <FieldGroup title="Headstock oil">
        <OilLevelField form={form} path={at('headstockOilLevel')} label="Oil level" />
        <RatingField form={form} path={at('oilCondition')} label="Oil colour and sludge" rubric={OIL_CONDITION} />
        <RatingField form={form} path={at('metalParticles')} label="Metal in the oil" rubric={DEBRIS} />
        <DeviceField form={form} path={at('pumpWorking')} label="Oil pump and lines" hint="Flow seen at the sight window with the spindle running" />
        <RatingField form={form} path={at('filterScreen')} label="Filter screen" rubric={FILTER_SCREEN} />
        <RatingField form={form} path={at('leaks')} label="Leaks" rubric={LEAKS} />
      </FieldGroup>
      <FieldGroup title="Oil sample (if taken)" hint="From a laboratory or a portable counter; leave empty when no sample was taken.">
        <QuantityField form={form} path={at('oilSample', 'particlesPerMl', 'atLeast4um')} label="Particles ≥ 4 µm(c)" unit="per mL" bounds={{ min: 0, max: 1_000_000_000 }} />
        <QuantityField form={form} path={at('oilSample', 'particlesPerMl', 'atLeast6um')} label="Particles ≥ 6 µm(c)" unit="per mL" bounds={{ min: 0, max: 1_000_000_000 }} />
        <QuantityField form={form} path={at('oilSample', 'particlesPerMl', 'atLeast14um')} label="Particles ≥ 14 µm(c)" unit="per mL" bounds={{ min: 0, max: 1_000_000_000 }} />
        <QuantityField form={form} path={at('oilSample', 'viscosityAt40C')} label="Viscosity at 40 °C" unit="mm²/s" bounds={{ min: 0, max: 100_000 }} />
        <PlainNumberField form={form} path={at('oilSample', 'declaredGrade')} label="Grade the oil is sold as (ISO VG)" hint="e.g. 32 or 68" bounds={{ positive: true, max: 10_000, integer: true }} />
        <YesNoField form={form} path={at('oilSample', 'waterSeen')} label="Water seen (milky oil, droplets)" />
      </FieldGroup>
    </div>
  );
}
