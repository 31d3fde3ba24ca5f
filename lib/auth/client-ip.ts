import { isIP } from 'node:net';
import { env } from '@/lib/env';

/** The longest textual IP address (IPv6 with an embedded IPv4 part), as the audit column expects. */
const MAX_ADDRESS_LENGTH = 45;

/**
 * The visitor's address, used for rate limits and the audit trail. The app server appends the
 * socket's address to X-Forwarded-For (`scripts/app-server.mjs`), so the rightmost entry is the
 * peer that connected to us; each of our own `trustedProxies` in front appended the address it saw.
 * The visitor is therefore the entry `trustedProxies` places left of the rightmost. Anything further
 * left was written by the visitor and is never read. Null when that entry is missing or not an IP
 * address, so a forged or overlong header can neither name someone else nor break an audited write.
 */
export function clientIpFrom(headers: Pick<Headers, 'get'>, trustedProxies: number = env().TRUSTED_PROXY_COUNT): string | null {
  const entries = (headers.get('x-forwarded-for') ?? '').split(',').map((entry) => entry.trim());
  const chosen = entries[entries.length - 1 - trustedProxies];
  if (!chosen || chosen.length > MAX_ADDRESS_LENGTH || isIP(chosen) === 0) return null;
  // An IPv4 visitor on a dual-stack socket appears as ::ffff:a.b.c.d; record the address itself.
  return chosen.toLowerCase().startsWith('::ffff:') && isIP(chosen.slice(7)) === 4 ? chosen.slice(7) : chosen;
}
