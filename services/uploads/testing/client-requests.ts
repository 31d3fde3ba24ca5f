// The two requests uploadthing's browser client makes, written out for tests that need to
// alter one of them (a tampered URL, more bytes than declared). The untouched flow is
// exercised with the real client in chromium (browser-upload.test.ts).

export interface PresignedUpload {
  url: string;
  key: string;
  name: string;
  customId: string | null;
}

export interface PhotoDescription {
  name: string;
  size: number;
  type: string;
}

/** Step one: the client asks the app's route handler for presigned ingest URLs. */
export async function requestPresignedUploads(routeUrl: string, slug: string, inspectionId: string, files: PhotoDescription[]): Promise<PresignedUpload[]> {
  const url = new URL(routeUrl);
  url.searchParams.set('actionType', 'upload');
  url.searchParams.set('slug', slug);
  const response = await fetch(url, {
    method: 'POST',
    headers: { 'content-type': 'application/json', 'x-uploadthing-package': 'waygrade-tests', 'x-inspection-id': inspectionId },
    body: JSON.stringify({ input: null, files: files.map((file) => ({ ...file, lastModified: Date.now() })) }),
  });
  if (!response.ok) throw new Error(`The route handler refused to presign: ${response.status} ${await response.text()}`);
  return (await response.json()) as PresignedUpload[];
}

/** Step two: the client PUTs the file as multipart form data with a "file" part. */
export async function putFileLikeTheClient(presignedUrl: string, bytes: Uint8Array, name: string, type: string): Promise<Response> {
  const form = new FormData();
  form.append('file', new File([new Uint8Array(bytes)], name, { type }));
  return fetch(presignedUrl, { method: 'PUT', headers: { range: 'bytes=0-', 'x-uploadthing-version': '7.7.4' }, body: form });
}
