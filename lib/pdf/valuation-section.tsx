import { Text, View } from '@react-pdf/renderer';
import { formatMoney } from '@/lib/format';
import { gridPercent, type AdjustedSale, type GridAdjustment, type Money, type ScoringResult, type Valuation } from '@/lib/scoring';
import { SectionHeading } from './page-frame';
import { pdfText } from './pdf-text';
import { COLOURS, styles } from './theme';

function money(m: Money | null | undefined) {
  return m ? formatMoney(m.amountMinor, m.currency) : '—';
}

const VALUE_DEFINITIONS = [
  ['Fair market value', 'the price a willing buyer and a willing seller would agree, neither compelled, both knowing the facts in this report'],
  ['Orderly liquidation value', 'what a sale would bring when the seller must sell but has a reasonable time to find a buyer'],
  ['Forced liquidation value', 'what an auction held now would bring, the buyer taking the machine away as it stands'],
] as const;

const GRID_COLUMNS: readonly { factor: GridAdjustment['factor']; label: string }[] = [
  { factor: 'size', label: 'Size' },
  { factor: 'age', label: 'Age' },
  { factor: 'condition', label: 'Grade' },
  { factor: 'tooling', label: 'Tooling' },
  { factor: 'sale-kind', label: 'Kind' },
  { factor: 'time', label: 'Time' },
];

const KIND_WORDS: Record<string, string> = { dealer_retail: 'dealer retail', private: 'private sale', auction: 'auction', liquidation: 'liquidation' };

function WorkingLine({ line, index }: { line: string; index: number }) {
  return (
    <View wrap={false} style={{ flexDirection: 'row', marginBottom: 1.5 }}>
      <Text style={{ width: 16, color: COLOURS.inkFaint, ...styles.figures }}>{index + 1}.</Text>
      <Text style={{ flex: 1, ...styles.figures }}>{pdfText(line)}</Text>
    </View>
  );
}

