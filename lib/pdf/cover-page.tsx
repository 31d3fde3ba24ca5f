import { Text, View } from '@react-pdf/renderer';
import { formatDate, formatMoney } from '@/lib/format';
import type { Money } from '@/lib/scoring';
import { ConditionScaleMark, gradeColour } from './condition-scale-mark';
import { DealBreakersBlock } from './deal-breakers-block';
import { FramedPage, WaygradeMark, type FrameFacts } from './page-frame';
import { pdfText } from './pdf-text';
import type { ReportDocumentData } from './report-document-data';
import { COLOURS, styles } from './theme';
import { shownScore } from '@/lib/scoring/grading/condition-scale';

const LATHE_KIND_WORDS = { general_purpose: 'general-purpose centre lathe', toolroom: 'toolroom centre lathe' } as const;

function money(m: Money | null | undefined) {
  return m ? formatMoney(m.amountMinor, m.currency) : '—';
}

function Fact({ label, value, width }: { label: string; value: string; width: string }) {
  return (
    <View style={{ width, marginBottom: 5 }}>
      <Text style={styles.factLabel}>{label}</Text>
      <Text style={styles.factValue}>{value}</Text>
    </View>
  );
}

function mm(value: number | null) {
  return value === null ? '—' : `${value.toLocaleString('en-GB')} mm`;
}

