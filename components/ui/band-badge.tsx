import type { ReactNode } from 'react';
import { BAND_TABLE, type CheckBand } from '@/lib/scoring/grading/bands';

/**
 * A check's condition band as Waygrade shows it everywhere (survey, review, PDF): the band's word,
 * its own shape and its colour, so it reads without colour too. White on each band colour passes
 * 4.5:1. `band` null means the check was not measured.
 */
type BandLook = { className: string; shape: 'disc' | 'tick' | 'diamond' | 'triangle' | 'cross' | 'dash' };

const BAND_LOOKS: Readonly<Record<CheckBand | 'not-measured', BandLook>> = {
  sharp: { className: 'bg-band-true', shape: 'disc' },
  'in-limit': { className: 'bg-band-true', shape: 'tick' },
  serviceable: { className: 'bg-band-fair', shape: 'diamond' },
  worn: { className: 'bg-band-worn', shape: 'triangle' },
  unfit: { className: 'bg-band-rebuild', shape: 'cross' },
  'not-measured': { className: 'bg-band-unknown', shape: 'dash' },
};

const SHAPES: Readonly<Record<BandLook['shape'], ReactNode>> = {
  disc: <circle cx="8" cy="8" r="5.5" fill="currentColor" />,
  tick: <path d="M3 8.5l3.2 3.2L13 4.8" fill="none" stroke="currentColor" strokeWidth="2.4" strokeLinecap="round" strokeLinejoin="round" />,
  diamond: <path d="M8 1.8L14.2 8 8 14.2 1.8 8z" fill="currentColor" />,
  triangle: <path d="M8 1.8l6.6 12H1.4z" fill="currentColor" />,
  cross: <path d="M3.5 3.5l9 9M12.5 3.5l-9 9" stroke="currentColor" strokeWidth="2.6" strokeLinecap="round" />,
  dash: <path d="M3 8h10" stroke="currentColor" strokeWidth="2.6" strokeLinecap="round" />,
};

export function bandWord(band: CheckBand | null): string {
  return band ? (BAND_TABLE.find((b) => b.band === band)?.label ?? band) : 'Not measured';
}

export function BandBadge({ band, size = 'md', className = '' }: { band: CheckBand | null; size?: 'sm' | 'md'; className?: string }) {
  const look = BAND_LOOKS[band ?? 'not-measured'];
  const meaning = band ? BAND_TABLE.find((b) => b.band === band)?.meaning : 'no reading yet';
  return (
    <span
      className={`inline-flex shrink-0 items-center gap-1.5 rounded-full font-semibold text-white ${look.className} ${
        size === 'sm' ? 'px-2 py-0.5 text-sm' : 'px-3 py-1 text-base'
      } ${className}`}
      title={meaning}
      data-band={band ?? 'not-measured'}
    >
      <svg aria-hidden="true" viewBox="0 0 16 16" className={size === 'sm' ? 'h-3.5 w-3.5' : 'h-4 w-4'}>
        {SHAPES[look.shape]}
      </svg>
      {bandWord(band)}
    </span>
  );
}
