import type { NextRequest } from 'next/server';
import { privateJson } from '@/lib/http/private-json';
import { currentActor, currentClientIp } from '@/lib/auth/current-actor';
import { exportComparison } from '@/lib/comparison/export-comparison';
import { httpStatus } from '@/lib/errors';

/** GET /api/compare/export?<the table's filters and sort> → CSV download, or the JSON error with its status. */
export async function GET(request: NextRequest) {
  const raw = Object.fromEntries(request.nextUrl.searchParams);
  // Paging does not apply to an export: the file holds every matching machine.
  delete raw.page;
  delete raw.pageSize;
  const result = await exportComparison.execute(await currentActor(), raw, { ip: await currentClientIp() });
  if (!result.ok) return privateJson(result, { status: httpStatus(result.code) });
  const day = new Date().toISOString().slice(0, 10);
  return new Response(`\uFEFF${result.data.csv}`, {
    headers: {
      'content-type': 'text/csv; charset=utf-8',
      'content-disposition': `attachment; filename="waygrade-comparison-${day}.csv"`,
      'x-waygrade-rows': String(result.data.rows),
      'cache-control': 'private, no-store',
    },
  });
}
