'use client';

import { useId, useState } from 'react';

export function TextInput({ label, value, onChange, multiline = false, maxLength = 200, hint }: { label: string; value: string | undefined; onChange: (value: string | undefined) => void; multiline?: boolean; maxLength?: number; hint?: string }) {
  const id = useId();
  const [text, setText] = useState(value ?? '');
  const change = (next: string) => {
    setText(next);
    onChange(next.trim() === '' ? undefined : next);
  };
  const className = 'w-full rounded-lg border border-line-strong bg-paper-raised px-3 py-2 text-lg';
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="font-medium">
        {label}
      </label>
      {hint ? <p className="-mt-0.5 text-sm text-ink-soft">{hint}</p> : null}
      {multiline ? (
        <textarea id={id} rows={3} maxLength={maxLength} value={text} onChange={(e) => change(e.target.value)} className={`${className} min-h-[96px]`} />
      ) : (
        <input id={id} type="text" maxLength={maxLength} value={text} onChange={(e) => change(e.target.value)} className={`${className} min-h-[52px]`} />
      )}
    </div>
  );
}
