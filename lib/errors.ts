// One table from error code to HTTP status and to what a person is told.

export const ERROR_CODES = {
  unauthenticated: { status: 401, message: 'Please sign in first.' },
  forbidden: { status: 403, message: 'Your account may not do this.' },
  not_found: { status: 404, message: 'That no longer exists, or you may not see it.' },
  invalid_input: { status: 400, message: 'Some fields need attention.' },
  conflict: { status: 409, message: 'Someone else changed this in the meantime.' },
  too_large: { status: 413, message: 'The request is larger than this address accepts. Nothing was saved.' },
  rate_limited: { status: 429, message: 'Too many attempts. Please wait a few minutes and try again.' },
  unavailable: { status: 503, message: 'Waygrade cannot reach its database right now. Nothing was lost; please try again shortly.' },
  internal: { status: 500, message: 'Something went wrong on our side. Nothing you saved before was lost.' },
} as const;

export type ErrorCode = keyof typeof ERROR_CODES;

export class AppError extends Error {
  constructor(
    readonly code: ErrorCode,
    message?: string,
    readonly fieldErrors?: Record<string, string[]>,
  ) {
    super(message ?? ERROR_CODES[code].message);
    this.name = 'AppError';
  }
}

const DATABASE_DOWN = new Set(['ECONNREFUSED', 'PROTOCOL_CONNECTION_LOST', 'ETIMEDOUT', 'ECONNRESET', 'ER_CON_COUNT_ERROR', 'EPIPE']);

/** Any thrown value as an AppError: database outages become "unavailable", never an empty result. */
export function toAppError(error: unknown): AppError {
  if (error instanceof AppError) return error;
  const code = (error as { code?: string; cause?: { code?: string } })?.code ?? (error as { cause?: { code?: string } })?.cause?.code;
  if (code && DATABASE_DOWN.has(code)) return new AppError('unavailable');
  return new AppError('internal');
}

export function httpStatus(code: ErrorCode) {
  return ERROR_CODES[code].status;
}
