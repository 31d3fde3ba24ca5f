'use client';

import type { Length } from '@/lib/scoring';
import { DeviceField, LengthField, RatingField } from '../fields/bound-fields';
import type { SurveyForm } from '../fields/survey-form';
import { TailstockLiveResult } from '../live/tailstock-live-result';
import { WEAR } from './rubrics';
import { FieldGroup } from './field-group';

const at = (...path: string[]) => ['tailstock', ...path];

export function TailstockSection({ form }: { form: SurveyForm }) {
  const length = (...path: string[]) => form.get(at(...path)) as Length | undefined;
  return (
    <div className="flex flex-col gap-5">
      <FieldGroup title="Alignment along a test bar" hint="Test bar between centres; indicator on the carriage at the front of the bar. A larger reading = bar nearer you.">
        <LengthField form={form} path={at('alignmentIndicator', 'readingNearHeadstock')} label="Reading near the headstock" signed />
        <LengthField form={form} path={at('alignmentIndicator', 'readingNearTailstock')} label="Reading near the tailstock" signed />
        <LengthField form={form} path={at('alignmentIndicator', 'distance')} label="Carriage travel between the readings" positive />
        <TailstockLiveResult
          nearHeadstock={length('alignmentIndicator', 'readingNearHeadstock')}
          nearTailstock={length('alignmentIndicator', 'readingNearTailstock')}
          distance={length('alignmentIndicator', 'distance')}
          unit={form.unit}
        />
      </FieldGroup>
      <FieldGroup title="Centre height and quill">
        <LengthField form={form} path={at('centreHeightDifference')} label="Tailstock centre minus headstock centre height" hint="Positive = tailstock higher (the only direction allowed)" signed />
        <RatingField form={form} path={at('quillCondition')} label="Quill fit and bore" rubric={WEAR} />
        <DeviceField form={form} path={at('quillLock')} label="Quill lock" />
      </FieldGroup>
    </div>
  );
}
