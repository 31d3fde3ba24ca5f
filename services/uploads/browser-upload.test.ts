import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { UTApi } from 'uploadthing/server';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { encodeUploadsToken } from './local-token.js';
import { startUploadsStandIn, type UploadsStandIn } from './server.js';
import { buildBrowserUploader } from './testing/build-browser-uploader.js';
import type { BrowserUploadOutcome, PhotoToUpload } from './testing/browser-uploader.js';
import { launchChromium } from './testing/chromium.js';
import { startInspectionApp, type InspectionApp } from './testing/inspection-app.js';
import { makePhotoBytes } from './testing/photo-bytes.js';

const credentials = { apiKey: 'sk_live_waygrade_browser_suite', appId: 'waygrade-browser-suite', regions: ['local'] };

const PAGE = '<!doctype html><html><head><script type="module" src="/browser-uploader.js"></script></head><body>Inspection photos</body></html>';

describe('browser upload of inspection photos through the uploads stand-in', () => {
  let dataDir: string;
  let uploads: UploadsStandIn;
  let app: InspectionApp;
  let browser: Browser;
  let page: Page;
  let utapi: UTApi;

  beforeAll(async () => {
    dataDir = await mkdtemp(path.join(tmpdir(), 'waygrade-uploads-'));
    uploads = await startUploadsStandIn({ port: 0, ...credentials, dataDir, log: () => {} });
    // The app is configured only through the environment, as the Next app will be.
    vi.stubEnv('UPLOADTHING_TOKEN', encodeUploadsToken(credentials));
    vi.stubEnv('UPLOADTHING_INGEST_URL', uploads.url);
    vi.stubEnv('UPLOADTHING_API_URL', uploads.url);
    vi.stubEnv('UPLOADTHING_IS_DEV', 'false');
    vi.stubEnv('UPLOADTHING_LOG_LEVEL', 'Error');
    const bundle = await buildBrowserUploader();
    app = await startInspectionApp({
      pages: {
        '/': { contentType: 'text/html', body: PAGE },
        '/browser-uploader.js': { contentType: 'text/javascript', body: bundle },
      },
    });
    utapi = new UTApi();
    browser = await launchChromium();
    page = await browser.newPage();
    await page.goto(app.url);
    await page.waitForFunction(() => typeof window.uploadInspectionPhotos === 'function');
  }, 60_000);

  afterAll(async () => {
    await browser?.close();
    await app?.close();
    await uploads?.close();
    vi.unstubAllEnvs();
    if (dataDir) await rm(dataDir, { recursive: true, force: true });
  });

  function uploadFromPage(inspectionId: string, photos: PhotoToUpload[]): Promise<BrowserUploadOutcome> {
    return page.evaluate(([id, files]) => window.uploadInspectionPhotos(id, files), [inspectionId, photos] as const);
  }

  it('stores the photo, runs onUploadComplete and hands its result back to the page', async () => {
    const bytes = makePhotoBytes(300 * 1024);
    const outcome = await uploadFromPage('insp-2041', [
      { name: 'headstock-spindle.jpg', type: 'image/jpeg', base64: Buffer.from(bytes).toString('base64') },
    ]);

    if (!outcome.ok) throw new Error(`upload failed in the page: ${outcome.code} ${outcome.message}`);
    const [uploaded] = outcome.files;
    expect(outcome.files).toHaveLength(1);
    expect(uploaded).toMatchObject({ name: 'headstock-spindle.jpg', size: bytes.length, type: 'image/jpeg' });
    expect(uploaded!.serverData).toEqual({ photoKey: uploaded!.key, inspectionId: 'insp-2041', bytesReceived: bytes.length });
    expect(outcome.progressEvents).toBeGreaterThan(0);

    expect(app.completed).toEqual([
      {
        key: uploaded!.key,
        name: 'headstock-spindle.jpg',
        size: bytes.length,
        type: 'image/jpeg',
        ufsUrl: uploaded!.ufsUrl,
        fileHash: uploaded!.fileHash,
        metadata: { inspectionId: 'insp-2041', inspector: 'inspector-17' },
      },
    ]);

    const served = await fetch(uploaded!.ufsUrl);
    expect(served.status).toBe(200);
    expect(served.headers.get('content-type')).toBe('image/jpeg');
    expect(Buffer.from(await served.arrayBuffer()).equals(Buffer.from(bytes))).toBe(true);

    const listed = await utapi.listFiles();
    expect(listed.files.map((file) => ({ key: file.key, name: file.name, size: file.size, status: file.status }))).toContainEqual({
      key: uploaded!.key,
      name: 'headstock-spindle.jpg',
      size: bytes.length,
      status: 'Uploaded',
    });

    await expect(utapi.deleteFiles(uploaded!.key)).resolves.toMatchObject({ success: true, deletedCount: 1 });
    expect((await utapi.listFiles()).files.map((file) => file.key)).not.toContain(uploaded!.key);
    expect((await fetch(uploaded!.ufsUrl)).status).toBe(404);
  }, 30_000);

  it('refuses a photo over the route limit of 4 MB before any bytes reach storage', async () => {
    const before = await utapi.listFiles();
    const outcome = await uploadFromPage('insp-2041', [
      { name: 'whole-bed-panorama.jpg', type: 'image/jpeg', base64: Buffer.from(makePhotoBytes(4 * 1024 * 1024 + 1)).toString('base64') },
    ]);

    expect(outcome).toMatchObject({ ok: false, code: 'BAD_REQUEST' });
    expect((await utapi.listFiles()).files).toHaveLength(before.files.length);
  }, 30_000);
});
