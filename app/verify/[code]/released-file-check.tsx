'use client';

import { useId, useState } from 'react';

type Verdict = { kind: 'checking' } | { kind: 'match'; name: string } | { kind: 'differs'; name: string; digest: string } | { kind: 'error'; message: string };

/** Lower-case hex SHA-256 of a file, computed in this browser by Web Crypto: the file never leaves it. */
async function sha256OfFile(file: File) {
  const digest = await crypto.subtle.digest('SHA-256', await file.arrayBuffer());
  return Array.from(new Uint8Array(digest), (byte) => byte.toString(16).padStart(2, '0')).join('');
}

/**
 * Checks a PDF someone holds against the file released under this code: the browser computes its
 * SHA-256 and compares it with the recorded one. Nothing is uploaded.
 */
export function ReleasedFileCheck({ sha256 }: { sha256: string }) {
  const inputId = useId();
  const [verdict, setVerdict] = useState<Verdict | null>(null);
  const [dragging, setDragging] = useState(false);

  async function check(file: File | undefined) {
    if (!file) return;
    setVerdict({ kind: 'checking' });
    try {
      const digest = await sha256OfFile(file);
      setVerdict(digest === sha256 ? { kind: 'match', name: file.name } : { kind: 'differs', name: file.name, digest });
    } catch {
      setVerdict({ kind: 'error', message: 'This browser could not read the file. Try choosing it again.' });
    }
  }

  return (
    <section aria-labelledby={`${inputId}-heading`} className="mt-6 rounded-card border border-line bg-paper-raised p-6">
      <h2 id={`${inputId}-heading`} className="text-lg font-semibold">
        Check a report file
      </h2>
      <p className="mt-1 text-sm text-ink-soft">
        Drop the PDF here or choose it. Your browser works out its fingerprint and compares it with the file released under this code; the file is not
        uploaded.
      </p>
      <label
        htmlFor={inputId}
        onDragOver={(event) => {
          event.preventDefault();
          setDragging(true);
        }}
        onDragLeave={() => setDragging(false)}
        onDrop={(event) => {
          event.preventDefault();
          setDragging(false);
          void check(event.dataTransfer.files[0]);
        }}
        className={`mt-4 flex min-h-24 cursor-pointer flex-col items-center justify-center rounded-lg border-2 border-dashed px-4 py-5 text-center ${
          dragging ? 'border-copper bg-paper-sunken' : 'border-line-strong'
        }`}
      >
        <span className="font-medium">Drop the report PDF here</span>
        <span className="text-sm text-ink-soft">or click to choose a file</span>
        <input
          id={inputId}
          type="file"
          accept="application/pdf,.pdf"
          className="sr-only"
          data-testid="released-file-input"
          onChange={(event) => void check(event.target.files?.[0])}
        />
      </label>
      <div aria-live="polite" className="mt-4" data-testid="released-file-verdict">
        {verdict?.kind === 'checking' ? <p className="text-ink-soft">Checking…</p> : null}
        {verdict?.kind === 'match' ? (
          <p className="flex items-center gap-2 font-semibold text-band-true">
            <span aria-hidden="true">✓</span> This file is the report released under this code.
          </p>
        ) : null}
        {verdict?.kind === 'differs' ? (
          <>
            <p className="flex items-center gap-2 font-semibold text-band-rebuild">
              <span aria-hidden="true">✕</span> This file is not the released report.
            </p>
            <p className="mt-1 text-sm text-ink-soft">
              It differs from the file released under this code, even if it looks the same: it may have been altered, or belong to another version. Its
              fingerprint is <span className="figures break-all">{verdict.digest}</span>.
            </p>
          </>
        ) : null}
        {verdict?.kind === 'error' ? <p className="text-band-rebuild">{verdict.message}</p> : null}
      </div>
    </section>
  );
}
