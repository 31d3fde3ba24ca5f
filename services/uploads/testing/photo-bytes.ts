import { randomBytes } from 'node:crypto';

/**
 * Random bytes behind a JPEG start-of-image marker: nothing here decodes images, and
 * random content makes any byte lost or reordered on the way show up in a comparison.
 */
export function makePhotoBytes(size: number): Uint8Array {
  const bytes = new Uint8Array(randomBytes(size));
  bytes.set([0xff, 0xd8, 0xff, 0xe0].slice(0, size));
  return bytes;
}
