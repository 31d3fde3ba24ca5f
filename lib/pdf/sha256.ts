import { createHash } from 'node:crypto';

/** Lower-case hex SHA-256 (FIPS 180-4) of a file's bytes: the digest a released PDF is known by. */
export function sha256Hex(bytes: Uint8Array): string {
  return createHash('sha256').update(bytes).digest('hex');
}
