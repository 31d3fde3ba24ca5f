import { Text, View } from '@react-pdf/renderer';
import { CONDITION_GRADES, type ConditionGrade } from '@/lib/scoring';
import { COLOURS, styles } from './theme';

const GRADE_COLOUR: Readonly<Record<ConditionGrade, string>> = {
  Excellent: COLOURS.bandTrue,
  'Very good': COLOURS.bandTrue,
  Good: COLOURS.bandFair,
  Fair: COLOURS.bandWorn,
  Poor: COLOURS.bandRebuild,
  Salvage: COLOURS.bandRebuild,
};

export function gradeColour(grade: ConditionGrade | null) {
  return grade ? GRADE_COLOUR[grade] : COLOURS.bandUnknown;
}

/**
 * The appraisers' six-step scale with the machine's grade marked by position and a raised,
 * outlined step, not by colour alone.
 */
export function ConditionScaleMark({ grade, width = 260 }: { grade: ConditionGrade | null; width?: number }) {
  const step = width / CONDITION_GRADES.length;
  return (
    <View style={{ flexDirection: 'row', width }}>
      {CONDITION_GRADES.map((g) => {
        const current = g === grade;
        return (
          <View key={g} style={{ width: step, paddingHorizontal: 1 }}>
            <View
              style={{
                height: current ? 10 : 5,
                marginTop: current ? 0 : 5,
                backgroundColor: current ? gradeColour(g) : COLOURS.line,
              }}
            />
            <Text style={{ ...styles.small, fontSize: 6.5, marginTop: 2, textAlign: 'center', color: current ? COLOURS.ink : COLOURS.inkFaint, fontWeight: current ? 700 : 400 }}>
              {g}
            </Text>
          </View>
        );
      })}
    </View>
  );
}
