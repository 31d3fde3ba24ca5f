import { Card } from '@/components/ui/card';
import { sectionById } from '@/lib/survey/survey-sections';
import type { SectionThermalState } from '@/lib/survey/thermal-state';
import { ThermalStateMark } from './thermal-state-mark';

/** Cold or warm while each measured section was read, as kept with this version at release. */
export function ThermalStatesPanel({ states }: { states: SectionThermalState[] }) {
  return (
    <Card title="Cold or warm while measured" className="mt-6">
      {states.length === 0 ? (
        <p className="text-ink-soft">No measured section recorded whether the machine was cold or warm.</p>
      ) : (
        <>
          <p className="text-sm text-ink-soft">Run-out, play, noise and bed level all move as a headstock warms, so each set of readings carries the machine’s state.</p>
          <ul className="mt-3 divide-y divide-line">
            {states.map((s) => (
              <li key={s.section} data-thermal-section={s.section} className="grid gap-1 py-2 sm:grid-cols-[12rem_10rem_1fr]">
                <p className="font-medium">{sectionById(s.section)?.title ?? s.section}</p>
                <ThermalStateMark state={s} />
                <p className="text-sm text-ink-soft">{s.explanation}</p>
              </li>
            ))}
          </ul>
        </>
      )}
    </Card>
  );
}
