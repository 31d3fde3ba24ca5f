'use client';

import { useRef, useState } from 'react';
import type { SurveyPhoto } from '@/lib/survey/survey-photo';
import type { SurveySectionId } from '@/lib/survey/survey-sections';

type Upload = { file: File; progress: number; error: string | null; busy: boolean };

type PhotoUploadModule = typeof import('./photo-upload');
let uploader: Promise<PhotoUploadModule> | null = null;

/**
 * The uploader, fetched the first time the inspector reaches for a photo control. A failed fetch
 * (no signal) is forgotten, so the Retry button fetches it again.
 */
function loadUploader(): Promise<PhotoUploadModule> {
  uploader ??= import('./photo-upload').catch((error: unknown) => {
    uploader = null;
    throw error;
  });
  return uploader;
}

/**
 * Photos for one section: the camera opens straight from the button on a phone, each upload shows
 * its progress, and a failed one keeps its file for a retry (the signal comes and goes on site).
 * The server cleans each photo (location removed, turned upright, resized) before it is kept.
 */
export function SectionPhotos({
  inspectionId,
  section,
  hint,
  photos,
  onAdded,
}: {
  inspectionId: number;
  section: SurveySectionId;
  hint: string;
  photos: readonly SurveyPhoto[];
  onAdded: (photo: SurveyPhoto) => void;
}) {
  const [uploads, setUploads] = useState<Upload[]>([]);
  const cameraInput = useRef<HTMLInputElement>(null);
  const fileInput = useRef<HTMLInputElement>(null);
  const patch = (file: File, change: Partial<Upload>) => setUploads((list) => list.map((u) => (u.file === file ? { ...u, ...change } : u)));

  async function send(file: File) {
    patch(file, { busy: true, error: null, progress: 0 });
    try {
      const { uploadSurveyPhoto } = await loadUploader();
      const answer = await uploadSurveyPhoto(file, { inspectionId, section }, (progress) => patch(file, { progress }));
      if (!answer) throw new Error('no answer');
      if (!answer.ok) {
        patch(file, { busy: false, error: answer.message });
        return;
      }
      onAdded(answer.photo);
      setUploads((list) => list.filter((u) => u.file !== file));
    } catch {
      // The uploader could not be fetched, the transfer broke off, or the server gave no answer: the
      // file stays in the list for a retry either way.
      patch(file, { busy: false, error: navigator.onLine ? 'The upload did not finish. Check the signal and try again.' : 'No signal: the photo is kept here — retry when you are back online.' });
    }
  }

  function choose(files: FileList | null) {
    for (const file of Array.from(files ?? [])) {
      setUploads((list) => [...list, { file, progress: 0, error: null, busy: true }]);
      void send(file);
    }
  }

  return (
    <section aria-labelledby={`photos-${section}`} className="rounded-card border border-line bg-paper-raised p-4" data-testid="section-photos">
      <h3 id={`photos-${section}`} className="text-lg font-semibold">
        Photos
      </h3>
      <p className="text-sm text-ink-soft">{hint}</p>
      {photos.length ? (
        <ul className="mt-3 grid grid-cols-3 gap-2">
          {photos.map((photo) => (
            <li key={photo.id}>
              <a href={photo.displayUrl} target="_blank" rel="noreferrer" className="block overflow-hidden rounded-lg border border-line">
                {/* A plain img: the server already made this thumbnail at its size, so next/image would only add its script to the survey's first load. */}
                {/* eslint-disable-next-line @next/next/no-img-element */}
                <img src={photo.thumbUrl} alt={photo.caption ?? `Photo ${photo.id}`} width={320} height={Math.round((320 * photo.heightPx) / photo.widthPx)} loading="lazy" decoding="async" className="aspect-square h-auto w-full object-cover" />
              </a>
            </li>
          ))}
        </ul>
      ) : (
        <p className="mt-2 text-sm text-ink-faint">No photos for this section yet.</p>
      )}
      {uploads.length ? (
        <ul className="mt-3 flex flex-col gap-2">
          {uploads.map((upload) => (
            <li key={`${upload.file.name}-${upload.file.lastModified}`} className="rounded-lg border border-line p-3" data-testid="photo-upload">
              <p className="truncate text-sm font-medium">{upload.file.name}</p>
              {upload.error ? (
                <div className="mt-1 flex flex-col gap-2">
                  <p className="text-sm font-medium text-band-rebuild" role="alert">
                    {upload.error}
                  </p>
                  <div className="flex gap-2">
                    <button type="button" onClick={() => void send(upload.file)} className="min-h-touch rounded-lg bg-copper px-4 font-semibold text-white">
                      Retry
                    </button>
                    <button type="button" onClick={() => setUploads((list) => list.filter((u) => u !== upload))} className="min-h-touch rounded-lg px-4 font-medium text-ink-soft hover:bg-paper-sunken">
                      Discard
                    </button>
                  </div>
                </div>
              ) : (
                <div className="mt-2 h-3 overflow-hidden rounded-full bg-paper-sunken" role="progressbar" aria-label={`Uploading ${upload.file.name}`} aria-valuemin={0} aria-valuemax={100} aria-valuenow={upload.progress}>
                  <div className="h-full rounded-full bg-copper transition-[width]" style={{ width: `${Math.max(upload.progress, 4)}%` }} />
                </div>
              )}
            </li>
          ))}
        </ul>
      ) : null}
      <div className="mt-3 grid grid-cols-2 gap-2">
        <button type="button" onPointerDown={() => void loadUploader().catch(() => undefined)} onClick={() => cameraInput.current?.click()} className="min-h-[52px] rounded-lg bg-copper px-4 font-semibold text-white hover:bg-copper-dark">
          Take photo
        </button>
        <button type="button" onPointerDown={() => void loadUploader().catch(() => undefined)} onClick={() => fileInput.current?.click()} className="min-h-[52px] rounded-lg border border-line-strong bg-paper-raised px-4 font-semibold hover:bg-paper-sunken">
          Choose photo
        </button>
      </div>
      <input ref={cameraInput} type="file" accept="image/*" capture="environment" className="sr-only" tabIndex={-1} aria-hidden="true" onChange={(e) => { choose(e.target.files); e.target.value = ''; }} />
      <input ref={fileInput} type="file" accept="image/*" className="sr-only" tabIndex={-1} aria-label="Choose a photo" data-testid="photo-file-input" onChange={(e) => { choose(e.target.files); e.target.value = ''; }} />
    </section>
  );
}