/** Numbered working; the title stays with its first lines so it never ends a page alone. */
export function Working({ title, lines }: { title: string; lines: readonly string[] }) {
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

function Fact({ label, value, width }: { label: string; value: string; width: string }) {
  return (
    <View style={{ width, paddingRight: 6 }}>
      <Text style={styles.factLabel}>{label}</Text>
      <Text style={{ fontSize: 9, fontWeight: 500 }}>{pdfText(value)}</Text>
    </View>
  );
}

const cell = (width: string, right = false) => ({ width, paddingRight: 4, textAlign: right ? ('right' as const) : ('left' as const), ...styles.figures });
const head = (width: string, right = false) => ({ ...cell(width, right), fontSize: 7, fontWeight: 600, color: COLOURS.inkSoft });

/** The adjustment grid: each sale, each adjustment as a change in per cent, the adjusted price and its weight; the basis of every adjustment under it. */
function SalesGrid({ rows }: { rows: readonly AdjustedSale[] }) {
  return (
    <View style={{ marginTop: 6 }}>
      <View wrap={false} style={{ flexDirection: 'row', paddingBottom: 3, borderBottomWidth: 1, borderBottomColor: COLOURS.lineStrong }}>
        <Text style={head('24%')}>Sale</Text>
        <Text style={head('10%', true)}>Price</Text>
        {GRID_COLUMNS.map((c) => (
          <Text key={c.factor} style={head('7.5%', true)}>
            {c.label}
          </Text>
        ))}
        <Text style={head('11%', true)}>Adjusted</Text>
        <Text style={head('10%', true)}>Weight</Text>
      </View>
      {rows.map((row, i) => {
        const grid = row.grid ?? [];
        const by = new Map(grid.map((g) => [g.factor, g]));
        return (
          <View key={i} wrap={false} style={{ paddingVertical: 2.5, ...styles.rule }}>
            <View style={{ flexDirection: 'row', fontSize: 8 }}>
              <Text style={{ ...cell('24%'), fontSize: 7.5 }}>{pdfText(row.description.replace(/^#\d+\s*/, ''))}</Text>
              <Text style={cell('10%', true)}>{money(row.price)}</Text>
              {GRID_COLUMNS.map((c) => {
                const g = by.get(c.factor);
                return (
                  <Text key={c.factor} style={cell('7.5%', true)}>
                    {g ? (g.multiplier === 1 ? '0' : gridPercent(g.multiplier)) : '—'}
                  </Text>
                );
              })}
              <Text style={{ ...cell('11%', true), fontWeight: 600 }}>{money(row.adjusted)}</Text>
              <Text style={{ ...cell('10%', true), color: row.outlier ? COLOURS.copper : COLOURS.ink }}>
                {row.outlier ? 'outlier, left out' : row.weight === undefined ? '—' : `${(row.weight * 100).toFixed(1)} %`}
              </Text>
            </View>
            {grid.length ? (
              <Text style={{ fontSize: 6.5, color: COLOURS.inkSoft, marginTop: 1 }}>
                {pdfText(
                  [row.saleKind ? KIND_WORDS[row.saleKind] : null, row.soldOn ? `sold ${row.soldOn}` : null, ...grid.filter((g) => g.multiplier !== 1).map((g) => `${g.factor}: ${g.basis}`)]
                    .filter(Boolean)
                    .join(' · '),
                )}
              </Text>
            ) : null}
          </View>
        );
      })}
    </View>
  );
}

export interface AppraisalSigners {
  inspectorName: string | null;
  reviewerName: string | null;
  releasedAt: Date | null;
}

/**
 * The valuation as a signed appraisal: premise, effective date and currency; the values (a range
 * when too little was measured); the sales comparison grid; the cost approach, liquidation
 * evidence and reconciliation with their working; and the statement the signers stand behind.
 * Results stored before the grid existed print what they have.
 */
export function ValuationSection({ result, signers }: { result: ScoringResult; signers: AppraisalSigners }) {
  const valuation = result.valuation as Partial<Valuation> & Pick<Valuation, 'currency' | 'costApproach' | 'salesComparison' | 'reconciliation' | 'notes'>;
  const headline = valuation.reconciliation ?? valuation.costApproach;
  const range = valuation.range ?? null;
  const effective = valuation.effectiveDate ?? result.machine.inspectedOn;
  const measured = `${(result.confidence.value * 100).toFixed(1)} % of the check weight`;
  const olvBasis = valuation.orderlyLiquidation?.basis === 'comparable-sales' ? 'from auction sales' : 'fallback ratio of FMV';
  const flvBasis = valuation.forcedLiquidation?.basis === 'comparable-sales' ? 'from liquidation sales' : 'fallback ratio of FMV';
  return (
    <View>
      <SectionHeading
        eyebrow="Money"
        title="Valuation"
        intro="Waygrade's opinion of what the machine is worth, worked by comparison with recent sales of similar lathes and by the cost approach, with every step shown."
      />
      <View wrap={false} style={{ ...styles.panel, flexDirection: 'row', flexWrap: 'wrap', marginBottom: 6 }}>
        <Fact label="Premise of value" value={valuation.premise?.label ?? 'Fair market value, as is, where is'} width="40%" />
        <Fact label="Effective date" value={effective ?? 'date of this report'} width="18%" />
        <Fact label="Currency" value={valuation.currency} width="12%" />
        <Fact label="Grade valued" value={valuation.conditionValued ?? result.overall.condition ?? 'not graded'} width="14%" />
        <Fact label="Measured" value={measured} width="16%" />
      </View>
      {valuation.premise?.id === 'parts-or-rebuild' ? (
        <Text style={{ marginBottom: 6, color: COLOURS.copper }}>
          {pdfText(valuation.premise.explanation)}
        </Text>
      ) : null}
      <View wrap={false} style={{ flexDirection: 'row', justifyContent: 'space-between' }}>
        {(
          [
            ['Fair market value', range ? `${money(range.low)} – ${money(range.high)}` : money(headline?.fairMarketValue), range ? 'a range: see below' : 'reconciled'],
            ['Orderly liquidation value', money(headline?.orderlyLiquidationValue), olvBasis],
            ['Forced liquidation value', money(headline?.forcedLiquidationValue), flvBasis],
          ] as const
        ).map(([label, value, basis], i) => (
          <View key={label} style={{ ...styles.panel, width: '32%', borderTopWidth: i === 0 ? 2.5 : 0, borderTopColor: COLOURS.copper }}>
            <Text style={styles.factLabel}>{label}</Text>
            <Text style={{ fontSize: i === 0 ? (range ? 12 : 16) : 13, fontWeight: 600, ...styles.figures, lineHeight: 1.3, marginBottom: 1 }}>{value}</Text>
            <Text style={{ ...styles.small, fontSize: 7 }}>{basis}</Text>
          </View>
        ))}
      </View>
      {range ? <Text style={{ marginTop: 4 }}>{pdfText(range.explanation)}</Text> : null}
      <View style={{ marginTop: 6 }}>
        {VALUE_DEFINITIONS.map(([term, meaning]) => (
          <Text key={term} style={{ ...styles.small }}>
            <Text style={{ fontWeight: 600 }}>{term}</Text>: {meaning}.
          </Text>
        ))}
      </View>

      {valuation.salesComparison ? (
        <View style={{ marginTop: 8 }}>
          <Text style={styles.h3} minPresenceAhead={60}>
            Sales comparison, the primary approach
          </Text>
          <Text style={styles.small}>
            Each sale&apos;s price is brought to this machine: size by the replacement cost of the two sizes, age by build year, grade, tooling sold with it, the kind of
            sale (brought to a private sale between willing parties) and the months since it was sold. Figures are the change each adjustment makes; its basis is under the
            sale. Sales closer to this machine weigh more; a sale far from the rest is shown and left out.
          </Text>
          <SalesGrid rows={valuation.salesComparison.adjustedPrices} />
          <Working title="Sales comparison: the working" lines={valuation.salesComparison.working.slice(-2)} />
        </View>
      ) : null}
      {valuation.costApproach ? <Working title="Cost approach, by breakdown: replacement cost new, less the cost to cure, less age on the rest" lines={valuation.costApproach.working} /> : null}
      {valuation.orderlyLiquidation?.working.length ? <Working title="Orderly liquidation value from auction sales" lines={valuation.orderlyLiquidation.working} /> : null}
      {valuation.forcedLiquidation?.working.length ? <Working title="Forced liquidation value from liquidation sales" lines={valuation.forcedLiquidation.working} /> : null}
      {valuation.reconciliation ? <Working title="Reconciliation" lines={valuation.reconciliation.working} /> : null}
      {valuation.notes.length ? <Working title="Notes" lines={valuation.notes} /> : null}

      <View wrap={false} style={{ marginTop: 12, paddingTop: 8, borderTopWidth: 1, borderTopColor: COLOURS.ink }}>
        <Text style={{ fontWeight: 600, marginBottom: 3 }}>Statement</Text>
        <Text style={{ marginBottom: 3 }}>
          {pdfText(
            `The values above are our opinion of what this machine was worth on ${effective ?? 'the date of this report'}, in ${valuation.currency}, on the premise stated, from the condition we measured, the repairs those findings call for and the sales listed. Where a figure rests on a rule of practice or is recalled rather than published, the working says so. Checks we could not measure are taken at their worst, never at their best.`,
          )}
        </Text>
        <Text style={{ marginBottom: 3 }}>
          Waygrade has no interest in this machine or its sale, and its fee does not depend on the value. A value is not an offer to buy or sell, nor a quotation for
          repairs; it does not replace local codes, the maker&apos;s instructions or licensed practice.
        </Text>
        <View style={{ flexDirection: 'row', marginTop: 6 }}>
          <Fact label="Inspected by" value={signers.inspectorName ?? '—'} width="34%" />
          <Fact label="Reviewed by" value={signers.reviewerName ?? '—'} width="33%" />
          <Fact label="Signed on release" value={signers.releasedAt ? signers.releasedAt.toISOString().slice(0, 10) : 'not yet released'} width="33%" />
        </View>
      </View>
    </View>
  );
}
