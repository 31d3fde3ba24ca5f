'use client';

import { Suspense, lazy, useCallback, useEffect, useMemo, useState } from 'react';
import type { CheckResult } from '@/lib/scoring';
import type { DraftSurvey } from '@/lib/survey/draft-survey-schema';
import { sectionsStarted } from '@/lib/survey/section-progress';
import { sectionUnitOf, withSectionUnit, type SectionUnit } from '@/lib/survey/section-unit';
import { POWER_ON_SECTIONS, SURVEY_SECTIONS, type SurveySectionId } from '@/lib/survey/survey-sections';
import { safetyGateConfirmed } from '@/lib/survey/safety-gate';
import type { SurveyPhoto } from '@/lib/survey/survey-photo';
import { getAt, setAt, type SurveyPath } from '@/lib/survey/survey-paths';
import type { SurveyForm } from './fields/survey-form';
import { SectionChecks } from './live/section-checks';
import { useLiveChecks } from './live/use-live-checks';
import { SafetyCautionsPanel } from './safety-cautions-panel';
import { SafetyGate } from './safety-gate';
import { SaveNotice, SaveStatus } from './save-status';
import { SECTION_DATA_KEYS, SECTION_SCREENS } from './section-screens';
import { SectionPhotos } from './section-photos';
import { SurveyProgress } from './survey-progress';
import { UnitSwitch } from './unit-switch';
import { useSurveyAutosave } from './use-survey-autosave';

const SUBMIT_STEP = SURVEY_SECTIONS.length;

// The last screen checks the whole survey against the format, so it brings the validator: it is
// fetched on its own, in the background once the first screen is up, so it is there even if the
// signal drops before the inspector gets to it.
// (React.lazy rather than next/dynamic: the same split without next/dynamic's own script.)
const loadSubmitStep = () => import('./submit-step').then((module) => ({ default: module.SubmitStep }));
const SubmitStep = lazy(loadSubmitStep);

function photoCountsBySection(photos: readonly SurveyPhoto[]): Record<string, number> {
  const counts: Record<string, number> = {};
  for (const photo of photos) counts[photo.section] = (counts[photo.section] ?? 0) + 1;
  return counts;
}

function unitsFrom(data: DraftSurvey): Record<SurveySectionId, SectionUnit> {
  const record = data as Record<string, unknown>;
  return Object.fromEntries(
    SURVEY_SECTIONS.map((s) => [s.id, sectionUnitOf(SECTION_DATA_KEYS[s.id].map((key) => record[key]))]),
  ) as Record<SurveySectionId, SectionUnit>;
}

/**
 * The survey on a phone: one section a screen in the on-site order, cautions first, inputs with
 * their live results, photos, and the save state always in view.
 */
