'use client';

import type { SaveState } from './use-survey-autosave';

const LOOKS: Record<SaveState['kind'], { text: string; className: string; icon: string }> = {
  saved: { text: 'Saved', className: 'bg-paper-sunken text-ink', icon: '✓' },
  unsaved: { text: 'Unsaved changes', className: 'bg-copper-light text-copper-dark', icon: '●' },
  saving: { text: 'Unsaved changes · saving…', className: 'bg-copper-light text-copper-dark', icon: '●' },
  offline: { text: 'Unsaved changes · offline', className: 'bg-band-worn text-white', icon: '●' },
  conflict: { text: 'Changed on another device', className: 'bg-band-rebuild text-white', icon: '!' },
  refused: { text: 'Not saved', className: 'bg-band-rebuild text-white', icon: '!' },
};

/** Where the inspector's work stands, always in view: saved, waiting, or kept on the phone. */
export function SaveStatus({ state }: { state: SaveState }) {
  const look = LOOKS[state.kind];
  return (
    <p role="status" aria-live="polite" data-save-state={state.kind} className={`inline-flex min-h-[32px] items-center gap-1.5 rounded-full px-3 text-sm font-semibold ${look.className}`}>
      <span aria-hidden="true">{look.icon}</span>
      {look.text}
      {state.kind === 'saved' && state.at ? <span className="figures font-normal text-ink-soft">{state.at.toLocaleTimeString('en-GB', { hour: '2-digit', minute: '2-digit' })}</span> : null}
    </p>
  );
}

/** The longer explanation under the header when something needs the inspector's attention. */
export function SaveNotice({ state, onLoadTheirs, onKeepMine, onRetry }: { state: SaveState; onLoadTheirs: () => void; onKeepMine: () => void; onRetry: () => void }) {
  if (state.kind === 'offline') {
    return (
      <div className="rounded-card border-2 border-band-worn bg-[#fbf3e2] px-4 py-3" data-testid="offline-notice">
        <p className="font-semibold">Offline — changes kept on this phone</p>
        <p className="text-sm text-ink-soft">Keep working. Everything you type is stored here and sent as soon as the signal is back.</p>
      </div>
    );
  }
  if (state.kind === 'conflict') {
    return (
      <div className="flex flex-col gap-3 rounded-card border-2 border-band-rebuild bg-paper-raised px-4 py-3" data-testid="conflict-notice" role="alert">
        <p className="font-semibold">{state.message}</p>
        <p className="text-sm text-ink-soft">Nothing has been overwritten. The other device saved version {state.serverVersion}.</p>
        <div className="flex flex-wrap gap-2">
          <button type="button" onClick={onKeepMine} className="min-h-touch rounded-lg bg-copper px-4 font-semibold text-white hover:bg-copper-dark">
            Keep mine and save
          </button>
          <button type="button" onClick={onLoadTheirs} className="min-h-touch rounded-lg border border-line-strong bg-paper-raised px-4 font-semibold hover:bg-paper-sunken">
            Load the other device’s version
          </button>
        </div>
      </div>
    );
  }
  if (state.kind === 'refused') {
    return (
      <div className="flex flex-col gap-2 rounded-card border-2 border-band-rebuild bg-paper-raised px-4 py-3" role="alert">
        <p className="font-semibold">Not saved</p>
        <p className="text-sm">{state.message}</p>
        <button type="button" onClick={onRetry} className="min-h-touch self-start rounded-lg border border-line-strong px-4 font-semibold hover:bg-paper-sunken">
          Try again
        </button>
      </div>
    );
  }
  return null;
}
