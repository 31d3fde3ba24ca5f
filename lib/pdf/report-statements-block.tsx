import { Text, View } from '@react-pdf/renderer';
import { AREA_LABELS, REPORT_STATEMENTS, type ScoringResult } from '@/lib/scoring';
import { pdfText } from './pdf-text';
import { COLOURS, styles } from './theme';

/** Areas the inspector set aside, with the reason recorded on site (results from scoring 1.1 on). */
export function NotInspectedAreas({ result }: { result: ScoringResult }) {
  const areas = (result.notInspected ?? []).filter((n) => n.id.startsWith('area:'));
  if (areas.length === 0) return null;
  return (
    <View style={{ marginTop: 6 }}>
      <Text style={{ fontSize: 7.5, fontWeight: 600, color: COLOURS.inkSoft }}>Not inspected, as the inspector recorded it</Text>
      {areas.map((a) => (
        <View key={a.id} wrap={false} style={{ flexDirection: 'row', paddingVertical: 2, ...styles.rule }}>
          <Text style={{ width: '55%' }}>{pdfText(AREA_LABELS[a.id.slice(5)] ?? a.label)}</Text>
          <Text style={{ width: '45%', color: COLOURS.inkSoft }}>{pdfText(a.reason)}</Text>
        </View>
      ))}
    </View>
  );
}

/** Scope and independence, not a warranty, no advice to buy or not to buy: in every report. */
export function ReportStatementsBlock() {
  return (
    <View wrap={false} style={{ marginTop: 8 }}>
      <Text style={styles.h3}>What this report is, and is not</Text>
      {[REPORT_STATEMENTS.scope, REPORT_STATEMENTS.independence, REPORT_STATEMENTS.notAWarranty, REPORT_STATEMENTS.noAdvice, REPORT_STATEMENTS.dealBreakers].map((text) => (
        <Text key={text} style={{ marginBottom: 3 }}>
          {pdfText(text)}
        </Text>
      ))}
    </View>
  );
}
