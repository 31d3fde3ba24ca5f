import { Logo } from '@/components/ui/logo';
import { ButtonLink } from '@/components/ui/button';

export default function NotFound() {
  return (
    <main className="mx-auto flex min-h-screen max-w-xl flex-col justify-center px-5 py-12">
      <Logo />
      <p className="figures mt-10 text-sm font-semibold uppercase tracking-widest text-copper">Error 404</p>
      <h1 className="mt-2 text-3xl font-semibold">This page is off the bed.</h1>
      <p className="mt-3 text-ink-soft">
        There is nothing at this address. The link may be old, or the machine or report may have been withdrawn.
      </p>
      <div className="mt-8 flex gap-3">
        <ButtonLink href="/">Go to the start page</ButtonLink>
        <ButtonLink href="/dashboard" variant="secondary">
          Your overview
        </ButtonLink>
      </div>
    </main>
  );
}
