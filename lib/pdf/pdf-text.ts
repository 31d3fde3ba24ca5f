/**
 * Work Sans ships here with its latin subset only; these characters from the scoring library's
 * texts are outside it and would print as blanks. Each is replaced by words or ASCII that read the
 * same. Longer patterns first, so "MΩ" becomes "Mohm" rather than "Mohm"-with-a-gap.
 */
const REPLACEMENTS: ReadonlyArray<readonly [string, string]> = [
  ['MΩ', 'Mohm'],
  ['Ω', 'ohm'],
  [' → ', ' gives '],
  ['→', ' to '],
  ['≥', '>='],
  ['≤', '<='],
  ['≈', '~'],
  ['√', 'sqrt'],
  ['Σ', 'sum '],
  ['Δ', 'delta '],
  ['⁶', '^6'],
  ['⁷', '^7'],
  ['✓', 'yes'],
];

/** Text as it can be printed with the embedded font. */
export function pdfText(text: string): string {
  let out = text;
  for (const [from, to] of REPLACEMENTS) out = out.replaceAll(from, to);
  return out;
}
