import { randomBytes } from 'node:crypto';

// Stripe ids are a type prefix plus base62 characters; the prefix is what integrations
// (and the SDK's expand logic) use to tell object types apart, so it must match Stripe's.
const BASE62 = '0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz';

export function newObjectId(prefix: string, length = 24): string {
  const bytes = randomBytes(length);
  let suffix = '';
  for (const byte of bytes) suffix += BASE62[byte % BASE62.length];
  return `${prefix}${suffix}`;
}

export function unixSeconds(date: Date = new Date()): number {
  return Math.floor(date.getTime() / 1000);
}
