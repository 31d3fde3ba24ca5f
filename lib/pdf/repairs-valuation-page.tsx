import { Text, View } from '@react-pdf/renderer';
import { formatMoney } from '@/lib/format';
import type { Money, ScoringResult } from '@/lib/scoring';
import { FramedPage, SectionHeading, type FrameFacts } from './page-frame';
import { pdfText } from './pdf-text';
import { COLOURS, styles } from './theme';

function money(m: Money | null | undefined) {
  return m ? formatMoney(m.amountMinor, m.currency) : '—';
}

const VALUE_DEFINITIONS = [
  ['Fair market value', 'the price a willing buyer and a willing seller would agree, neither compelled, both knowing the facts in this report'],
  ['Orderly liquidation value', 'what a sale would bring when the seller must sell but has a reasonable time to find a buyer'],
  ['Forced liquidation value', 'what an auction held now would bring'],
] as const;

function WorkingLine({ line, index }: { line: string; index: number }) {
  return (
    <View wrap={false} style={{ flexDirection: 'row', marginBottom: 1.5 }}>
      <Text style={{ width: 16, color: COLOURS.inkFaint, ...styles.figures }}>{index + 1}.</Text>
      <Text style={{ flex: 1, ...styles.figures }}>{pdfText(line)}</Text>
    </View>
  );
}

/** Numbered working; the title stays with its first lines so it never ends a page alone. */
function Working({ title, lines }: { title: string; lines: readonly string[] }) {
  return (
    <View style={{ marginTop: 8 }}>
      <View wrap={false}>
        <Text style={{ fontWeight: 600, marginBottom: 2 }}>{title}</Text>
        {lines.slice(0, 2).map((line, i) => (
          <WorkingLine key={i} line={line} index={i} />
        ))}
      </View>
      {lines.slice(2).map((line, i) => (
        <WorkingLine key={i + 2} line={line} index={i + 2} />
      ))}
    </View>
  );
}

/** What the findings cost to put right, and what the machine is worth as it stands, with the working. */
export function RepairsValuationPage({ result, frame }: { result: ScoringResult; frame: FrameFacts }) {
  const labelOf = (id: string) => result.checks.find((c) => c.id === id)?.label ?? id;
  const { repairEstimate: repairs, valuation } = result;
  const headline = valuation.reconciliation ?? valuation.costApproach;
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
        <SectionHeading
          eyebrow="Money"
          title="Valuation"
          intro="What the machine is worth as it stands on the inspection date, by the cost approach and, where enough recent sales are known, by comparison with them."
        />
      </View>
      <View wrap={false} style={{ flexDirection: 'row', justifyContent: 'space-between' }}>
        {[
          ['Fair market value', headline?.fairMarketValue],
          ['Orderly liquidation value', headline?.orderlyLiquidationValue],
          ['Forced liquidation value', headline?.forcedLiquidationValue],
        ].map(([label, value], i) => (
          <View key={String(label)} style={{ ...styles.panel, width: '32%', borderTopWidth: i === 0 ? 2.5 : 0, borderTopColor: COLOURS.copper }}>
            <Text style={styles.factLabel}>{String(label)}</Text>
            <Text style={{ fontSize: i === 0 ? 16 : 13, fontWeight: 600, ...styles.figures }}>{money(value as Money | undefined)}</Text>
          </View>
        ))}
      </View>
      <View style={{ marginTop: 6 }}>
        {VALUE_DEFINITIONS.map(([term, meaning]) => (
          <Text key={term} style={{ ...styles.small }}>
            <Text style={{ fontWeight: 600 }}>{term}</Text>: {meaning}.
          </Text>
        ))}
      </View>

      {valuation.costApproach ? (
        <View>
          <Working title="Cost approach: replacement cost new, less wear and age, less repairs" lines={valuation.costApproach.working} />
        </View>
      ) : null}
      {valuation.salesComparison ? (
        <View>
          <Working title="Sales comparison: recent sales of similar machines, adjusted" lines={valuation.salesComparison.working} />
        </View>
      ) : null}
      {valuation.reconciliation ? <Working title="Reconciliation" lines={valuation.reconciliation.working} /> : null}
      {valuation.notes.length ? <Working title="Notes" lines={valuation.notes} /> : null}
    </FramedPage>
  );
}
