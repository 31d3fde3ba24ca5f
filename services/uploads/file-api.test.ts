import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { UTApi, UTFile } from 'uploadthing/server';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { encodeUploadsToken } from './local-token.js';
import { startUploadsStandIn, type UploadsStandIn } from './server.js';
import { makePhotoBytes } from './testing/photo-bytes.js';

const credentials = { apiKey: 'sk_live_waygrade_file_api_suite', appId: 'waygrade-file-api-suite', regions: ['local'] };
const token = encodeUploadsToken(credentials);

async function startOn(dataDir: string): Promise<{ uploads: UploadsStandIn; utapi: UTApi }> {
  const uploads = await startUploadsStandIn({ port: 0, ...credentials, dataDir, log: () => {} });
  const { port } = new URL(uploads.url);
  // ufsHost decides the URLs generateSignedURL composes; a host containing "local" makes the SDK use http.
  const utapi = new UTApi({ token, apiUrl: uploads.url, ingestUrl: uploads.url, ufsHost: `localhost:${port}`, ufsAppIdLocation: 'path', logLevel: 'Error' });
  return { uploads, utapi };
}

async function uploadReport(utapi: UTApi, name: string, bytes: Uint8Array, options: { customId?: string; acl?: 'private' | 'public-read' } = {}) {
  const result = await utapi.uploadFiles(new UTFile([new Uint8Array(bytes)], name, { type: 'image/jpeg', customId: options.customId }), { acl: options.acl });
  if (result.error) throw new Error(`server-side upload failed: ${result.error.message}`);
  return result.data;
}

async function bytesAt(url: string): Promise<{ status: number; bytes: Buffer }> {
  const response = await fetch(url);
  return { status: response.status, bytes: Buffer.from(await response.arrayBuffer()) };
}

describe('uploads stand-in file API', () => {
  let dataDir: string;
  let uploads: UploadsStandIn;
  let utapi: UTApi;

  beforeAll(async () => {
    dataDir = await mkdtemp(path.join(tmpdir(), 'waygrade-uploads-'));
    ({ uploads, utapi } = await startOn(dataDir));
  });

  afterAll(async () => {
    await uploads?.close();
    if (dataDir) await rm(dataDir, { recursive: true, force: true });
  });

  it('keeps server-side uploads and their list across a restart', async () => {
    const bytes = makePhotoBytes(20 * 1024);
    const stored = await uploadReport(utapi, 'nameplate.jpg', bytes, { customId: 'machine-88-nameplate' });

    await uploads.close();
    ({ uploads, utapi } = await startOn(dataDir));

    const listed = await utapi.listFiles();
    expect(listed.files).toContainEqual(
      expect.objectContaining({ key: stored.key, name: 'nameplate.jpg', size: bytes.length, customId: 'machine-88-nameplate', status: 'Uploaded' }),
    );
    const served = await bytesAt(`${uploads.url}/f/${stored.key}`);
    expect(served.status).toBe(200);
    expect(served.bytes.equals(Buffer.from(bytes))).toBe(true);
  });

  it('pages the file list with limit and offset', async () => {
    for (const name of ['ways-front.jpg', 'ways-rear.jpg', 'ways-left.jpg']) await uploadReport(utapi, name, makePhotoBytes(512));
    const total = (await utapi.listFiles()).files.length;

    const first = await utapi.listFiles({ limit: 2 });
    const rest = await utapi.listFiles({ limit: 2, offset: 2 });

    expect(first.files).toHaveLength(2);
    expect(first.hasMore).toBe(true);
    expect(rest.files).toHaveLength(total - 2);
    expect(rest.hasMore).toBe(total > 4);
    expect(new Set([...first.files, ...rest.files].map((file) => file.key)).size).toBe(Math.min(total, 4));
  });

  it('finds, renames and deletes files by custom id', async () => {
    const stored = await uploadReport(utapi, 'spindle-runout.jpg', makePhotoBytes(256), { customId: 'inspection-12-runout' });

    const urls = await utapi.getFileUrls('inspection-12-runout', { keyType: 'customId' });
    expect(urls.data).toEqual([{ key: stored.key, url: `${uploads.url}/f/${stored.key}` }]);

    await expect(utapi.renameFiles({ customId: 'inspection-12-runout', newName: 'spindle-runout-dial.jpg' })).resolves.toEqual({ success: true });
    expect((await utapi.listFiles()).files.find((file) => file.key === stored.key)?.name).toBe('spindle-runout-dial.jpg');

    await expect(utapi.deleteFiles('inspection-12-runout', { keyType: 'customId' })).resolves.toMatchObject({ deletedCount: 1 });
    expect((await bytesAt(`${uploads.url}/f/${stored.key}`)).status).toBe(404);
  });

  it('serves a private file only through a signed URL', async () => {
    const bytes = makePhotoBytes(2048);
    const stored = await uploadReport(utapi, 'serial-plate.jpg', bytes, { acl: 'private' });

    expect((await bytesAt(`${uploads.url}/f/${stored.key}`)).status).toBe(403);

    const { ufsUrl: generated } = await utapi.generateSignedURL(stored.key, { expiresIn: 60 });
    expect(new URL(generated).pathname).toBe(`/a/${credentials.appId}/${stored.key}`);
    const viaGenerated = await bytesAt(generated);
    expect(viaGenerated.status).toBe(200);
    expect(viaGenerated.bytes.equals(Buffer.from(bytes))).toBe(true);

    const { ufsUrl: requested } = await utapi.getSignedURL(stored.key, { expiresIn: 60 });
    expect((await bytesAt(requested)).status).toBe(200);

    const tampered = new URL(generated);
    tampered.searchParams.set('expires', String(Date.now() + 86_400_000));
    expect((await bytesAt(tampered.href)).status).toBe(403);
  });

  it('refuses API calls without the app apiKey', async () => {
    const response = await fetch(`${uploads.url}/v6/listFiles`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: '{}' });

    expect(response.status).toBe(401);
  });

  it('reports usage from the stored files', async () => {
    const files = (await utapi.listFiles()).files;

    const usage = await utapi.getUsageInfo();

    expect(usage.filesUploaded).toBe(files.length);
    expect(usage.totalBytes).toBe(files.reduce((sum, file) => sum + file.size, 0));
  });
});
