import { NextResponse, type NextRequest } from 'next/server';
import { privateJson } from '@/lib/http/private-json';
import { currentActor, currentClientIp } from '@/lib/auth/current-actor';
import { httpStatus, toAppError } from '@/lib/errors';
import { reportPdf } from '@/lib/pdf/report-pdf';
import { authorizeReportDownload } from '@/lib/reports/authorize-report-download';

// Rendering uses Node's file system and fonts; never the edge runtime, never a static page.
export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

/**
 * Download of one report version. Not `routeHandler` because the answer is a file, not JSON; the
 * session and the grant are still checked by the operation on every request, stored file or not.
 * A released version is served as stored at release, with its SHA-256 (RFC 9530 Repr-Digest).
 */
export async function GET(_request: NextRequest, context: { params: Promise<{ id: string }> }) {
  const { id } = await context.params;
  const allowed = await authorizeReportDownload.execute(await currentActor(), { reportId: id }, { ip: await currentClientIp() });
  if (!allowed.ok) return privateJson(allowed, { status: httpStatus(allowed.code) });
  try {
    const { pdf, sha256, fromStore } = await reportPdf(allowed.data.reportId);
    return new NextResponse(new Uint8Array(pdf), {
      status: 200,
      headers: {
        'Content-Type': 'application/pdf',
        'Content-Length': String(pdf.length),
        'Content-Disposition': `attachment; filename="${allowed.data.filename}"`,
        // Private: the file is paid for; a shared cache must never hand it to someone else.
        'Cache-Control': 'private, no-store',
        // "hit": the stored file; "miss": sealed by this request (the worker had not yet) or a draft.
        'X-Waygrade-Report-Cache': fromStore ? 'hit' : 'miss',
        ...(sha256 ? { 'Repr-Digest': `sha-256=:${Buffer.from(sha256, 'hex').toString('base64')}:`, 'X-Waygrade-Report-Sha256': sha256 } : {}),
      },
    });
  } catch (error) {
    const appError = toAppError(error);
    if (appError.code === 'internal') console.error('[report.download]', error);
    return privateJson({ ok: false, code: appError.code, message: appError.message }, { status: httpStatus(appError.code) });
  }
}
