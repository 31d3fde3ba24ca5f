import path from 'node:path';
import { Font } from '@react-pdf/renderer';

/** The family name the report's styles use. */
export const REPORT_FONT = 'Work Sans';

// The .woff files are copies of @fontsource/work-sans 5.3.0 (SIL Open Font License 1.1), kept in
// the repository because react-pdf renders .woff but leaves .woff2 blank. Only the latin subset
// ships, so lib/pdf/pdf-text.ts replaces the few characters it lacks.
const FONT_DIR = path.join(process.cwd(), 'lib', 'pdf', 'fonts');

const FACES = [
  { file: 'work-sans-latin-400-normal.woff', fontWeight: 400, fontStyle: 'normal' },
  { file: 'work-sans-latin-400-italic.woff', fontWeight: 400, fontStyle: 'italic' },
  { file: 'work-sans-latin-500-normal.woff', fontWeight: 500, fontStyle: 'normal' },
  { file: 'work-sans-latin-600-normal.woff', fontWeight: 600, fontStyle: 'normal' },
  { file: 'work-sans-latin-700-normal.woff', fontWeight: 700, fontStyle: 'normal' },
] as const;

let registered = false;

/** Registers Work Sans once per process; react-pdf embeds only the glyphs a document uses. */
export function registerReportFonts() {
  if (registered) return;
  Font.register({
    family: REPORT_FONT,
    fonts: FACES.map((face) => ({ src: path.join(FONT_DIR, face.file), fontWeight: face.fontWeight, fontStyle: face.fontStyle })),
  });
  // Technical words (run-out, ISO codes, serial numbers) must never be split across lines.
  Font.registerHyphenationCallback((word) => [word]);
  registered = true;
}
