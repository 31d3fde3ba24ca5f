import type { Metadata } from 'next';
import { redirect } from 'next/navigation';
import { Logo } from '@/components/ui/logo';
import { Button } from '@/components/ui/button';

export const metadata: Metadata = { title: 'Check a report' };

async function lookUp(formData: FormData) {
  'use server';
  // Codes are read aloud and retyped: spaces are dropped and missing dashes put back.
  const typed = String(formData.get('code') ?? '').replace(/\s+/g, '').toUpperCase();
  const code = /^WG[0-9A-Z]{12}$/.test(typed) ? `WG-${typed.slice(2, 6)}-${typed.slice(6, 10)}-${typed.slice(10)}` : typed;
  redirect(`/verify/${encodeURIComponent(code || '-')}`);
}

export default function VerifyPage() {
  return (
    <main className="mx-auto flex min-h-screen max-w-md flex-col justify-center px-5 py-12">
      <Logo />
      <h1 className="mt-8 text-3xl font-semibold">Check a report</h1>
      <p className="mt-2 text-ink-soft">
        Every Waygrade report carries a code on its cover and in its footer. Enter it to see whether the report is
        genuine and whether a newer version exists.
      </p>
      <form action={lookUp} className="mt-6 space-y-4">
        <label className="block">
          <span className="font-medium">Report code</span>
          <input
            name="code"
            required
            placeholder="WG-7K3P-Q9XD-4MRT"
            autoCapitalize="characters"
            className="figures mt-1 block min-h-touch w-full rounded-lg border border-line-strong bg-paper-raised px-3 uppercase"
          />
        </label>
        <Button type="submit" className="w-full">
          Check
        </Button>
      </form>
    </main>
  );
}
