'use client';

import type { Length, Slope } from '@/lib/scoring';
import { ChoiceField, LengthField, RatingField } from '../fields/bound-fields';
import { ReadingsInput } from '../fields/readings-input';
import type { SurveyForm } from '../fields/survey-form';
import { BedLiveResults } from '../live/bed-live-results';
import { WEAR } from './rubrics';
import { BedWearFields } from './bed-wear-fields';
import { FieldGroup } from './field-group';

const at = (...path: string[]) => ['bedAndWays', ...path];

export function BedSection({ form }: { form: SurveyForm }) {
  const readings = form.get(at('levelling', 'longitudinalReadings')) as number[] | undefined;
  const transverse = form.get(at('levelling', 'transverseReadings')) as number[] | undefined;
  return (
    <div className="flex flex-col gap-5">
      <FieldGroup title="Before levelling">
        <ChoiceField
          form={form}
          path={at('standLoadState')}
          label="Load on the stand"
          hint="Heavy items resting on the stand twist the bed: levelling is only valid with the stand as normally loaded."
          columns={3}
          choices={[
            { value: 'normal', label: 'Normal' },
            { value: 'extra-load-on-stand', label: 'Extra load' },
            { value: 'unknown', label: 'Unknown' },
          ]}
        />
      </FieldGroup>
      <FieldGroup title="Level readings" hint="Level on the carriage or a bridge, moved one level base at a time from the headstock end. Positive = tailstock end of the level higher.">
        <LengthField form={form} path={at('levelling', 'stationSpacing')} label="Distance between stations" hint="Usually the level’s base length" positive />
        <ReadingsInput label="Along the bed (divisions)" values={readings} onChange={(values) => form.set(at('levelling', 'longitudinalReadings'), values)} />
        <BedLiveResults
          readings={readings}
          transverse={transverse}
          spacing={form.get(at('levelling', 'stationSpacing')) as Length | undefined}
          sensitivity={form.get(['instruments', 'levelSensitivity']) as Slope | undefined}
        />
        <ReadingsInput label="Across the ways (divisions)" hint="At the same stations; positive = rear way higher" values={transverse} onChange={(values) => form.set(at('levelling', 'transverseReadings'), values)} />
      </FieldGroup>
      <FieldGroup title="Wear">
        <RatingField form={form} path={at('visualWear')} label="Ways, visible wear and scoring" rubric={WEAR} />
        <LengthField form={form} path={at('stepNearChuck')} label="Depth of the worn step near the chuck" hint="Feeler gauge or indicator across the step; leave empty if none" />
        <RatingField form={form} path={at('carriageWear')} label="Carriage fit" hint="Gibs at the end of adjustment, tight toward the tailstock" rubric={WEAR} />
      </FieldGroup>
      <BedWearFields form={form} />
    </div>
  );
}
