/**
 * The visitor's address as the load balancer reports it (first entry of X-Forwarded-For), used for
 * rate limits and the audit trail. Null when the request carries none.
 */
export function clientIpFrom(headers: Pick<Headers, 'get'>): string | null {
  const forwarded = headers.get('x-forwarded-for')?.split(',')[0]?.trim();
  return forwarded || headers.get('x-real-ip')?.trim() || null;
}
