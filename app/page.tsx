import { Logo } from '@/components/ui/logo';
import { ButtonLink } from '@/components/ui/button';

const STEPS = [
  {
    title: 'Sellers list and request',
    text: 'A workshop lists its lathe with size, year and asking price, and asks for an independent inspection.',
  },
  {
    title: 'Inspectors measure on site',
    text: 'Bed levelling, spindle run-out, tailstock and a two-collar test cut, backlash, gearbox, belts, brake and electrical safety — recorded on a phone, with photos.',
  },
  {
    title: 'Readings become a grade',
    text: 'Each reading is compared with its permissible value from the machine-tool test standards, scaled to the length measured. Subsystem grades, an overall condition, repair costs and a valuation follow — with the working shown.',
  },
  {
    title: 'Buyers and dealers decide',
    text: 'Buyers pay the inspection fee to download the signed report. Dealers rank many inspected machines in one table.',
  },
];

const GRADES = ['Excellent', 'Very good', 'Good', 'Fair', 'Poor', 'Salvage'];

export default function LandingPage() {
  return (
    <div className="min-h-screen">
      <header className="mx-auto flex max-w-5xl items-center justify-between px-5 py-4">
        <Logo />
        <nav className="flex items-center gap-2">
          <ButtonLink href="/sign-in" variant="secondary">
            Sign in
          </ButtonLink>
        </nav>
      </header>

      <main>
        <section className="mx-auto max-w-5xl px-5 pb-12 pt-8 sm:pt-16">
          <p className="mb-3 text-sm font-semibold uppercase tracking-widest text-copper">Used machine tools, measured</p>
          <h1 className="max-w-3xl text-4xl font-semibold leading-tight sm:text-5xl">
            Know what a used lathe is worth before you pay for it.
          </h1>
          <p className="mt-5 max-w-2xl text-lg text-ink-soft">
            Waygrade arranges independent inspections of used centre lathes and turns the inspector&apos;s readings
            into a graded condition report: what was measured, what the standard allows, what needs repair, and
            what the machine is worth as it stands.
          </p>
          <div className="mt-8 flex flex-wrap gap-3">
            <ButtonLink href="/sign-in">Sign in to Waygrade</ButtonLink>
            <ButtonLink href="/verify" variant="secondary">
              Check a report&apos;s code
            </ButtonLink>
          </div>
        </section>

        <section aria-labelledby="how" className="border-y border-line bg-paper-raised">
          <div className="mx-auto max-w-5xl px-5 py-12">
            <h2 id="how" className="text-2xl font-semibold">
              How an inspection works
            </h2>
            <ol className="mt-6 grid gap-6 sm:grid-cols-2">
              {STEPS.map((step, index) => (
                <li key={step.title} className="flex gap-4">
                  <span className="figures flex h-10 w-10 shrink-0 items-center justify-center rounded-full bg-copper-light font-semibold text-copper-dark">
                    {index + 1}
                  </span>
                  <div>
                    <h3 className="font-semibold">{step.title}</h3>
                    <p className="mt-1 text-ink-soft">{step.text}</p>
                  </div>
                </li>
              ))}
            </ol>
          </div>
        </section>

        <section aria-labelledby="scale" className="mx-auto max-w-5xl px-5 py-12">
          <h2 id="scale" className="text-2xl font-semibold">
            One scale for every machine
          </h2>
          <p className="mt-2 max-w-2xl text-ink-soft">
            Overall condition uses the appraisers&apos; six terms. Readings that were not taken lower the report&apos;s
            stated confidence; they never pass silently. Safety defects are marked &ldquo;fix before use&rdquo; whatever
            the grade.
          </p>
          <ul className="mt-6 flex flex-wrap gap-2">
            {GRADES.map((grade) => (
              <li key={grade} className="rounded-full border border-line-strong bg-paper-raised px-4 py-1.5 font-medium">
                {grade}
              </li>
            ))}
          </ul>
        </section>
      </main>

      <footer className="border-t border-line">
        <div className="mx-auto max-w-5xl px-5 py-6 text-sm text-ink-faint">
          Waygrade reports describe a visual and measured inspection on one day. They do not replace local codes, the
          maker&apos;s instructions or licensed electrical and safety practice.
        </div>
      </footer>
    </div>
  );
}
