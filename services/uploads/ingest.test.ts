import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { UTApi } from 'uploadthing/server';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { encodeUploadsToken } from './local-token.js';
import { startUploadsStandIn, type UploadsStandIn } from './server.js';
import { putFileLikeTheClient, requestPresignedUploads } from './testing/client-requests.js';
import { startInspectionApp, type InspectionApp } from './testing/inspection-app.js';
import { makePhotoBytes } from './testing/photo-bytes.js';

const credentials = { apiKey: 'sk_live_waygrade_ingest_suite', appId: 'waygrade-ingest-suite', regions: ['local'] };
const token = encodeUploadsToken(credentials);

function tamperWithSignature(presignedUrl: string): string {
  const url = new URL(presignedUrl);
  const signature = url.searchParams.get('signature')!;
  const lastHex = signature.at(-1) === '0' ? '1' : '0';
  url.searchParams.set('signature', signature.slice(0, -1) + lastHex);
  return url.href;
}

describe('uploads stand-in ingest', () => {
  let dataDir: string;
  let uploads: UploadsStandIn;
  let app: InspectionApp;
  let devApp: InspectionApp;
  let utapi: UTApi;

  beforeAll(async () => {
    dataDir = await mkdtemp(path.join(tmpdir(), 'waygrade-uploads-'));
    uploads = await startUploadsStandIn({ port: 0, ...credentials, dataDir, log: () => {} });
    app = await startInspectionApp({ config: { token, ingestUrl: uploads.url, isDev: false } });
    devApp = await startInspectionApp({ config: { token, ingestUrl: uploads.url, isDev: true } });
    utapi = new UTApi({ token, apiUrl: uploads.url, logLevel: 'Error' });
  });

  afterAll(async () => {
    await devApp?.close();
    await app?.close();
    await uploads?.close();
    if (dataDir) await rm(dataDir, { recursive: true, force: true });
  });

  it('accepts a multipart PUT and answers with the file URLs and the app result', async () => {
    const bytes = makePhotoBytes(64 * 1024);
    const [presigned] = await requestPresignedUploads(app.routeUrl, 'inspectionPhoto', 'insp-7', [{ name: 'tailstock.jpg', size: bytes.length, type: 'image/jpeg' }]);

    const response = await putFileLikeTheClient(presigned!.url, bytes, 'tailstock.jpg', 'image/jpeg');

    expect(response.status).toBe(200);
    const body = await response.json();
    expect(body).toMatchObject({
      ufsUrl: `${uploads.url}/f/${presigned!.key}`,
      url: `${uploads.url}/f/${presigned!.key}`,
      appUrl: `${uploads.url}/a/${credentials.appId}/${presigned!.key}`,
      serverData: { photoKey: presigned!.key, inspectionId: 'insp-7', bytesReceived: bytes.length },
    });
    expect(body.fileHash).toMatch(/^[0-9a-f]{32}$/);
    expect(app.completed.at(-1)).toMatchObject({ key: presigned!.key, metadata: { inspectionId: 'insp-7' } });
  });

  it('tells a resuming client to start from byte 0', async () => {
    const [presigned] = await requestPresignedUploads(app.routeUrl, 'inspectionPhoto', 'insp-7', [{ name: 'chuck.jpg', size: 10, type: 'image/jpeg' }]);

    const head = await fetch(presigned!.url, { method: 'HEAD' });

    expect(head.status).toBe(200);
    expect(head.headers.get('x-ut-range-start')).toBe('0');
  });

  it('refuses an upload URL whose signature was tampered with', async () => {
    const bytes = makePhotoBytes(1024);
    const [presigned] = await requestPresignedUploads(app.routeUrl, 'inspectionPhoto', 'insp-7', [{ name: 'apron.jpg', size: bytes.length, type: 'image/jpeg' }]);

    const response = await putFileLikeTheClient(tamperWithSignature(presigned!.url), bytes, 'apron.jpg', 'image/jpeg');

    expect(response.status).toBe(403);
    expect(await response.json()).toEqual({ error: 'Invalid upload URL signature' });
    expect((await fetch(tamperWithSignature(presigned!.url), { method: 'HEAD' })).status).toBe(403);
    expect((await utapi.listFiles()).files.map((file) => file.key)).not.toContain(presigned!.key);
  });

  it('refuses an upload URL whose declared size was raised after signing', async () => {
    const bytes = makePhotoBytes(8 * 1024 * 1024);
    const [presigned] = await requestPresignedUploads(app.routeUrl, 'inspectionPhoto', 'insp-7', [{ name: 'bed.jpg', size: 1024, type: 'image/jpeg' }]);
    const url = new URL(presigned!.url);
    url.searchParams.set('x-ut-file-size', String(bytes.length));

    const response = await putFileLikeTheClient(url.href, bytes, 'bed.jpg', 'image/jpeg');

    expect(response.status).toBe(403);
  });

  it('refuses an upload URL after it has expired', async () => {
    const bytes = makePhotoBytes(1024);
    const [presigned] = await requestPresignedUploads(app.routeUrl, 'briefInspectionPhoto', 'insp-7', [{ name: 'cross-slide.jpg', size: bytes.length, type: 'image/jpeg' }]);
    await new Promise((resolve) => setTimeout(resolve, 1_200));

    const response = await putFileLikeTheClient(presigned!.url, bytes, 'cross-slide.jpg', 'image/jpeg');

    expect(response.status).toBe(403);
    expect(await response.json()).toEqual({ error: 'The upload URL has expired' });
  });

  it('refuses with 413 a body larger than the size the route handler signed', async () => {
    const declared = 2 * 1024;
    const [presigned] = await requestPresignedUploads(app.routeUrl, 'inspectionPhoto', 'insp-7', [{ name: 'gearbox.jpg', size: declared, type: 'image/jpeg' }]);

    const slightlyOver = await putFileLikeTheClient(presigned!.url, makePhotoBytes(declared + 1), 'gearbox.jpg', 'image/jpeg');
    const farOver = await putFileLikeTheClient(presigned!.url, makePhotoBytes(declared + 512 * 1024), 'gearbox.jpg', 'image/jpeg');

    expect(slightlyOver.status).toBe(413);
    expect(farOver.status).toBe(413);
    expect((await fetch(`${uploads.url}/f/${presigned!.key}`)).status).toBe(404);
  });

  it('delivers the callback over the open registration stream when the app runs in development mode', async () => {
    const bytes = makePhotoBytes(4 * 1024);
    const [presigned] = await requestPresignedUploads(devApp.routeUrl, 'inspectionPhoto', 'insp-dev-3', [{ name: 'leadscrew.jpg', size: bytes.length, type: 'image/jpeg' }]);

    const response = await putFileLikeTheClient(presigned!.url, bytes, 'leadscrew.jpg', 'image/jpeg');

    expect(response.status).toBe(200);
    expect((await response.json()).serverData).toEqual({ photoKey: presigned!.key, inspectionId: 'insp-dev-3', bytesReceived: bytes.length });
    expect(devApp.completed.map((photo) => photo.key)).toEqual([presigned!.key]);
  });

  it('answers a browser preflight for the app origin and exposes the resume header', async () => {
    const response = await fetch(`${uploads.url}/any-file-key`, {
      method: 'OPTIONS',
      headers: { origin: app.url, 'access-control-request-method': 'PUT', 'access-control-request-headers': 'range,x-uploadthing-version,b3,traceparent' },
    });

    expect(response.status).toBe(204);
    expect(response.headers.get('access-control-allow-origin')).toBe(app.url);
    expect(response.headers.get('access-control-allow-methods')).toContain('PUT');
    expect(response.headers.get('access-control-allow-headers')).toContain('x-uploadthing-version');
    expect(response.headers.get('access-control-expose-headers')).toContain('x-ut-range-start');
  });
});
