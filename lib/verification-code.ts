import { randomInt } from 'node:crypto';

const ALPHABET = '23456789ABCDEFGHJKLMNPQRSTUVWXYZ';

/** A new random report code, e.g. WG-7K3P-Q9XD-4MRT (about 60 bits). */
export function newVerificationCode(): string {
  const group = () => Array.from({ length: 4 }, () => ALPHABET[randomInt(ALPHABET.length)]).join('');
  return `WG-${group()}-${group()}-${group()}`;
}
