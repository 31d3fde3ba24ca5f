import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
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
    store = uploadthingFileStore(utapi);
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
