import { Text, View } from '@react-pdf/renderer';
import { formatMoney } from '@/lib/format';
import type { Money, ScoringResult } from '@/lib/scoring';
import { FramedPage, SectionHeading, type FrameFacts } from './page-frame';
import { pdfText } from './pdf-text';
import { COLOURS, styles } from './theme';
import { ValuationSection, type AppraisalSigners } from './valuation-section';

function money(m: Money | null | undefined) {
  return m ? formatMoney(m.amountMinor, m.currency) : '—';
}

/** What the findings cost to put right, then the valuation as a signed appraisal. */
export function RepairsValuationPage({ result, frame, signers }: { result: ScoringResult; frame: FrameFacts; signers: AppraisalSigners }) {
  const labelOf = (id: string) => result.checks.find((c) => c.id === id)?.label ?? id;
  const { repairEstimate: repairs } = result;
  return (
    <FramedPage frame={frame} bookmark="Repairs and valuation">
      <SectionHeading eyebrow="Money" title="Repair estimate" intro={pdfText(repairs.explanation)} />
      <View style={{ flexDirection: 'row', paddingBottom: 3, borderBottomWidth: 1, borderBottomColor: COLOURS.lineStrong }}>
        <Text style={{ width: '45%', fontSize: 7.5, fontWeight: 600, color: COLOURS.inkSoft }}>Repair</Text>
        <Text style={{ width: '40%', fontSize: 7.5, fontWeight: 600, color: COLOURS.inkSoft }}>Called for by</Text>
        <Text style={{ width: '15%', fontSize: 7.5, fontWeight: 600, color: COLOURS.inkSoft, textAlign: 'right' }}>Cost</Text>
      </View>
      {repairs.lines.length === 0 ? <Text style={{ paddingVertical: 4, color: COLOURS.inkSoft }}>No finding calls for a repair.</Text> : null}
      {repairs.lines.map((line) => (
        <View key={line.actionId} wrap={false} style={{ flexDirection: 'row', paddingVertical: 3, ...styles.rule }}>
          <Text style={{ width: '45%', paddingRight: 8 }}>{pdfText(line.label)}</Text>
          <Text style={{ width: '40%', paddingRight: 8, fontSize: 8, color: COLOURS.inkSoft }}>{pdfText(line.triggeredBy.map(labelOf).join('; '))}</Text>
          <Text style={{ width: '15%', textAlign: 'right', ...styles.figures }}>{money(line.cost)}</Text>
        </View>
      ))}
      <View wrap={false} style={{ flexDirection: 'row', paddingVertical: 4, borderTopWidth: 1, borderTopColor: COLOURS.ink }}>
        <Text style={{ width: '85%', fontWeight: 600 }}>Total repair estimate</Text>
        <Text style={{ width: '15%', textAlign: 'right', fontWeight: 600, ...styles.figures }}>{money(repairs.total)}</Text>
      </View>
      <Text style={{ ...styles.small, marginTop: 2 }}>
        Costs are typical workshop prices from Waygrade&apos;s repair catalogue ({repairs.catalogueId}); quotes from a repairer may differ.
      </Text>

      <View break>
        <ValuationSection result={result} signers={signers} />
      </View>
    </FramedPage>
  );
}
