import type { Metadata } from 'next';
import { Logo } from '@/components/ui/logo';
import { ButtonLink } from '@/components/ui/button';
import { findReportByVerificationCode } from '@/db/queries/verification';
import { verificationCodeSchema } from '@/lib/validation/verification-code';
import { formatDate } from '@/lib/format';

export const metadata: Metadata = { title: 'Report check', robots: { index: false } };

export default async function VerifyCodePage({ params }: { params: Promise<{ code: string }> }) {
  const { code: raw } = await params;
  const parsed = verificationCodeSchema.safeParse(decodeURIComponent(raw));
  const report = parsed.success ? await findReportByVerificationCode(parsed.data) : null;

  return (
    <main className="mx-auto flex min-h-screen max-w-lg flex-col justify-center px-5 py-12">
      <Logo />
      {!report ? (
        <section className="mt-8 rounded-card border-2 border-band-rebuild bg-paper-raised p-6">
          <p className="flex items-center gap-2 text-xl font-semibold text-band-rebuild">
            <span aria-hidden="true">✕</span> Not a Waygrade report
          </p>
          <p className="mt-2 text-ink-soft">
            {parsed.success
              ? 'No released report carries this code. Check the code for typing errors; if it is right, the document was not issued by Waygrade.'
              : parsed.error.issues[0]?.message}
          </p>
          <p className="figures mt-3 text-sm">Code checked: {decodeURIComponent(raw)}</p>
        </section>
      ) : (
        <section
          className={`mt-8 rounded-card border-2 bg-paper-raised p-6 ${report.status === 'withdrawn' ? 'border-band-worn' : 'border-band-true'}`}
        >
          <p className={`flex items-center gap-2 text-xl font-semibold ${report.status === 'withdrawn' ? 'text-band-worn' : 'text-band-true'}`}>
            <span aria-hidden="true">{report.status === 'withdrawn' ? '!' : '✓'}</span>
            {report.status === 'withdrawn' ? 'Genuine, but withdrawn' : 'Genuine Waygrade report'}
          </p>
          <dl className="figures mt-4 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
            <dt className="text-ink-soft">Machine</dt>
            <dd>
              {report.maker} {report.model}
              {report.serialNumber ? `, serial ${report.serialNumber}` : ''}
            </dd>
            <dt className="text-ink-soft">Version</dt>
            <dd>{report.version}</dd>
            <dt className="text-ink-soft">Released</dt>
            <dd>{formatDate(report.releasedAt)}</dd>
            {report.withdrawnAt ? (
              <>
                <dt className="text-ink-soft">Withdrawn</dt>
                <dd>{formatDate(report.withdrawnAt)}</dd>
              </>
            ) : null}
          </dl>
          {report.newerVersion ? (
            <p className="mt-4 rounded-lg bg-band-worn/10 px-3 py-2 text-band-worn">
              Superseded: version {report.newerVersion.version} was released on {formatDate(report.newerVersion.releasedAt)}.
              Ask the seller for the current version.
            </p>
          ) : report.status === 'released' ? (
            <p className="mt-4 text-ink-soft">This is the current version of the report.</p>
          ) : null}
        </section>
      )}
      <div className="mt-6">
        <ButtonLink href="/verify" variant="secondary">
          Check another code
        </ButtonLink>
      </div>
    </main>
  );
}
