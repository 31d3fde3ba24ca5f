import { Circle, Line, Polygon, Rect, Svg, Text, View } from '@react-pdf/renderer';
import { BAND_TABLE, type CheckBand } from '@/lib/scoring';
import { COLOURS, styles } from './theme';

export type BandOrUnmeasured = CheckBand | 'not-measured';

/** Each band has a colour, a word and a shape of its own, so it reads in greyscale print too. */
export const BAND_LOOK: Readonly<Record<BandOrUnmeasured, { colour: string; word: string }>> = {
  sharp: { colour: COLOURS.bandTrue, word: BAND_TABLE[0]!.label },
  'in-limit': { colour: COLOURS.bandTrue, word: BAND_TABLE[1]!.label },
  serviceable: { colour: COLOURS.bandFair, word: BAND_TABLE[2]!.label },
  worn: { colour: COLOURS.bandWorn, word: BAND_TABLE[3]!.label },
  unfit: { colour: COLOURS.bandRebuild, word: BAND_TABLE[4]!.label },
  'not-measured': { colour: COLOURS.bandUnknown, word: 'Not measured' },
};

/** The shape alone: filled circle, ring, diamond, triangle, crossed square, dashed ring. */
export function BandShape({ band, size = 8 }: { band: BandOrUnmeasured; size?: number }) {
  const c = BAND_LOOK[band].colour;
  const s = 10;
  return (
    <Svg width={size} height={size} viewBox={`0 0 ${s} ${s}`}>
      {band === 'sharp' ? <Circle cx={5} cy={5} r={4.5} fill={c} /> : null}
      {band === 'in-limit' ? <Circle cx={5} cy={5} r={3.8} fill="none" stroke={c} strokeWidth={1.6} /> : null}
      {band === 'serviceable' ? <Polygon points="5,0.3 9.7,5 5,9.7 0.3,5" fill={c} /> : null}
      {band === 'worn' ? <Polygon points="5,0.4 9.7,9.4 0.3,9.4" fill={c} /> : null}
      {band === 'unfit' ? (
        <>
          <Rect x={0.3} y={0.3} width={9.4} height={9.4} fill={c} />
          <Line x1={2.6} y1={2.6} x2={7.4} y2={7.4} stroke={COLOURS.white} strokeWidth={1.5} />
          <Line x1={7.4} y1={2.6} x2={2.6} y2={7.4} stroke={COLOURS.white} strokeWidth={1.5} />
        </>
      ) : null}
      {band === 'not-measured' ? <Circle cx={5} cy={5} r={3.8} fill="none" stroke={c} strokeWidth={1.2} strokeDasharray="1.6,1.4" /> : null}
    </Svg>
  );
}

/** Shape and word together, in the band's colour. */
export function BandMark({ band, size = 8, fontSize = 8.5 }: { band: BandOrUnmeasured; size?: number; fontSize?: number }) {
  const look = BAND_LOOK[band];
  return (
    <View style={{ flexDirection: 'row', alignItems: 'center' }}>
      <BandShape band={band} size={size} />
      <Text style={{ ...styles.body, fontSize, marginLeft: 4, color: look.colour, fontWeight: 600 }}>{look.word}</Text>
    </View>
  );
}
