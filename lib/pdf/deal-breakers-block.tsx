import { Text, View } from '@react-pdf/renderer';
import type { ScoringResult } from '@/lib/scoring';
import { pdfText } from './pdf-text';
import { COLOURS } from './theme';

/**
 * The deal-breakers, drawn at the very top of the cover whatever the grade, so a good average
 * never hides a cracked casting or a broken gear. Results stored before scoring 1.1 have none.
 */
export function DealBreakersBlock({ result }: { result: ScoringResult }) {
  const found = result.dealBreakers ?? [];
  if (found.length === 0) return null;
  return (
    <View wrap={false} style={{ marginTop: 6, borderWidth: 1.5, borderColor: COLOURS.bandRebuild, borderRadius: 4, paddingHorizontal: 8, paddingVertical: 5 }}>
      <Text style={{ fontSize: 11, fontWeight: 700, color: COLOURS.bandRebuild }}>
        ! Deal-breaker{found.length === 1 ? '' : 's'}: {found.length} found, whatever the grade below
      </Text>
      {found.map((d) => (
        <Text key={d.id} style={{ marginTop: 1 }}>
          <Text style={{ fontWeight: 600 }}>• {pdfText(d.label)}: </Text>
          <Text style={{ color: COLOURS.inkSoft }}>{pdfText(d.evidence)}</Text>
        </Text>
      ))}
    </View>
  );
}
