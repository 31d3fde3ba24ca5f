import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { NotAPhotoError, processPhoto } from './process-photo';

describe('processPhoto', () => {
  it('shrinks a large photo to the display and thumbnail sizes, never enlarging a small one', async () => {
    const large = await sharp({ create: { width: 4000, height: 3000, channels: 3, background: '#777' } }).png().toBuffer();
    const done = await processPhoto(large);
    expect([done.display.widthPx, done.display.heightPx]).toEqual([1600, 1200]);
    expect([done.thumb.widthPx, done.thumb.heightPx]).toEqual([320, 240]);
    const small = await processPhoto(await sharp({ create: { width: 200, height: 100, channels: 3, background: '#777' } }).jpeg().toBuffer());
    expect([small.display.widthPx, small.display.heightPx]).toEqual([200, 100]);
  });

  it('makes the same sizes from a transparent PNG and a 16-bit greyscale PNG, as plain 8-bit colour files', async () => {
    const transparent = await sharp({ create: { width: 2000, height: 1000, channels: 4, background: { r: 10, g: 20, b: 30, alpha: 0.5 } } }).png().toBuffer();
    const grey16 = await sharp({ create: { width: 1000, height: 2000, channels: 3, background: '#888' } }).greyscale().toColourspace('grey16').png().toBuffer();
    expect((await sharp(grey16).metadata()).depth).toBe('ushort');
    for (const [bytes, display] of [
      [transparent, [1600, 800]],
      [grey16, [800, 1600]],
    ] as const) {
      const done = await processPhoto(bytes);
      expect([done.display.widthPx, done.display.heightPx]).toEqual(display);
      const meta = await sharp(done.display.bytes).metadata();
      expect(meta).toMatchObject({ format: 'jpeg', depth: 'uchar' });
      expect((await sharp(done.thumb.bytes).metadata()).format).toBe('webp');
    }
  });

  it.each([
    ['plain text named like a photo', Buffer.from('not a photo at all')],
    ['a PDF', Buffer.from('%PDF-1.7\n1 0 obj << >> endobj\n')],
    ['an empty file', Buffer.alloc(0)],
  ])('refuses %s', async (_what, bytes) => {
    await expect(processPhoto(bytes)).rejects.toBeInstanceOf(NotAPhotoError);
  });
});
