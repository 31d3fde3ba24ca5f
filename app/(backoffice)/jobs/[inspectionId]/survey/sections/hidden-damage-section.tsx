'use client';

import { DEAL_BREAKER_ITEMS, HIDDEN_DAMAGE_ITEMS } from '@/lib/scoring/survey/checklist-items';
import { TextField, YesNoField } from '../fields/bound-fields';
import type { SurveyForm } from '../fields/survey-form';
import { FieldGroup } from './field-group';

function Finding({ form, member, id, label }: { form: SurveyForm; member: 'hiddenDamage' | 'dealBreakers'; id: string; label: string }) {
  const present = form.get([member, id, 'present']) as boolean | undefined;
  return (
    <div className="flex flex-col gap-2" data-finding={id}>
      <YesNoField form={form} path={[member, id, 'present']} label={label} />
      {present ? (
        <>
          <TextField form={form} path={[member, id, 'note']} label="What you saw, and where" maxLength={500} />
          <p className="text-sm font-medium text-band-worn">
            <span aria-hidden="true">▲ </span>Add a photo of this below: every “yes” needs one before the survey can be submitted.
          </p>
        </>
      ) : null}
    </div>
  );
}

/**
 * The walk-round before anything is opened or run: signs of repair or damage, and the faults that
 * end a deal whatever the grade. Each "yes" asks for a note and a photo.
 */
export function HiddenDamageSection({ form }: { form: SurveyForm }) {
  return (
    <div className="flex flex-col gap-5">
      <FieldGroup title="Hidden damage" hint="Look along the castings in raking light; tap suspect paint with a coin (filler sounds dull).">
        {HIDDEN_DAMAGE_ITEMS.map((item) => (
          <Finding key={item.id} form={form} member="hiddenDamage" id={item.id} label={item.label} />
        ))}
      </FieldGroup>
      <FieldGroup title="Deal-breakers" hint="Any of these heads the report whatever the grade. Answer after the power run where it needs the machine running.">
        {DEAL_BREAKER_ITEMS.map((item) => (
          <Finding key={item.id} form={form} member="dealBreakers" id={item.id} label={item.label} />
        ))}
      </FieldGroup>
    </div>
  );
}
