import type { ReactNode } from 'react';

const TONES = {
  error: { box: 'border-band-rebuild/40 bg-band-rebuild/5 text-band-rebuild', mark: '!' },
  success: { box: 'border-band-true/40 bg-band-true/5 text-band-true', mark: '✓' },
  info: { box: 'border-line-strong bg-paper-sunken text-ink', mark: 'i' },
} as const;

/** A message above or below a form; the mark keeps the tone readable without colour. */
export function FormAlert({ tone, children }: { tone: keyof typeof TONES; children: ReactNode }) {
  const { box, mark } = TONES[tone];
  return (
    <div role={tone === 'error' ? 'alert' : 'status'} className={`flex gap-3 rounded-lg border px-3 py-2 ${box}`}>
      <span aria-hidden="true" className="mt-0.5 flex h-5 w-5 shrink-0 items-center justify-center rounded-full border border-current text-xs font-bold">
        {mark}
      </span>
      <div>{children}</div>
    </div>
  );
}
