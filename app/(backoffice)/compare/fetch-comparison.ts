import type { ComparisonPage } from '@/lib/comparison/comparison-row';

type Failure = { ok: false; code: string; message: string; fieldErrors?: Record<string, string[]> };

/** A refused or failed request, with what the server said about it. */
export class ComparisonFetchError extends Error {
  constructor(
    message: string,
    readonly status: number,
    readonly fieldErrors: Record<string, string[]> = {},
  ) {
    super(message);
    this.name = 'ComparisonFetchError';
  }
}

const OFFLINE = 'Waygrade could not be reached. Check the connection; the table tries again by itself.';

/** GET /api/compare with the page's own query string: the URL is the one source of the table's state. */
export async function fetchComparisonPage(queryString: string, signal?: AbortSignal): Promise<ComparisonPage> {
  let response: Response;
  try {
    response = await fetch(`/api/compare?${queryString}`, { signal, headers: { accept: 'application/json' } });
  } catch (error) {
    if (signal?.aborted) throw error;
    throw new ComparisonFetchError(OFFLINE, 0);
  }
  const body = (await response.json().catch(() => null)) as { ok: true; data: ComparisonPage } | Failure | null;
  if (!body) throw new ComparisonFetchError(`Waygrade answered ${response.status} without a readable body. Please try again.`, response.status);
  if (!body.ok) throw new ComparisonFetchError(body.message, response.status, body.fieldErrors);
  return body.data;
}
