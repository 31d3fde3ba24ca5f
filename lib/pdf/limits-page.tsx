import { Text, View } from '@react-pdf/renderer';
import { formatDate } from '@/lib/format';
import { SAFETY_CAUTIONS, SAFETY_DEFERRAL } from '@/lib/survey/safety-cautions';
import { INSPECTION_LIMITS } from './inspection-limits';
import { FramedPage, SectionHeading, type FrameFacts } from './page-frame';
import { pdfText } from './pdf-text';
import type { ReportDocumentData } from './report-document-data';
import { COLOURS, styles } from './theme';

function Bullets({ items }: { items: readonly string[] }) {
  return (
    <View>
      {items.map((item, i) => (
        <View key={i} wrap={false} style={{ flexDirection: 'row', marginBottom: 2 }}>
          <Text style={{ width: 10, color: COLOURS.copper }}>•</Text>
          <Text style={{ flex: 1 }}>{pdfText(item)}</Text>
        </View>
      ))}
    </View>
  );
}

/** The last page: what this inspection cannot tell, the usual cautions, who signed, and how to verify. */
export function LimitsPage({ data, frame }: { data: ReportDocumentData; frame: FrameFacts }) {
  const { result } = data;
  return (
    <FramedPage frame={frame} bookmark="Limits, safety and sign-off">
      <SectionHeading eyebrow="Scope" title="What this inspection can and cannot tell" />
      <Bullets items={INSPECTION_LIMITS} />

      <Text style={styles.h3}>Before the machine is run or worked on</Text>
      <View style={{ flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between' }}>
        {Object.values(SAFETY_CAUTIONS).map((caution) => (
          <View key={caution.hazard} wrap={false} style={{ width: '48.5%', ...styles.panel, padding: 7, marginBottom: 5 }}>
            <Text style={{ fontWeight: 600, marginBottom: 1 }}>{caution.title}</Text>
            {caution.points.map((point, i) => (
              <Text key={i} style={{ fontSize: 8, lineHeight: 1.3, marginBottom: 1 }}>
                {pdfText(point)}
              </Text>
            ))}
          </View>
        ))}
      </View>
      <Text style={{ fontWeight: 500 }}>{pdfText(SAFETY_DEFERRAL)}</Text>
      <View style={{ marginTop: 6 }}>
        <Bullets items={result.notices} />
      </View>

      <View wrap={false} style={{ marginTop: 10, borderTopWidth: 1, borderTopColor: COLOURS.ink, paddingTop: 6 }}>
        <Text style={{ ...styles.h3, marginTop: 0 }}>Sign-off</Text>
        <View style={{ flexDirection: 'row' }}>
          {[
            ['Inspected by', data.inspectorName ?? '—', result.machine.inspectedOn ? `on ${formatDate(new Date(result.machine.inspectedOn))}` : ''],
            ['Reviewed and released by', data.reviewerName ?? '—', data.releasedAt ? `on ${formatDate(data.releasedAt)}` : 'not released'],
            ['Report', `No. ${data.reportId}, version ${data.version}`, `scoring ${result.scoringVersion}, survey format v${result.surveyFormatVersion}`],
          ].map(([label, value, note]) => (
            <View key={label} style={{ width: '33.3%', paddingRight: 8 }}>
              <Text style={styles.factLabel}>{label}</Text>
              <Text style={styles.factValue}>{value}</Text>
              <Text style={{ ...styles.small, ...styles.figures }}>{note}</Text>
            </View>
          ))}
        </View>
        <View style={{ ...styles.panel, marginTop: 10, flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center' }}>
          <View>
            <Text style={styles.factLabel}>Verification code</Text>
            <Text style={{ fontSize: 14, fontWeight: 600, letterSpacing: 0.5, ...styles.figures }}>{data.verificationCode}</Text>
          </View>
          <View style={{ width: '60%' }}>
            <Text style={{ fontSize: 8.5 }}>
              Check at {data.verificationUrl} that this report is genuine and whether a newer version replaces it. A released report is never
              changed; a correction is issued as a new version with its own code.
            </Text>
          </View>
        </View>
      </View>
    </FramedPage>
  );
}
