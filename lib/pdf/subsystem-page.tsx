import { Text, View } from '@react-pdf/renderer';
import type { CheckResult, SubsystemResult } from '@/lib/scoring';
import { AlignmentPlot } from './alignment-plot';
import { BedProfilePlot } from './bed-profile-plot';
import { WearProfilePlot } from './wear-profile-plot';
import { CheckTable } from './check-table';
import { gradeColour } from './condition-scale-mark';
import { FramedPage, type FrameFacts } from './page-frame';
import { pdfText } from './pdf-text';
import type { ReportDocumentData } from './report-document-data';
import { COLOURS, styles } from './theme';
import { ThermalStatesBlock } from './thermal-states-block';
import { shownScore } from '@/lib/scoring/grading/condition-scale';

/** One subsystem: its grade, how it was reached, every check, and the plots that belong to it. */
export function SubsystemPage({
  subsystem,
  position,
  count,
  data,
  frame,
}: {
  subsystem: SubsystemResult;
  position: number;
  count: number;
  data: ReportDocumentData;
  frame: FrameFacts;
}) {
  const checks: CheckResult[] = data.result.checks.filter((c) => c.subsystem === subsystem.id);
  const worst = checks.find((c) => c.id === subsystem.worstCheckId);
  const profile = data.result.plots.bedProfile;
  return (
    <FramedPage frame={frame} bookmark={subsystem.label} continuedTitle={subsystem.label}>
      <Text style={styles.eyebrow}>
        Subsystem {position} of {count}
      </Text>
      <View style={{ flexDirection: 'row', justifyContent: 'space-between', alignItems: 'flex-end', marginTop: 2, marginBottom: 6 }}>
        <Text style={{ ...styles.h1, fontSize: 18 }}>{subsystem.label}</Text>
        <View style={{ alignItems: 'flex-end' }}>
          <Text style={{ fontSize: 15, fontWeight: 600, lineHeight: 1.2, color: gradeColour(subsystem.grade) }}>{subsystem.grade ?? 'Not assessed'}</Text>
          <Text style={{ ...styles.small, ...styles.figures }}>
            {subsystem.score === null ? 'no score' : `score ${shownScore(subsystem.score, 1).toFixed(1)} of 100`} · {subsystem.measuredChecks} of {subsystem.totalChecks} check{subsystem.totalChecks === 1 ? '' : 's'} measured
          </Text>
        </View>
      </View>
      <View style={{ ...styles.panel, marginBottom: 10, borderLeftWidth: 3, borderLeftColor: gradeColour(subsystem.grade) }}>
        <Text>{pdfText(subsystem.explanation)}</Text>
        {worst && worst.band && worst.band !== 'sharp' && worst.band !== 'in-limit' ? (
          <Text style={{ marginTop: 3, color: COLOURS.inkSoft }}>Weakest point: {pdfText(worst.explanation.text.split('. Permissible')[0] ?? worst.label)}.</Text>
        ) : null}
      </View>
      {data.releaseFacts ? <ThermalStatesBlock states={data.releaseFacts.thermalStates} subsystemId={subsystem.id} result={data.result} /> : null}
      <CheckTable checks={checks} />
      {subsystem.id === 'bed-and-ways' && profile ? <BedProfilePlot profile={profile} /> : null}
      {/* Results from before scoring 1.1 have no wear series. */}
      {subsystem.id === 'bed-and-ways' && data.result.plots.bedWear ? <WearProfilePlot wear={data.result.plots.bedWear} xMaxMm={profile ? Math.max(...profile.points.map((p) => p.x)) : null} /> : null}
      {subsystem.id === 'tailstock' ? <AlignmentPlot checks={checks} /> : null}
    </FramedPage>
  );
}
