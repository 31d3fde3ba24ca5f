import { Text, View } from '@react-pdf/renderer';
import { assessDisclosure } from '@/lib/decision/disclosure-contradictions';
import type { ReleaseFacts } from '@/lib/decision/release-facts';
import { formatDate } from '@/lib/format';
import type { ScoringResult } from '@/lib/scoring';
import { ClaimStatusMark } from './claim-status-mark';
import { SectionHeading } from './page-frame';
import { pdfText } from './pdf-text';
import { COLOURS, styles } from './theme';

const HEAD = { fontSize: 7.5, fontWeight: 600, color: COLOURS.inkSoft } as const;

/**
 * The seller's answers to the disclosure questions, as kept with this version at release, each
 * beside what the inspection found. Only claims a finding bears on are compared; the others are
 * printed as stated, never marked true.
 */
export function DisclosureBlock({ facts, result }: { facts: ReleaseFacts | null; result: ScoringResult }) {
  const disclosure = facts?.disclosure ?? null;
  const assessments = disclosure ? assessDisclosure(disclosure, result, facts!.landedCostBasis.nameplate) : [];
  const contradicted = assessments.filter((a) => a.status === 'contradicted').length;
  const intro = !facts
    ? 'This version was released before the seller’s answers were kept with each report, so none are printed.'
    : !disclosure
      ? 'The seller had not answered the disclosure questions when this version was released.'
      : `Answers as given on ${formatDate(new Date(disclosure.answeredAt))} and kept with this version at release. ${
          contradicted === 0 ? 'No claim is contradicted by the findings.' : `${contradicted} ${contradicted === 1 ? 'claim is' : 'claims are'} contradicted by the findings.`
        }`;
  return (
    <View>
      <SectionHeading eyebrow="Disclosure" title="The seller’s claims beside the findings" intro={intro} />
      {assessments.length ? (
        <>
          <View style={{ flexDirection: 'row', paddingBottom: 3, borderBottomWidth: 1, borderBottomColor: COLOURS.lineStrong }}>
            <Text style={{ ...HEAD, width: '22%' }}>Question</Text>
            <Text style={{ ...HEAD, width: '33%' }}>The seller’s answer</Text>
            <Text style={{ ...HEAD, width: '45%' }}>Against the findings</Text>
          </View>
          {assessments.map((a) => (
            <View key={a.claimId} wrap={false} style={{ flexDirection: 'row', paddingVertical: 3, ...styles.rule }}>
              <Text style={{ width: '22%', paddingRight: 6, fontWeight: 600 }}>{pdfText(a.question)}</Text>
              <Text style={{ width: '33%', paddingRight: 6 }}>{pdfText(a.claim)}</Text>
              <View style={{ width: '45%' }}>
                <ClaimStatusMark status={a.status} />
                {/* One run of text, so a long list of findings keeps the page short. */}
                {a.findings.length ? <Text style={{ fontSize: 8, color: COLOURS.inkSoft }}>{pdfText(a.findings.join('; '))}</Text> : null}
              </View>
            </View>
          ))}
        </>
      ) : null}
    </View>
  );
}