export function SurveyWorkspace({
  inspectionId,
  machineTitle,
  initialVersion,
  initialData,
  initialPhotos,
  initialStep,
}: {
  inspectionId: number;
  machineTitle: string;
  initialVersion: number;
  initialData: DraftSurvey;
  initialPhotos: SurveyPhoto[];
  initialStep: number;
}) {
  const autosave = useSurveyAutosave({ inspectionId, initialVersion, initialData });
  // Fetch the last screen while the inspector works on this one (see loadSubmitStep above).
  useEffect(() => {
    const preload = () => void loadSubmitStep().catch(() => undefined);
    if (typeof window.requestIdleCallback !== 'function') {
      const timer = setTimeout(preload, 2_000);
      return () => clearTimeout(timer);
    }
    const idle = window.requestIdleCallback(preload, { timeout: 5_000 });
    return () => window.cancelIdleCallback(idle);
  }, []);
  const { data, state, revision, saver } = autosave;
  const update = saver.update;
  const [step, setStep] = useState(initialStep);
  const [units, setUnits] = useState(() => unitsFrom(initialData));
  const [photos, setPhotos] = useState(initialPhotos);

  const go = useCallback((index: number) => {
    const next = Math.max(0, Math.min(SUBMIT_STEP, index));
    setStep(next);
    const id = next === SUBMIT_STEP ? 'submit' : SURVEY_SECTIONS[next]!.id;
    window.history.replaceState(null, '', `?section=${id}`);
    window.scrollTo({ top: 0 });
  }, []);

  // Live bands: the scoring library runs here on what is typed so far (unfinished groups set aside).
  const live = useLiveChecks(data);
  const checksById = live.loaded ? live.byId : null;
  const started = useMemo(() => new Set(sectionsStarted(data)), [data]);

  const section = step < SUBMIT_STEP ? SURVEY_SECTIONS[step]! : null;
  const unit = section ? units[section.id] : 'mm';
  const form: SurveyForm = useMemo(
    () => ({
      data,
      unit,
      get: (path: SurveyPath) => getAt(data, path),
      set: (path: SurveyPath, value: unknown) => update((current) => setAt(current, path, value)),
    }),
    [data, unit, update],
  );

  function changeUnit(next: SectionUnit) {
    if (!section) return;
    setUnits((all) => ({ ...all, [section.id]: next }));
    update((current) => {
      let changed = current;
      for (const key of SECTION_DATA_KEYS[section.id]) {
        const value = (current as Record<string, unknown>)[key];
        if (value !== undefined) changed = setAt(changed, [key], withSectionUnit(value, next));
      }
      return changed;
    });
  }

  const Screen = section ? SECTION_SCREENS[section.id] : null;
  const powerOn = section ? POWER_ON_SECTIONS.includes(section.id) : false;
  const gateOpen = safetyGateConfirmed(data);
  const sectionChecks: CheckResult[] = section && checksById ? section.checks.map((id) => checksById.get(id)).filter((c): c is CheckResult => Boolean(c)) : [];
  const nextTitle = step + 1 < SUBMIT_STEP ? SURVEY_SECTIONS[step + 1]!.title : 'Check and submit';

  return (
    <div className="-mx-5 -mt-8 flex flex-col">
      <div className="sticky top-0 z-10 flex flex-col gap-2 border-b border-line bg-paper-raised px-4 pb-2 pt-3 shadow-sm">
        <div className="flex items-center justify-between gap-2">
          <p className="truncate text-sm font-medium text-ink-soft">{machineTitle}</p>
          <SaveStatus state={state} />
        </div>
        <SurveyProgress current={step} started={started} onGo={go} />
      </div>

      <div className="flex flex-col gap-5 px-4 pb-32 pt-4">
        <SaveNotice state={state} onLoadTheirs={saver.loadTheirs} onKeepMine={saver.keepMine} onRetry={saver.retry} />
        <header>
          <p className="figures text-sm font-semibold uppercase tracking-widest text-copper">
            Section {step + 1} of {SUBMIT_STEP + 1}
          </p>
          <h1 className="text-2xl font-semibold leading-tight">{section ? section.title : 'Check and submit'}</h1>
          {section ? <p className="mt-1 text-ink-soft">{section.summary}</p> : null}
        </header>

        {section && Screen ? (
          <>
            <SafetyCautionsPanel hazards={section.hazards} />
            {section.hasLengths ? <UnitSwitch unit={unit} onChange={changeUnit} /> : null}
            {powerOn ? <SafetyGate form={form} /> : null}
            {powerOn && !gateOpen ? (
              <p className="rounded-lg border border-line-strong bg-paper-sunken px-4 py-3 font-medium" data-testid="power-on-locked">
                <span aria-hidden="true">■ </span>Locked until the safety gate above is confirmed.
              </p>
            ) : (
              <Screen key={`${section.id}-${revision}-${unit}`} form={form} />
            )}
            {section.checks.length ? <SectionChecks checks={sectionChecks} state={!live.loaded ? 'loading' : checksById ? 'ready' : 'needs-size'} /> : null}
            <SectionPhotos
              inspectionId={inspectionId}
              section={section.id}
              hint={section.photoHint}
              photos={photos.filter((p) => p.section === section.id)}
              onAdded={(photo) => setPhotos((list) => [...list, photo])}
            />
          </>
        ) : (
          <Suspense
            fallback={
              <p className="text-ink-soft" role="status">
                Loading the final check…
              </p>
            }
          >
            <SubmitStep
              key={revision}
              inspectionId={inspectionId}
              form={form}
              data={data}
              photoCount={photos.length}
              sectionPhotoCounts={photoCountsBySection(photos)}
              saveState={state}
              confirmedVersion={saver.confirmedVersion}
              onGoTo={(id) => go(SURVEY_SECTIONS.findIndex((s) => s.id === id))}
            />
          </Suspense>
        )}
      </div>

      <nav aria-label="Survey sections" className="fixed inset-x-0 bottom-0 z-10 border-t border-line bg-paper-raised px-4 py-3 shadow-[0_-2px_8px_rgba(0,0,0,0.06)]">
        <div className="mx-auto grid max-w-6xl grid-cols-[auto_1fr] gap-2">
          <button type="button" onClick={() => go(step - 1)} disabled={step === 0} className="min-h-[52px] rounded-lg border border-line-strong bg-paper-raised px-4 font-semibold disabled:opacity-40">
            ← Back
          </button>
          {step < SUBMIT_STEP ? (
            <button type="button" onClick={() => go(step + 1)} className="min-h-[52px] truncate rounded-lg bg-ink px-4 font-semibold text-paper">
              Next: {nextTitle} →
            </button>
          ) : (
            <span />
          )}
        </div>
      </nav>
    </div>
  );
}
