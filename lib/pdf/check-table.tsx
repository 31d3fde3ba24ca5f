import { Text, View } from '@react-pdf/renderer';
import type { CheckResult } from '@/lib/scoring';
import { BandMark } from './band-mark';
import { measuredText, permissibleText, ratioText } from './check-figures';
import { pdfText } from './pdf-text';
import { COLOURS, styles } from './theme';

const COLUMNS = { check: '45%', measured: '15%', permissible: '15%', q: '8%', band: '17%' } as const;

function HeaderCell({ width, children, right }: { width: string; children: string; right?: boolean }) {
  return <Text style={{ width, fontSize: 7.5, fontWeight: 600, color: COLOURS.inkSoft, textAlign: right ? 'right' : 'left', paddingRight: 6 }}>{children}</Text>;
}

/** One row per check: what was measured against what is allowed, the ratio, the band and the limit's source. */
export function CheckTable({ checks }: { checks: readonly CheckResult[] }) {
  return (
    <View>
      <View fixed style={{ flexDirection: 'row', paddingBottom: 3, borderBottomWidth: 1, borderBottomColor: COLOURS.lineStrong }}>
        <HeaderCell width={COLUMNS.check}>Check, and source of the limit</HeaderCell>
        <HeaderCell width={COLUMNS.measured} right>
          Measured
        </HeaderCell>
        <HeaderCell width={COLUMNS.permissible} right>
          Permissible
        </HeaderCell>
        <HeaderCell width={COLUMNS.q} right>
          q
        </HeaderCell>
        <HeaderCell width={COLUMNS.band}>Band</HeaderCell>
      </View>
      {checks.map((check) => {
        const measured = measuredText(check);
        const permissible = permissibleText(check);
        const unmeasured = check.status === 'not-measured';
        return (
          <View key={check.id} wrap={false} style={{ flexDirection: 'row', paddingVertical: 4, ...styles.rule }}>
            <View style={{ width: COLUMNS.check, paddingRight: 8 }}>
              <Text style={{ fontWeight: 500 }}>{pdfText(check.label)}</Text>
              {unmeasured ? (
                <Text style={{ ...styles.small, fontSize: 7 }}>{pdfText(check.explanation.text)}</Text>
              ) : (
                <>
                  {permissible.basis && permissible.basis !== permissible.main ? (
                    <Text style={{ ...styles.small, fontSize: 7, color: COLOURS.ink }}>Limit: {permissible.basis}</Text>
                  ) : null}
                  <Text style={{ ...styles.small, fontSize: 7 }}>{pdfText(check.explanation.source)}</Text>
                </>
              )}
            </View>
            <View style={{ width: COLUMNS.measured, paddingRight: 6 }}>
              <Text style={{ textAlign: 'right', ...styles.figures }}>{measured.main}</Text>
              {measured.note ? <Text style={{ ...styles.small, fontSize: 7, textAlign: 'right' }}>{measured.note}</Text> : null}
            </View>
            <View style={{ width: COLUMNS.permissible, paddingRight: 6 }}>
              <Text style={{ textAlign: 'right', ...styles.figures, ...(permissible.isFigure ? {} : { fontSize: 8 }) }}>{permissible.main}</Text>
            </View>
            <Text style={{ width: COLUMNS.q, textAlign: 'right', paddingRight: 6, ...styles.figures }}>{ratioText(check)}</Text>
            <View style={{ width: COLUMNS.band, paddingTop: 1.5 }}>
              <BandMark band={check.band ?? 'not-measured'} />
            </View>
          </View>
        );
      })}
    </View>
  );
}
