'use client';

import { useRouter } from 'next/navigation';
import { useState, useTransition } from 'react';
import type { DraftSurvey } from '@/lib/survey/draft-survey-schema';
import { submissionBlockers } from '@/lib/survey/submission-blockers';
import { NotInspectedFields } from './not-inspected-fields';
import { SURVEY_SECTIONS, sectionById, type SurveySectionId } from '@/lib/survey/survey-sections';
import { submitSurveyAction } from '../actions';
import { TextField } from './fields/bound-fields';
import type { SurveyForm } from './fields/survey-form';
import type { SaveState } from './use-survey-autosave';

/**
 * The last screen: what is still missing (worked out here as the survey is filled, and again on the
 * server), the closing notes, and the submit button — only once every change has been saved.
 */
export function SubmitStep({
  inspectionId,
  form,
  data,
  photoCount,
  sectionPhotoCounts,
  saveState,
  confirmedVersion,
  onGoTo,
}: {
  inspectionId: number;
  form: SurveyForm;
  data: DraftSurvey;
  photoCount: number;
  sectionPhotoCounts: Readonly<Record<string, number>>;
  saveState: SaveState;
  confirmedVersion: () => number;
  onGoTo: (section: SurveySectionId) => void;
}) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [serverProblem, setServerProblem] = useState<{ message: string; bySection?: Record<string, string[]> } | null>(null);
  const blockers = submissionBlockers(data, { photoCount, sectionPhotoCounts });
  const bySection = new Map<SurveySectionId, string[]>();
  for (const blocker of blockers) bySection.set(blocker.section, [...(bySection.get(blocker.section) ?? []), blocker.text]);
  const saved = saveState.kind === 'saved';

  function submit() {
    setServerProblem(null);
    startTransition(async () => {
      const result = await submitSurveyAction({ inspectionId, baseVersion: confirmedVersion() });
      if (result.ok) {
        router.push(`/jobs/${inspectionId}?submitted=1`);
        return;
      }
      setServerProblem({ message: result.message, bySection: result.code === 'invalid_input' ? result.fieldErrors : undefined });
    });
  }

  return (
    <div className="flex flex-col gap-5">
      <section className="rounded-card border border-line bg-paper-raised p-4" data-testid="submission-check">
        <h3 className="text-lg font-semibold">{blockers.length === 0 ? 'Ready to submit' : `${blockers.length} ${blockers.length === 1 ? 'item' : 'items'} still missing`}</h3>
        {blockers.length === 0 ? (
          <p className="mt-1 text-ink-soft">Every required reading is in. Optional checks left empty are reported as “not measured” and lower the report’s confidence.</p>
        ) : (
          <ul className="mt-2 flex flex-col gap-3">
            {SURVEY_SECTIONS.filter((s) => bySection.has(s.id)).map((section) => (
              <li key={section.id}>
                <button type="button" onClick={() => onGoTo(section.id)} className="flex min-h-touch items-center gap-1 font-semibold text-copper-dark underline underline-offset-4">
                  {section.title} →
                </button>
                <ul className="ml-5 list-disc">
                  {bySection.get(section.id)!.map((text) => (
                    <li key={text}>{text}</li>
                  ))}
                </ul>
              </li>
            ))}
          </ul>
        )}
      </section>
      <NotInspectedFields form={form} />
      <section className="rounded-card border border-line bg-paper-raised p-4">
        <TextField form={form} path={['notes']} label="Notes for the coordinator and the report" hint="Anything you could not check, and why" multiline maxLength={5000} />
      </section>
      {serverProblem ? (
        <div role="alert" className="rounded-card border-2 border-band-rebuild bg-paper-raised p-4" data-testid="submit-refused">
          <p className="font-semibold">{serverProblem.message}</p>
          {serverProblem.bySection ? (
            <ul className="ml-5 mt-2 list-disc">
              {Object.entries(serverProblem.bySection).flatMap(([section, texts]) => texts.map((text) => <li key={`${section}-${text}`}>{`${sectionById(section)?.title ?? section}: ${text}`}</li>))}
            </ul>
          ) : null}
        </div>
      ) : null}
      <button
        type="button"
        onClick={submit}
        disabled={pending || !saved || blockers.length > 0}
        className="min-h-[56px] rounded-lg bg-copper px-5 text-lg font-semibold text-white hover:bg-copper-dark disabled:cursor-not-allowed disabled:opacity-50"
      >
        {pending ? 'Submitting…' : 'Submit survey for review'}
      </button>
      {!saved ? <p className="text-center text-sm text-ink-soft">Waiting for your last changes to be saved before the survey can be submitted.</p> : null}
    </div>
  );
}
