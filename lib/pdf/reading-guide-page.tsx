import { Text, View } from '@react-pdf/renderer';
import { BAND_TABLE, CONDITION_SCALE, type ScoringResult } from '@/lib/scoring';
import { BandMark } from './band-mark';
import { gradeColour } from './condition-scale-mark';
import { FramedPage, SectionHeading, type FrameFacts } from './page-frame';
import { pdfText } from './pdf-text';
import { NotInspectedAreas, ReportStatementsBlock } from './report-statements-block';
import { COLOURS, styles } from './theme';

function qRange(index: number) {
  const upper = BAND_TABLE[index]!.upToQ;
  const lower = index === 0 ? null : BAND_TABLE[index - 1]!.upToQ;
  if (lower === null) return `up to ${upper}`;
  return Number.isFinite(upper) ? `over ${lower} to ${upper}` : `over ${lower}`;
}

/** Page 2: how the grades are reached, what must be fixed first, and what was not measured. */
export function ReadingGuidePage({ result, frame }: { result: ScoringResult; frame: FrameFacts }) {
  return (
    <FramedPage frame={frame} bookmark="Reading this report" continuedTitle="Reading this report">
      <SectionHeading
        eyebrow="Reading this report"
        title="How the grades are reached"
        intro="Every check compares a reading with its permissible value. q is the reading divided by the permissible value: 1 means exactly at the limit a new machine must meet. A deviation in a direction the limit forbids counts against the machine even when small."
      />
      <View style={{ marginTop: 4, marginBottom: 10 }}>
        {BAND_TABLE.map((b, i) => (
          <View key={b.band} wrap={false} style={{ flexDirection: 'row', alignItems: 'center', paddingVertical: 3.5, ...styles.rule }}>
            <View style={{ width: 100 }}>
              <BandMark band={b.band} size={9} fontSize={9} />
            </View>
            <Text style={{ width: 80, ...styles.figures }}>q {qRange(i)}</Text>
            <Text style={{ flex: 1, color: COLOURS.inkSoft }}>{b.meaning}</Text>
          </View>
        ))}
        <View style={{ flexDirection: 'row', alignItems: 'center', paddingVertical: 3.5, ...styles.rule }}>
          <View style={{ width: 100 }}>
            <BandMark band="not-measured" size={9} fontSize={9} />
          </View>
          <Text style={{ width: 80 }}>—</Text>
          <Text style={{ flex: 1, color: COLOURS.inkSoft }}>not done on the day; lowers the confidence, never passes silently</Text>
        </View>
      </View>
      <Text style={{ color: COLOURS.inkSoft }}>
        Checks are weighted into a score of 0 to 100 for each subsystem, and the subsystems into the overall score, which is named on the appraisers&apos; scale:
      </Text>
      <View style={{ marginTop: 4, marginBottom: 10 }}>
        {CONDITION_SCALE.map((g) => (
          <View key={g.grade} wrap={false} style={{ flexDirection: 'row', paddingVertical: 2.5, ...styles.rule }}>
            <Text style={{ width: 100, fontWeight: 600, color: gradeColour(g.grade) }}>{g.grade}</Text>
            <Text style={{ width: 80, ...styles.figures }}>from {g.fromScore}</Text>
            <Text style={{ flex: 1, color: COLOURS.inkSoft }}>{g.meaning}</Text>
          </View>
        ))}
      </View>
      <Text style={{ color: COLOURS.inkSoft }}>
        Beside each check is the source of its limit: a named standard or handbook; &quot;from memory&quot; where the limit is recalled from a named
        document; or &quot;common practice&quot; where the trade has no published figure.
      </Text>

      <ReportStatementsBlock />

      <Text style={styles.h3}>Overall</Text>
      <Text>{pdfText(result.overall.explanation)}</Text>

      <Text style={styles.h3}>Safety findings: fix before use</Text>
      {result.safetyFindings.length === 0 ? (
        <Text style={{ color: COLOURS.inkSoft }}>None. The safety checks that were made passed; see the Electrical and safety page.</Text>
      ) : (
        result.safetyFindings.map((f) => (
          <View key={f.checkId} wrap={false} style={{ flexDirection: 'row', marginBottom: 2 }}>
            <BandMark band="unfit" />
            <Text style={{ flex: 1, marginLeft: 6 }}>{pdfText(f.message)}</Text>
          </View>
        ))
      )}

      <Text style={styles.h3}>Confidence: {Math.round(result.confidence.value * 100)} %</Text>
      <Text>{pdfText(result.confidence.explanation)}</Text>
      <NotInspectedAreas result={result} />
      {result.confidence.missing.length > 0 ? (
        <View style={{ marginTop: 6 }}>
          <View style={{ flexDirection: 'row', paddingBottom: 2, borderBottomWidth: 1, borderBottomColor: COLOURS.lineStrong }}>
            <Text style={{ width: '55%', fontSize: 7.5, fontWeight: 600, color: COLOURS.inkSoft }}>Not measured, heaviest first</Text>
            <Text style={{ width: '45%', fontSize: 7.5, fontWeight: 600, color: COLOURS.inkSoft }}>Why not, as the inspector recorded it</Text>
          </View>
          {result.confidence.missing.map((m) => (
            <View key={m.checkId} wrap={false} style={{ flexDirection: 'row', paddingVertical: 2, ...styles.rule }}>
              <Text style={{ width: '55%' }}>{pdfText(m.label)}</Text>
              <Text style={{ width: '45%', color: COLOURS.inkSoft }}>{pdfText(m.reason)}</Text>
            </View>
          ))}
        </View>
      ) : null}
    </FramedPage>
  );
}
