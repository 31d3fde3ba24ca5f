import { Circle, Line, Svg, Text, View } from '@react-pdf/renderer';
import type { ScoringResult } from '@/lib/scoring';
import { SURVEY_SECTIONS } from '@/lib/survey/survey-sections';
import { MACHINE_STATE_WORDS, type SectionThermalState } from '@/lib/survey/thermal-state';
import { pdfText } from './pdf-text';
import { COLOURS } from './theme';

/** The survey sections whose checks are graded in this subsystem. */
function sectionsOf(subsystemId: string, result: ScoringResult): Set<string> {
  const checkIds = new Set(result.checks.filter((c) => c.subsystem === subsystemId).map((c) => c.id));
  return new Set(SURVEY_SECTIONS.filter((s) => s.checks.some((id) => checkIds.has(id))).map((s) => s.id));
}

/** Warm a filled disc, cold a ring, not known a dash: shape and word, never colour alone. */
function StateShape({ state }: { state: SectionThermalState['state'] }) {
  return (
    <Svg width={7} height={7} viewBox="0 0 10 10">
      {state === 'warm' ? <Circle cx={5} cy={5} r={4.5} fill={COLOURS.ink} /> : null}
      {state === 'cold' ? <Circle cx={5} cy={5} r={3.8} fill="none" stroke={COLOURS.ink} strokeWidth={1.6} /> : null}
      {state === null ? <Line x1={1} y1={5} x2={9} y2={5} stroke={COLOURS.ink} strokeWidth={1.8} /> : null}
    </Svg>
  );
}

/** Cold or warm while the readings on this page were taken, as kept with the version at release. */
export function ThermalStatesBlock({ states, subsystemId, result }: { states: readonly SectionThermalState[]; subsystemId: string; result: ScoringResult }) {
  const here = sectionsOf(subsystemId, result);
  const shown = states.filter((s) => here.has(s.section));
  if (shown.length === 0) return null;
  return (
    <View wrap={false} style={{ marginBottom: 8 }}>
      {shown.map((s) => (
        <View key={s.section} style={{ flexDirection: 'row', alignItems: 'center', marginBottom: 1 }}>
          <StateShape state={s.state} />
          <Text style={{ marginLeft: 4, fontSize: 8.5 }}>
            <Text style={{ fontWeight: 600 }}>
              {SURVEY_SECTIONS.find((x) => x.id === s.section)?.title ?? s.section} read {s.state ? MACHINE_STATE_WORDS[s.state].toLowerCase() : 'cold or warm, not known'}
              {s.source === 'inspector' ? ' (set by the inspector)' : ''}:{' '}
            </Text>
            <Text style={{ color: COLOURS.inkSoft }}>{pdfText(s.explanation)}.</Text>
          </Text>
        </View>
      ))}
    </View>
  );
}
