// Mail HTML is built from plain strings: every value passes through here before it reaches markup,
// so a name like "<b>Bram</b>" arrives as text, never as HTML.
export function escapeHtml(text: string): string {
  return text
    .replaceAll('&', '&amp;')
    .replaceAll('<', '&lt;')
    .replaceAll('>', '&gt;')
    .replaceAll('"', '&quot;')
    .replaceAll("'", '&#39;');
}
