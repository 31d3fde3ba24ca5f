import type { Metadata } from 'next';
import Link from 'next/link';
import { Logo } from '@/components/ui/logo';
import { ButtonLink } from '@/components/ui/button';
import { ConditionBadge } from '@/components/ui/condition-badge';
import { findReportByVerificationCode } from '@/db/queries/verification';
import { verificationCodeSchema } from '@/lib/validation/verification-code';
import { formatDate } from '@/lib/format';
import { ReleasedFileCheck } from './released-file-check';

export const metadata: Metadata = { title: 'Report check', robots: { index: false } };

type Found = NonNullable<Awaited<ReturnType<typeof findReportByVerificationCode>>>;

/** The three answers for a genuine code, each with a word, a mark and a colour, never colour alone. */
function verdictOf(report: Found) {
  if (report.status === 'withdrawn') {
    return {
      mark: '!',
      title: 'Genuine, but withdrawn',
      tone: 'border-band-rebuild text-band-rebuild',
      text: `Waygrade issued this report and withdrew it on ${formatDate(report.withdrawnAt)}. Do not rely on it.`,
    };
  }
  if (report.newerVersion) {
    return {
      mark: '!',
      title: 'Genuine, but replaced by a newer version',
      tone: 'border-band-worn text-band-worn',
      text: `Version ${report.newerVersion.version} was released on ${formatDate(report.newerVersion.releasedAt)} and corrects this one. Ask the seller for the current version.`,
    };
  }
  return { mark: '✓', title: 'Genuine Waygrade report', tone: 'border-band-true text-band-true', text: 'This is the current version of the report.' };
}

export default async function VerifyCodePage({ params }: { params: Promise<{ code: string }> }) {
  const { code: raw } = await params;
  const typed = decodeURIComponent(raw);
  const parsed = verificationCodeSchema.safeParse(typed);
  const report = parsed.success ? await findReportByVerificationCode(parsed.data) : null;
  const verdict = report ? verdictOf(report) : null;

  return (
    <main className="mx-auto flex min-h-screen max-w-lg flex-col justify-center px-5 py-12">
      <Logo />
      <h1 className="mt-8 text-3xl font-semibold">Report check</h1>
      {!report || !verdict ? (
        <section aria-live="polite" className="mt-6 rounded-card border-2 border-band-rebuild bg-paper-raised p-6">
          <p className="flex items-center gap-2 text-xl font-semibold text-band-rebuild">
            <span aria-hidden="true">✕</span> Not a Waygrade report
          </p>
          <p className="mt-2 text-ink-soft">
            {parsed.success
              ? 'No report issued by Waygrade carries this code. Check the code for typing errors; if it is right, the document did not come from Waygrade.'
              : parsed.error.issues[0]?.message}
          </p>
          <p className="figures mt-3 text-sm">Code checked: {typed}</p>
        </section>
      ) : (
        <section aria-live="polite" className={`mt-6 rounded-card border-2 bg-paper-raised p-6 ${verdict.tone}`}>
          <p className="flex items-center gap-2 text-xl font-semibold">
            <span aria-hidden="true">{verdict.mark}</span> {verdict.title}
          </p>
          <p className="mt-2 text-ink">{verdict.text}</p>
          <dl className="figures mt-4 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1.5 text-ink">
            <dt className="text-ink-soft">Code</dt>
            <dd className="whitespace-nowrap">{parsed.data}</dd>
            <dt className="text-ink-soft">Machine</dt>
            <dd>
              {report.maker} {report.model}
              {report.serialNumber ? `, serial ${report.serialNumber}` : ''}
            </dd>
            <dt className="text-ink-soft">Report</dt>
            <dd>
              No. {report.id}, version {report.version}
            </dd>
            <dt className="text-ink-soft">Released</dt>
            <dd>{formatDate(report.releasedAt)}</dd>
            {report.withdrawnAt ? (
              <>
                <dt className="text-ink-soft">Withdrawn</dt>
                <dd>{formatDate(report.withdrawnAt)}</dd>
              </>
            ) : null}
            <dt className="text-ink-soft">Overall condition</dt>
            <dd>
              <ConditionBadge grade={report.overallCondition} provisional={report.overallProvisional} />
            </dd>
          </dl>
          {report.newerVersion && report.status !== 'withdrawn' ? (
            <p className="mt-4 text-sm text-ink">
              Current version&apos;s code:{' '}
              <Link className="figures font-medium underline" href={`/verify/${report.newerVersion.verificationCode}`}>
                {report.newerVersion.verificationCode}
              </Link>
            </p>
          ) : null}
          <p className="mt-4 text-sm text-ink-soft">
            The measured checks, photos, repair estimate and valuation are in the report itself; this page only says whether it is genuine and current.
          </p>
          <div className="mt-4 border-t border-line pt-4 text-sm">
            <p className="text-ink-soft">SHA-256 fingerprint of the released file</p>
            {report.pdfSha256 ? (
              <p className="figures mt-1 break-all text-ink" data-testid="released-file-sha256">
                {report.pdfSha256}
              </p>
            ) : (
              <p className="mt-1 text-ink">The file for this version is still being prepared; look again in a few minutes.</p>
            )}
          </div>
        </section>
      )}
      {report && report.pdfSha256 ? <ReleasedFileCheck sha256={report.pdfSha256} /> : null}
      <div className="mt-6">
        <ButtonLink href="/verify" variant="secondary">
          Check another code
        </ButtonLink>
      </div>
    </main>
  );
}
