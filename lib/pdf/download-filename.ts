/** One path segment of a file name: lower case ASCII letters and digits joined by single hyphens. */
function slug(text: string | null | undefined): string {
  return (text ?? '')
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .replace(/&/g, ' and ')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '');
}

/** e.g. waygrade-oldreth-t400-ol48213-v2.pdf; a missing serial is left out rather than guessed. */
export function reportDownloadFilename(report: { maker: string; model: string; serialNumber: string | null; version: number }): string {
  const parts = ['waygrade', slug(report.maker), slug(report.model), slug(report.serialNumber), `v${report.version}`].filter(Boolean);
  return `${parts.join('-').slice(0, 150)}.pdf`;
}
