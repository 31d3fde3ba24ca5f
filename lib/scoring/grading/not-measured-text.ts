/**
 * The explanation of a check that could not be done, and the reason read back out of it for the
 * confidence list. Kept together so the two cannot drift apart.
 */
const PREFIX = 'Not measured: ';
const SUFFIX = '. Counts against confidence; not assumed to pass.';

export function notMeasuredText(reason: string): string {
  return `${PREFIX}${reason}${SUFFIX}`;
}

/** The reason inside a text made by notMeasuredText (any other text is returned as it is). */
export function notMeasuredReason(text: string): string {
  const start = text.startsWith(PREFIX) ? PREFIX.length : 0;
  const end = text.endsWith(SUFFIX) ? text.length - SUFFIX.length : text.length;
  return text.slice(start, Math.max(start, end));
}
