import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { crc32, deflateSync } from 'node:zlib';
import { eq } from 'drizzle-orm';
import sharp from 'sharp';
import { UTApi, UTFile } from 'uploadthing/server';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { closeDatabase, db } from '@/db/client';
import { photos } from '@/db/schema';
import { ingestSurveyPhoto, type PhotoFileStore } from '@/lib/photos/ingest-survey-photo';
import { uploadthingFileStore } from '@/lib/storage/uploadthing-file-store';
import { recordSurveyPhoto } from '@/lib/survey/server/record-survey-photo';
import { encodeUploadsToken } from '@/services/uploads/local-token';
import { startUploadsStandIn, type UploadsStandIn } from '@/services/uploads/server';
import { bookedInspection } from './survey-fixtures';

const credentials = { apiKey: 'sk_live_waygrade_photo_suite', appId: 'waygrade-photo-suite', regions: ['local'] };

// The EXIF GPS IFD pointer tag (0x8825), in either byte order: present when a file carries a location.
const hasGpsPointer = (exif: Buffer | undefined) => Boolean(exif && (exif.includes(Buffer.from([0x88, 0x25])) || exif.includes(Buffer.from([0x25, 0x88]))));

/** A phone photo: 1200 × 800 pixels stored sideways (orientation 6) with the site's location in EXIF. */
async function phonePhotoWithLocation() {
  return sharp({ create: { width: 1200, height: 800, channels: 3, background: { r: 96, g: 104, b: 112 } } })
    .jpeg({ quality: 85 })
    .withMetadata({ orientation: 6 })
    .withExif({ IFD0: { Make: 'Fieldphone', Model: 'FP-9' }, IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '51/1 30/1 12/1', GPSLongitudeRef: 'W', GPSLongitude: '1/1 15/1 30/1' } })
    .toBuffer();
}

/** A PNG chunk: length, type, data and the CRC over type and data. */
function pngChunk(type: string, data: Buffer) {
  const length = Buffer.alloc(4);
  length.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body));
  return Buffer.concat([length, body, crc]);
}

/**
 * A decompression bomb: a well-formed 10 000 × 10 000 pixel PNG (100 megapixels, 300 MB once
 * decoded to colour, twice Waygrade's limit but under libvips' own default) that is a few kilobytes
 * on disk, because every pixel is black.
 */
function decompressionBombPng() {
  const side = 10_000;
  const header = Buffer.alloc(13);
  header.writeUInt32BE(side, 0);
  header.writeUInt32BE(side, 4);
  header.set([1, 0, 0, 0, 0], 8); // 1-bit greyscale, deflate, no filter, no interlace
  const rows = Buffer.alloc(side * (1 + side / 8)); // each row: filter byte 0, then 1 250 zero bytes
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    pngChunk('IHDR', header),
    pngChunk('IDAT', deflateSync(rows, { level: 9 })),
    pngChunk('IEND', Buffer.alloc(0)),
  ]);
}

const SVG_WITH_SCRIPT = `<?xml version="1.0"?>
<svg xmlns="http://www.w3.org/2000/svg" width="800" height="600" onload="fetch('/api/compare?steal='+document.cookie)">
  <script>alert(document.domain)</script>
  <rect width="800" height="600" fill="#777"/>
</svg>`;

