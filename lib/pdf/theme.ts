import { StyleSheet } from '@react-pdf/renderer';
import { REPORT_FONT } from './fonts';

// The product's palette (tailwind.config.ts) for print: warm paper, graphite ink, one copper accent.
export const COLOURS = {
  paper: '#f7f5f0',
  paperSunken: '#eeebe3',
  white: '#ffffff',
  ink: '#1f2a30',
  inkSoft: '#46545c',
  // As the web's ink-faint: dark enough for 4.5:1 on white and on paper.
  inkFaint: '#5f6b71',
  line: '#d9d4c8',
  lineStrong: '#b9b2a3',
  copper: '#a4481f',
  copperLight: '#f3e2d8',
  bandTrue: '#25613f',
  bandFair: '#4d6a1c',
  bandWorn: '#8a5a00',
  bandRebuild: '#9d2f22',
  bandUnknown: '#5d6a71',
} as const;

/** A4 in points, with the margins the page frame reserves for its header and footer. */
export const PAGE = { width: 595.28, height: 841.89, marginX: 44, marginTop: 64, marginBottom: 58 } as const;
export const CONTENT_WIDTH = PAGE.width - 2 * PAGE.marginX;

// Figures line up in columns: tabular numerals wherever a number is printed.
const FIGURES = { fontFeatureSettings: ['tnum' as const] };

export const styles = StyleSheet.create({
  page: {
    fontFamily: REPORT_FONT,
    fontSize: 9.5,
    lineHeight: 1.4,
    color: COLOURS.ink,
    backgroundColor: COLOURS.white,
    paddingTop: PAGE.marginTop,
    paddingBottom: PAGE.marginBottom,
    paddingHorizontal: PAGE.marginX,
  },
  figures: FIGURES,
  eyebrow: { fontSize: 8, fontWeight: 600, letterSpacing: 1.2, textTransform: 'uppercase', color: COLOURS.copper },
  h1: { fontSize: 22, fontWeight: 600, lineHeight: 1.2, color: COLOURS.ink },
  h2: { fontSize: 15, fontWeight: 600, lineHeight: 1.25, color: COLOURS.ink, marginBottom: 6 },
  h3: { fontSize: 11, fontWeight: 600, lineHeight: 1.3, color: COLOURS.ink, marginTop: 12, marginBottom: 4 },
  body: { fontSize: 9.5, color: COLOURS.ink },
  soft: { color: COLOURS.inkSoft },
  small: { fontSize: 8, color: COLOURS.inkSoft },
  rule: { borderBottomWidth: 0.75, borderBottomColor: COLOURS.line },
  panel: { backgroundColor: COLOURS.paper, borderRadius: 4, padding: 10 },
  factLabel: { fontSize: 8, color: COLOURS.inkSoft },
  factValue: { fontSize: 10, fontWeight: 500, ...FIGURES },
});
