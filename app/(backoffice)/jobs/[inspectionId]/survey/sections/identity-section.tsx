'use client';

import { SLOPE_UNITS } from '@/lib/scoring/units/slope';
import { ChoiceField, LengthField, PlainNumberField, QuantityField, TextField } from '../fields/bound-fields';
import type { SurveyForm } from '../fields/survey-form';
import { FieldGroup } from './field-group';

const SLOPE_WORDS: Record<(typeof SLOPE_UNITS)[number], string> = { 'mm/m': 'mm/m', arcsec: 'arc-seconds', 'in/ft': 'in/ft' };

export function IdentitySection({ form }: { form: SurveyForm }) {
  const slopeUnit = ((form.get(['instruments', 'levelSensitivity', 'unit']) as string | undefined) ?? 'mm/m') as (typeof SLOPE_UNITS)[number];
  return (
    <div className="flex flex-col gap-5">
      <FieldGroup title="Nameplate" hint="Filled in from the listing: check each against the plate and correct it.">
        <TextField form={form} path={['inspectedOn']} label="Date of the inspection (YYYY-MM-DD)" maxLength={10} />
        <ChoiceField
          form={form}
          path={['machine', 'latheType']}
          label="Lathe type"
          choices={[
            { value: 'general-purpose', label: 'General purpose' },
            { value: 'toolroom', label: 'Toolroom', meaning: 'held to half the limits' },
          ]}
        />
        <TextField form={form} path={['machine', 'maker']} label="Maker" maxLength={120} />
        <TextField form={form} path={['machine', 'model']} label="Model" maxLength={120} />
        <TextField form={form} path={['machine', 'serialNumber']} label="Serial number" maxLength={120} />
        <PlainNumberField form={form} path={['machine', 'year']} label="Year built" bounds={{ min: 1850, max: 2100, integer: true }} />
      </FieldGroup>
      <FieldGroup title="Size">
        <LengthField form={form} path={['machine', 'swingOverBed']} label="Swing over bed" hint="Twice the centre height above the bed" positive required />
        <LengthField form={form} path={['machine', 'distanceBetweenCentres']} label="Distance between centres" positive required />
        <LengthField form={form} path={['machine', 'spindleBore']} label="Spindle bore" />
      </FieldGroup>
      <FieldGroup title="Motor and supply">
        <QuantityField form={form} path={['machine', 'motorPower']} label="Motor power" unit="kW" bounds={{ positive: true, max: 10_000 }} />
        <PlainNumberField form={form} path={['machine', 'supply', 'voltage']} label="Supply voltage" unit="V" bounds={{ positive: true, max: 100_000 }} />
        <ChoiceField form={form} path={['machine', 'supply', 'phases']} label="Phases" columns={2} choices={[{ value: 1, label: 'Single phase' }, { value: 3, label: 'Three phase' }]} />
        <ChoiceField form={form} path={['machine', 'supply', 'frequencyHz']} label="Frequency" columns={2} choices={[{ value: 50, label: '50 Hz' }, { value: 60, label: '60 Hz' }]} />
        <PlainNumberField form={form} path={['machine', 'runningHours']} label="Running hours, if known" unit="h" bounds={{ min: 0, max: 1_000_000 }} />
        <TextField form={form} path={['machine', 'usageHistory']} label="Usage history" hint="What the owner says it was used for, and how much" multiline maxLength={2000} />
      </FieldGroup>
      <FieldGroup title="How it stands">
        <ChoiceField
          form={form}
          path={['machine', 'mounting', 'kind']}
          label="Mounting"
          choices={[
            { value: 'cabinet-stand', label: 'Cabinet stand' },
            { value: 'fabricated-stand', label: 'Fabricated stand' },
            { value: 'feet-on-floor', label: 'Feet on the floor' },
            { value: 'bench', label: 'Bench' },
          ]}
        />
        <TextField form={form} path={['machine', 'mounting', 'notes']} label="Mounting notes" hint="Levelling feet, bolts, anything stored on the stand" multiline maxLength={1000} />
      </FieldGroup>
      <FieldGroup title="Your instruments" hint="Stated once; every reading in the survey is worked out from these.">
        <ChoiceField
          form={form}
          path={['instruments', 'levelSensitivity', 'unit']}
          label="Level sensitivity is marked in"
          columns={3}
          choices={SLOPE_UNITS.map((unit) => ({ value: unit, label: SLOPE_WORDS[unit] }))}
        />
        <QuantityField
          form={form}
          path={['instruments', 'levelSensitivity']}
          label="Level sensitivity per division"
          hint="e.g. 0.02 mm/m or 4 arc-seconds"
          unit={slopeUnit}
          bounds={{ positive: true, max: 1000 }}
        />
        <LengthField form={form} path={['instruments', 'indicatorResolution']} label="Indicator resolution" hint="The smallest step of the dial or test indicator" positive />
      </FieldGroup>
    </div>
  );
}
