import { Line, Path, Polygon, Rect, Svg, Text, View } from '@react-pdf/renderer';
import type { ClaimStatus } from '@/lib/decision/disclosure-contradictions';
import { COLOURS, styles } from './theme';

/** Each claim status: a word and a shape of its own (as on the report page), so it reads in greyscale print. */
export const CLAIM_LOOK: Readonly<Record<ClaimStatus, { word: string; colour: string }>> = {
  contradicted: { word: 'Contradicted by the findings', colour: COLOURS.bandRebuild },
  unconfirmed: { word: 'Only partly checked', colour: COLOURS.bandWorn },
  consistent: { word: 'Agrees with the findings', colour: COLOURS.bandTrue },
  'not-compared': { word: 'Not compared', colour: COLOURS.inkSoft },
};

/** Crossed square, triangle, tick, dash. */
function ClaimShape({ status, size }: { status: ClaimStatus; size: number }) {
  const c = CLAIM_LOOK[status].colour;
  return (
    <Svg width={size} height={size} viewBox="0 0 10 10">
      {status === 'contradicted' ? (
        <>
          <Rect x={0.3} y={0.3} width={9.4} height={9.4} fill={c} />
          <Line x1={2.6} y1={2.6} x2={7.4} y2={7.4} stroke={COLOURS.white} strokeWidth={1.5} />
          <Line x1={7.4} y1={2.6} x2={2.6} y2={7.4} stroke={COLOURS.white} strokeWidth={1.5} />
        </>
      ) : null}
      {status === 'unconfirmed' ? <Polygon points="5,0.4 9.7,9.4 0.3,9.4" fill={c} /> : null}
      {status === 'consistent' ? <Path d="M1.5 5.3 L4 7.8 L8.6 2.4" fill="none" stroke={c} strokeWidth={1.8} /> : null}
      {status === 'not-compared' ? <Line x1={1.5} y1={5} x2={8.5} y2={5} stroke={c} strokeWidth={1.8} /> : null}
    </Svg>
  );
}

export function ClaimStatusMark({ status }: { status: ClaimStatus }) {
  const look = CLAIM_LOOK[status];
  return (
    <View style={{ flexDirection: 'row', alignItems: 'center' }}>
      <ClaimShape status={status} size={8} />
      <Text style={{ ...styles.body, fontSize: 8.5, marginLeft: 4, color: look.colour, fontWeight: 600 }}>{look.word}</Text>
    </View>
  );
}