describe('survey photo processing', () => {
  let dataDir: string;
  let uploads: UploadsStandIn;
  let utapi: UTApi;
  let store: PhotoFileStore;

  beforeAll(async () => {
    dataDir = await mkdtemp(path.join(tmpdir(), 'waygrade-photo-suite-'));
    uploads = await startUploadsStandIn({ port: 0, ...credentials, dataDir, log: () => {} });
    vi.stubEnv('UPLOADTHING_TOKEN', encodeUploadsToken(credentials));
    vi.stubEnv('UPLOADTHING_API_URL', uploads.url);
    vi.stubEnv('UPLOADTHING_INGEST_URL', uploads.url);
    vi.stubEnv('UPLOADTHING_IS_DEV', 'false');
    vi.stubEnv('UPLOADTHING_LOG_LEVEL', 'Error');
    utapi = new UTApi();
    // This suite's own stand-in serves the files, at its own address.
    store = uploadthingFileStore(utapi, new URL(uploads.url).origin);
  });

  afterAll(async () => {
    await uploads?.close();
    vi.unstubAllEnvs();
    if (dataDir) await rm(dataDir, { recursive: true, force: true });
    await closeDatabase();
  });

  /** What the browser's upload leaves behind: the original, as sent, in storage. */
  async function uploadOriginal(name: string, bytes: Buffer, type: string) {
    const [result] = await utapi.uploadFiles([new UTFile([new Uint8Array(bytes)], name, { type })]);
    if (!result?.data) throw new Error(`original upload failed: ${result?.error?.message}`);
    return { key: result.data.key, name, url: result.data.ufsUrl };
  }

  async function fetchBytes(url: string) {
    const response = await fetch(url);
    expect(response.status).toBe(200);
    return Buffer.from(await response.arrayBuffer());
  }

  it('removes the location and all EXIF, turns the photo upright, makes display and thumbnail sizes, and records it', async () => {
    const { inspector, inspectionId } = await bookedInspection({ start: true });
    const source = await phonePhotoWithLocation();
    const sourceMeta = await sharp(source).metadata();
    expect(hasGpsPointer(sourceMeta.exif)).toBe(true);
    expect(sourceMeta.orientation).toBe(6);

    const original = await uploadOriginal('nameplate.jpg', source, 'image/jpeg');
    const outcome = await ingestSurveyPhoto(store, original, { inspectionId, section: 'identity' });
    if (!outcome.ok) throw new Error(outcome.message);

    const full = await fetchBytes(outcome.files.originalUrl);
    const [display, thumb] = await Promise.all([
      fetchBytes(`${uploads.url}/f/${outcome.files.displayKey}`),
      fetchBytes(`${uploads.url}/f/${outcome.files.thumbKey}`),
    ]);
    for (const bytes of [full, display, thumb]) {
      const meta = await sharp(bytes).metadata();
      expect(meta.exif).toBeUndefined();
      expect(hasGpsPointer(meta.exif)).toBe(false);
      expect(meta.orientation ?? 1).toBe(1);
      // Turned upright: the sideways 1200 × 800 frame becomes portrait.
      expect(meta.height!).toBeGreaterThan(meta.width!);
    }
    expect(await sharp(full).metadata()).toMatchObject({ format: 'jpeg', width: 800, height: 1200 });
    expect(await sharp(thumb).metadata()).toMatchObject({ format: 'webp', height: 320 });
    // The original still carried the location, so it is gone from storage.
    expect((await fetch(original.url)).status).toBe(404);

    const recorded = await recordSurveyPhoto.execute(inspector, { inspectionId, section: 'identity', ...outcome.files });
    if (!recorded.ok) throw new Error(recorded.message);
    const [row] = await db.select().from(photos).where(eq(photos.id, recorded.data.id));
    expect(row).toMatchObject({ inspectionId, section: 'identity', widthPx: 800, heightPx: 1200, uploadedById: inspector.id, displayKey: outcome.files.displayKey });
  });

  it('refuses a renamed non-image by its content and deletes it from storage', async () => {
    const { inspectionId } = await bookedInspection({ start: true });
    const text = Buffer.from('Spindle bearings replaced 2019; invoice attached.\n'.repeat(40));
    const original = await uploadOriginal('spindle-nose.jpg', text, 'image/jpeg');

    const outcome = await ingestSurveyPhoto(store, original, { inspectionId, section: 'spindle' });
    expect(outcome.ok).toBe(false);
    if (!outcome.ok) expect(outcome.message).toMatch(/“spindle-nose\.jpg”: This file is not a photo/);
    expect((await fetch(original.url)).status).toBe(404);
  });

  it('refuses a file that starts like a JPEG but does not decode', async () => {
    const { inspectionId } = await bookedInspection({ start: true });
    const truncated = (await phonePhotoWithLocation()).subarray(0, 600);
    const original = await uploadOriginal('ways-near-chuck.jpg', Buffer.from(truncated), 'image/jpeg');
    const outcome = await ingestSurveyPhoto(store, original, { inspectionId, section: 'bedAndWays' });
    expect(outcome.ok).toBe(false);
  });

  it.each([
    ['an SVG with a script, sent as an SVG', 'gauge.svg', Buffer.from(SVG_WITH_SCRIPT), 'image/svg+xml'],
    ['an SVG with a script, named and sent as a JPEG', 'gauge.jpg', Buffer.from(SVG_WITH_SCRIPT), 'image/jpeg'],
    ['an HTML page named as a JPEG', 'tailstock.jpg', Buffer.from('<!doctype html><script>alert(1)</script><img src=x onerror=alert(2)>'), 'image/jpeg'],
    ['a GIF named as a JPEG', 'chuck.jpg', Buffer.from('R0lGODlhAQABAIAAAAAAAP///yH5BAEAAAAALAAAAAABAAEAAAIBRAA7', 'base64'), 'image/jpeg'],
    ['a PDF named as a PNG', 'manual.png', Buffer.from('%PDF-1.7\n1 0 obj << /Type /Catalog >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n'), 'image/png'],
  ])('refuses %s, stores nothing and deletes the upload', async (_what, name, bytes, type) => {
    const { inspectionId } = await bookedInspection({ start: true });
    const put = vi.spyOn(store, 'put');
    const original = await uploadOriginal(name, bytes, type);
    const outcome = await ingestSurveyPhoto(store, original, { inspectionId, section: 'identity' });
    expect(outcome).toMatchObject({ ok: false, message: expect.stringMatching(/This file is not a photo Waygrade can read/) });
    expect(put).not.toHaveBeenCalled();
    put.mockRestore();
    expect((await fetch(original.url)).status).toBe(404);
  });

  it('refuses a decompression bomb without decoding it, and deletes it', async () => {
    const { inspectionId } = await bookedInspection({ start: true });
    const bomb = decompressionBombPng();
    expect(bomb.byteLength).toBeLessThan(200_000);
    expect(await sharp(bomb).metadata()).toMatchObject({ format: 'png', width: 10_000, height: 10_000 });
    const original = await uploadOriginal('bed-overview.png', bomb, 'image/png');
    const outcome = await ingestSurveyPhoto(store, original, { inspectionId, section: 'bedAndWays' });
    expect(outcome.ok).toBe(false);
    expect((await fetch(original.url)).status).toBe(404);
  });

  it('refuses a file over 16 MB before decoding it, even a genuine photo, and deletes it', async () => {
    const { inspectionId } = await bookedInspection({ start: true });
    const photo = await phonePhotoWithLocation();
    // JPEG readers stop at the end-of-image marker; the padding after it only makes the file large.
    const oversized = Buffer.concat([photo, Buffer.alloc(16 * 1024 * 1024 + 1 - photo.byteLength)]);
    const original = await uploadOriginal('headstock.jpg', oversized, 'image/jpeg');
    const outcome = await ingestSurveyPhoto(store, original, { inspectionId, section: 'drive' });
    expect(outcome).toMatchObject({ ok: false, message: expect.stringMatching(/larger than 16 MB/) });
    expect((await fetch(original.url)).status).toBe(404);
  });

  it('keeps no location from a PNG sent as a JPEG: the stored copies are judged by content and carry no metadata', async () => {
    const { inspectionId } = await bookedInspection({ start: true });
    const png = await sharp(await phonePhotoWithLocation()).keepExif().png().toBuffer();
    expect(hasGpsPointer((await sharp(png).metadata()).exif)).toBe(true);
    const original = await uploadOriginal('apron.jpg', png, 'image/jpeg');
    const outcome = await ingestSurveyPhoto(store, original, { inspectionId, section: 'identity' });
    if (!outcome.ok) throw new Error(outcome.message);
    for (const key of [outcome.files.fileKey, outcome.files.displayKey, outcome.files.thumbKey]) {
      const meta = await sharp(await fetchBytes(`${uploads.url}/f/${key}`)).metadata();
      expect(meta.exif).toBeUndefined();
      expect(meta.xmp).toBeUndefined();
      expect(['jpeg', 'webp']).toContain(meta.format);
    }
  });

  it('refuses a photo for an inspection that is not assigned to the inspector', async () => {
    const { inspectionId } = await bookedInspection({ start: true });
    const { inspector: stranger } = await bookedInspection();
    const refused = await recordSurveyPhoto.execute(stranger, {
      inspectionId,
      section: 'identity',
      fileKey: 'k',
      originalUrl: 'http://localhost/f/k',
      displayKey: 'd',
      thumbKey: 't',
      widthPx: 10,
      heightPx: 10,
      bytes: 10,
    });
    expect(refused).toMatchObject({ ok: false, code: 'not_found' });
  });
});
