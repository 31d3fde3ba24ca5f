import type { ReactNode } from 'react';

/** A titled group of fields inside a section screen (one instrument set-up, one test). */
export function FieldGroup({ title, hint, children }: { title: string; hint?: string; children: ReactNode }) {
  return (
    <section aria-label={title} className="flex flex-col gap-4 rounded-card border border-line bg-paper-raised p-4">
      <div>
        <h3 className="text-lg font-semibold">{title}</h3>
        {hint ? <p className="text-sm text-ink-soft">{hint}</p> : null}
      </div>
      {children}
    </section>
  );
}
