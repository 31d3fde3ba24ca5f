import 'server-only';
import type { ReportPhoto } from './report-document-data';

const FETCH_TIMEOUT_MS = 10_000;

function formatOf(contentType: string | null, bytes: Buffer): 'jpg' | 'png' | null {
  if (bytes[0] === 0xff && bytes[1] === 0xd8) return 'jpg';
  if (bytes[0] === 0x89 && bytes[1] === 0x50) return 'png';
  if (contentType?.includes('jpeg')) return 'jpg';
  if (contentType?.includes('png')) return 'png';
  return null;
}

/**
 * Fetches each survey photo from the file service before rendering. `complete` is false when any
 * could not be fetched or is not a JPEG or PNG: such a document is served but not cached, so the
 * next download tries again rather than keeping a report with a photo missing.
 */
export async function loadReportPhotos(
  rows: ReadonlyArray<{ section: string | null; caption: string | null; url: string }>,
  fetchImpl: typeof fetch = fetch,
): Promise<{ photos: ReportPhoto[]; complete: boolean }> {
  const loaded = await Promise.all(
    rows.map(async (row): Promise<ReportPhoto | null> => {
      try {
        const response = await fetchImpl(row.url, { signal: AbortSignal.timeout(FETCH_TIMEOUT_MS) });
        if (!response.ok) return null;
        const data: Buffer = Buffer.from(await response.arrayBuffer());
        const format = formatOf(response.headers.get('content-type'), data);
        return format ? { section: row.section, caption: row.caption, image: { data, format } } : null;
      } catch {
        return null;
      }
    }),
  );
  const photos = loaded.filter((p): p is ReportPhoto => p !== null);
  return { photos, complete: photos.length === rows.length };
}
