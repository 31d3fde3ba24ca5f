import { afterEach, describe, expect, it, vi } from 'vitest';
import { UTApi } from 'uploadthing/server';
import { ingestSurveyPhoto } from '@/lib/photos/ingest-survey-photo';
import { publicFileUrl, uploadsOrigin } from '@/lib/storage/file-url';
import { ForeignFileAddressError, uploadthingFileStore } from '@/lib/storage/uploadthing-file-store';

// The upload service's completion callback names the file to read back. Whoever can forge that
// callback must not be able to make the app request an address of their choosing.

afterEach(() => {
  vi.restoreAllMocks();
});

describe('reading an uploaded file back', () => {
  it.each([
    ['the database port on this machine', 'http://127.0.0.1:3307/'],
    ['a cloud metadata address', 'http://169.254.169.254/latest/meta-data/'],
    ['another host on the upload service’s path', 'http://10.0.0.5/f/photo.jpg'],
    ['the upload service’s host on another port', `${uploadsOrigin().replace(/:\d+$/, '')}:1/f/photo.jpg`],
    ['something that is not a URL', 'not a url'],
  ])('refuses %s without requesting it', async (_what, url) => {
    const fetchSpy = vi.spyOn(globalThis, 'fetch');
    const store = uploadthingFileStore(new UTApi());
    await expect(store.read(url)).rejects.toBeInstanceOf(ForeignFileAddressError);
    expect(fetchSpy).not.toHaveBeenCalled();
  });

  it('names the address it refused and the one it accepts', async () => {
    const store = uploadthingFileStore(new UTApi());
    await expect(store.read('http://127.0.0.1:3307/')).rejects.toThrow(`not at the upload service's own address (${uploadsOrigin()})`);
  });

  it('reads a file from the upload service’s own address', async () => {
    const fetchSpy = vi.spyOn(globalThis, 'fetch').mockResolvedValue(new Response(new Uint8Array([1, 2, 3])));
    const store = uploadthingFileStore(new UTApi());
    expect(await store.read(publicFileUrl('photo-key'))).toEqual(new Uint8Array([1, 2, 3]));
    expect(fetchSpy).toHaveBeenCalledTimes(1);
  });

  it('stops the photo pipeline before anything is stored or deleted', async () => {
    const fetchSpy = vi.spyOn(globalThis, 'fetch');
    const api = new UTApi();
    const uploadFiles = vi.spyOn(api, 'uploadFiles');
    const deleteFiles = vi.spyOn(api, 'deleteFiles');
    await expect(
      ingestSurveyPhoto(uploadthingFileStore(api), { key: 'photo-key', name: 'lathe.jpg', url: 'http://127.0.0.1:3307/' }, { inspectionId: 1, section: 'identity' }),
    ).rejects.toBeInstanceOf(ForeignFileAddressError);
    expect(fetchSpy).not.toHaveBeenCalled();
    expect(uploadFiles).not.toHaveBeenCalled();
    expect(deleteFiles).not.toHaveBeenCalled();
  });
});