/** Page 1: who, what, how good, how sure, what it is worth, and how to check the document. */
export function CoverPage({ data, frame }: { data: ReportDocumentData; frame: FrameFacts }) {
  const { machine: m, result: r } = data;
  const valuation = r.valuation.reconciliation ?? r.valuation.costApproach;
  const grade = r.overall.condition;
  const confidencePercent = Math.round(r.confidence.value * 100);
  return (
    <FramedPage frame={frame} bookmark="Summary">
      <View style={{ flexDirection: 'row', alignItems: 'center', marginBottom: 4 }}>
        <WaygradeMark size={18} />
        <Text style={{ ...styles.eyebrow, marginLeft: 6 }}>Measured condition report</Text>
      </View>
      <Text style={styles.h1}>
        {m.maker} {m.model}
      </Text>
      <Text style={{ ...styles.body, fontSize: 10.5, color: COLOURS.inkSoft, marginTop: 2, ...styles.figures }}>
        {[
          LATHE_KIND_WORDS[m.latheKind],
          m.serialNumber ? `serial ${m.serialNumber}` : 'serial not recorded',
          m.yearBuilt ? `built ${m.yearBuilt}` : null,
          `${m.town}, ${m.region}`,
        ]
          .filter(Boolean)
          .join(' · ')}
      </Text>

      <DealBreakersBlock result={r} />

      <View style={{ flexDirection: 'row', marginTop: 12 }}>
        <View style={{ ...styles.panel, flexGrow: 1, flexBasis: 0, marginRight: 10, borderLeftWidth: 3, borderLeftColor: gradeColour(grade) }}>
          <Text style={styles.factLabel}>Overall condition</Text>
          <Text style={{ fontSize: 26, fontWeight: 600, color: gradeColour(grade), lineHeight: 1.15 }}>{grade ?? 'Not graded'}</Text>
          {/* Results scored before 1.2 carry no provisional flag and read as firm, as they were released. */}
          {grade !== null && r.provisional === true ? (
            <Text style={{ fontSize: 12, fontWeight: 600, lineHeight: 1.2 }}>Provisional: too little was measured to sign a firm grade</Text>
          ) : null}
          <Text style={{ ...styles.figures, fontSize: 10, marginBottom: 8 }}>
            {r.overall.score === null ? 'No score' : `Score ${shownScore(r.overall.score, 1).toFixed(1)} of 100`}
          </Text>
          <ConditionScaleMark grade={grade} width={250} />
          <Text style={{ ...styles.factLabel, marginTop: 10 }}>Confidence</Text>
          <Text style={{ ...styles.factValue }}>
            {confidencePercent} % of the check weight measured ({r.confidence.measuredChecks} of {r.confidence.totalChecks} check{r.confidence.totalChecks === 1 ? '' : 's'})
          </Text>
          {r.provisional === true
            ? (r.provisionalReasons ?? []).map((reason) => (
                <Text key={reason} style={{ ...styles.body, fontSize: 9 }}>
                  {reason}
                </Text>
              ))
            : null}
        </View>
        <View style={{ ...styles.panel, width: 190 }}>
          <Text style={styles.factLabel}>Fair market value, as it stands</Text>
          <Text style={{ fontSize: 20, fontWeight: 600, lineHeight: 1.2, ...styles.figures }}>{money(valuation?.fairMarketValue)}</Text>
          {[
            ['Orderly liquidation value', money(valuation?.orderlyLiquidationValue)],
            ['Forced liquidation value', money(valuation?.forcedLiquidationValue)],
            ['Repairs the findings call for', money(r.repairEstimate.total)],
          ].map(([label, value]) => (
            <View key={label} style={{ flexDirection: 'row', justifyContent: 'space-between', marginTop: 6, paddingTop: 5, borderTopWidth: 0.5, borderTopColor: COLOURS.line }}>
              <Text style={{ fontSize: 8.5, color: COLOURS.inkSoft }}>{label}</Text>
              <Text style={{ fontSize: 9.5, fontWeight: 500, ...styles.figures }}>{value}</Text>
            </View>
          ))}
          <Text style={{ ...styles.small, fontSize: 7, marginTop: 6 }}>Working on the valuation page.</Text>
        </View>
      </View>

      {r.safetyFindings.length > 0 ? (
        <View wrap={false} style={{ marginTop: 10, borderWidth: 1.25, borderColor: COLOURS.bandRebuild, borderRadius: 4, padding: 9 }}>
          <Text style={{ fontSize: 10.5, fontWeight: 700, color: COLOURS.bandRebuild }}>
            ! Fix before use: {r.safetyFindings.length} safety {r.safetyFindings.length === 1 ? 'finding' : 'findings'}
          </Text>
          {r.safetyFindings.map((f) => (
            <Text key={f.checkId} style={{ marginTop: 2 }}>
              • {pdfText(f.message)}
            </Text>
          ))}
          <Text style={{ ...styles.small, marginTop: 3 }}>Do not run the machine until each is put right by a competent person; electrical work by a qualified person only.</Text>
        </View>
      ) : null}

      <Text style={styles.h3}>The machine</Text>
      <View style={{ flexDirection: 'row', flexWrap: 'wrap', ...styles.rule, paddingBottom: 2 }}>
        <Fact width="25%" label="Swing over bed" value={mm(m.swingMm)} />
        <Fact width="25%" label="Between centres" value={mm(m.betweenCentresMm)} />
        <Fact width="25%" label="Spindle bore" value={mm(m.spindleBoreMm)} />
        <Fact width="25%" label="Motor" value={m.motorKw === null ? '—' : `${m.motorKw.toLocaleString('en-GB')} kW`} />
        <Fact width="25%" label="Year built" value={m.yearBuilt ? String(m.yearBuilt) : 'not known'} />
        <Fact width="25%" label="Serial number" value={m.serialNumber ?? 'not recorded'} />
        <Fact width="50%" label="Limits applied" value={pdfText(r.machine.sizeClass)} />
      </View>

      <Text style={styles.h3}>Subsystems</Text>
      {r.subsystems.map((s) => (
        <View key={s.id} wrap={false} style={{ flexDirection: 'row', alignItems: 'center', paddingVertical: 2.5, ...styles.rule }}>
          <Text style={{ width: 150 }}>{s.label}</Text>
          <View style={{ width: 150, height: 6, backgroundColor: COLOURS.paperSunken, marginRight: 10 }}>
            <View style={{ width: `${Math.max(0, Math.min(100, s.score ?? 0))}%`, height: 6, backgroundColor: gradeColour(s.grade) }} />
          </View>
          <Text style={{ width: 60, fontWeight: 600, color: gradeColour(s.grade) }}>{s.grade ?? 'Not assessed'}</Text>
          <Text style={{ width: 50, textAlign: 'right', ...styles.figures }}>{s.score === null ? '—' : `${shownScore(s.score, 1).toFixed(1)} / 100`}</Text>
          <Text style={{ width: 97, textAlign: 'right', color: COLOURS.inkSoft, ...styles.figures }}>
            {s.measuredChecks} of {s.totalChecks} check{s.totalChecks === 1 ? '' : 's'}
          </Text>
        </View>
      ))}

      <View wrap={false}>
      <Text style={styles.h3}>This document</Text>
      <View style={{ flexDirection: 'row', flexWrap: 'wrap' }}>
        <Fact width="25%" label="Report" value={`No. ${data.reportId}, version ${data.version}`} />
        <Fact width="25%" label="Inspected on" value={r.machine.inspectedOn ? formatDate(new Date(r.machine.inspectedOn)) : '—'} />
        <Fact width="25%" label="Inspector" value={data.inspectorName ?? '—'} />
        <Fact width="25%" label="Reviewed and released by" value={data.reviewerName ?? '—'} />
        <Fact width="25%" label="Released on" value={data.releasedAt ? formatDate(data.releasedAt) : 'draft, not released'} />
        <Fact width="25%" label="Verification code" value={data.verificationCode} />
        <Fact width="50%" label="Check this document is genuine and current at" value={data.verificationUrl} />
      </View>
      </View>
    </FramedPage>
  );
}
