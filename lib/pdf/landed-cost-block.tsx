import { Text, View } from '@react-pdf/renderer';
import type { ReleaseFacts } from '@/lib/decision/release-facts';
import { formatMoney } from '@/lib/format';
import type { ScoringResult } from '@/lib/scoring';
import { SectionHeading } from './page-frame';
import { pdfText } from './pdf-text';
import { reportLandedCost } from './report-landed-cost';
import { COLOURS, styles } from './theme';

/** Asking price to the machine standing in a shop, line by line, with the basis stated. */
export function LandedCostBlock({ facts, result, releasedAt }: { facts: ReleaseFacts | null; result: ScoringResult; releasedAt: Date | null }) {
  if (!facts) {
    return (
      <View style={{ marginTop: 14 }}>
        <SectionHeading eyebrow="Landed cost" title="What the machine costs in your shop" intro="This version was released before the listing’s facts were kept with each report; the report page works the landed cost out for your shop." />
      </View>
    );
  }
  const { cost, rigging, assumptions } = reportLandedCost(facts.landedCostBasis, result, releasedAt);
  const c = facts.landedCostBasis.currency;
  return (
    <View style={{ marginTop: 14 }}>
      <SectionHeading eyebrow="Landed cost" title="What the machine costs in a shop, on the report’s basis" />
      {cost.lines.map((line) => (
        <View key={line.id} wrap={false} style={{ flexDirection: 'row', paddingVertical: 2.5, ...styles.rule }}>
          <Text style={{ width: '75%' }}>
            {pdfText(line.label)}
            {line.id === 'rigging' && rigging ? (
              <Text style={{ fontSize: 8, color: COLOURS.inkSoft }}>
                {'  '}handling {formatMoney(rigging.handling.amountMinor, c)} + transport {formatMoney(rigging.transport.amountMinor, c)}
              </Text>
            ) : null}
            {line.note ? <Text style={{ fontSize: 8, color: COLOURS.inkSoft }}>{`  ${pdfText(line.note)}`}</Text> : null}
          </Text>
          <Text style={{ width: '25%', textAlign: 'right', ...styles.figures }}>{line.amount ? formatMoney(line.amount.amountMinor, c) : 'not known'}</Text>
        </View>
      ))}
      <View wrap={false} style={{ flexDirection: 'row', paddingTop: 4, borderTopWidth: 1, borderTopColor: COLOURS.lineStrong }}>
        <Text style={{ width: '75%', fontWeight: 600 }}>{cost.notKnown.length ? 'Landed cost, at least' : 'Landed cost'}</Text>
        <Text style={{ width: '25%', textAlign: 'right', fontSize: 12, fontWeight: 600, ...styles.figures }}>{formatMoney(cost.total.amountMinor, c)}</Text>
      </View>
      {cost.notKnown.length ? <Text style={{ ...styles.small, marginTop: 2 }}>Not in the total: {pdfText(cost.notKnown.join(', '))}.</Text> : null}
      <View style={{ marginTop: 8, borderLeftWidth: 2, borderLeftColor: COLOURS.lineStrong, paddingLeft: 8 }}>
        <Text style={{ fontWeight: 600, marginBottom: 2 }}>The basis of these figures</Text>
        {assumptions.map((a) => (
          <Text key={a} style={{ fontSize: 8, marginBottom: 1.5 }}>
            • {pdfText(a)}
          </Text>
        ))}
      </View>
    </View>
  );
}
