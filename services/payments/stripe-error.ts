// Errors leave the stand-in in Stripe's shape, `{ error: { type, message, param?, code? } }`,
// with the HTTP status the SDK maps to its error classes (400 invalid request, 401
// authentication, 404 missing resource, 400 with type idempotency_error).

export type StripeErrorType = 'invalid_request_error' | 'idempotency_error' | 'api_error';

export class StripeApiError extends Error {
  constructor(
    readonly status: number,
    readonly type: StripeErrorType,
    message: string,
    readonly details: { param?: string; code?: string } = {},
  ) {
    super(message);
  }

  toBody(requestId: string): { error: Record<string, string> } {
    const error: Record<string, string> = { type: this.type, message: this.message };
    if (this.details.code) {
      error.code = this.details.code;
      error.doc_url = `https://docs.stripe.com/error-codes/${this.details.code.replaceAll('_', '-')}`;
    }
    if (this.details.param) error.param = this.details.param;
    error.request_log_url = `https://dashboard.stripe.com/test/logs/${requestId}`;
    return { error };
  }
}

export function resourceMissing(objectName: string, id: string, param = 'id'): StripeApiError {
  return new StripeApiError(404, 'invalid_request_error', `No such ${objectName}: '${id}'`, {
    param,
    code: 'resource_missing',
  });
}

export function invalidRequest(message: string, details: { param?: string; code?: string } = {}): StripeApiError {
  return new StripeApiError(400, 'invalid_request_error', message, details);
}
