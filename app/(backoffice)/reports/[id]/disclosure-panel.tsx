import type { ReactNode } from 'react';
import { Card } from '@/components/ui/card';
import type { ClaimAssessment, ClaimStatus } from '@/lib/decision/disclosure-contradictions';
import { formatDate } from '@/lib/format';

/** Each status carries its word and its own shape, so it reads without colour. */
const STATUS_LOOKS: Record<ClaimStatus, { word: string; className: string; shape: ReactNode }> = {
  contradicted: {
    word: 'Contradicted by the findings',
    className: 'text-band-rebuild',
    shape: <path d="M3.5 3.5l9 9M12.5 3.5l-9 9" stroke="currentColor" strokeWidth="2.6" strokeLinecap="round" />,
  },
  unconfirmed: { word: 'Only partly checked', className: 'text-band-worn', shape: <path d="M8 1.8l6.6 12H1.4z" fill="currentColor" /> },
  consistent: {
    word: 'Agrees with the findings',
    className: 'text-band-true',
    shape: <path d="M3 8.5l3.2 3.2L13 4.8" fill="none" stroke="currentColor" strokeWidth="2.4" strokeLinecap="round" strokeLinejoin="round" />,
  },
  'not-compared': { word: 'Not compared', className: 'text-ink-soft', shape: <path d="M3 8h10" stroke="currentColor" strokeWidth="2.6" strokeLinecap="round" /> },
};

/**
 * The seller's claims beside the findings. On a released report (`stage` 'released') the answers
 * are the copy kept with the version; on the review screen ('review') they are the answers a release
 * would keep now.
 */
export function DisclosurePanel({
  assessments,
  answeredOn,
  keptWithVersion,
  stage = 'released',
}: {
  assessments: ClaimAssessment[] | null;
  answeredOn: Date | null;
  keptWithVersion: boolean;
  stage?: 'released' | 'review';
}) {
  const contradicted = assessments?.filter((a) => a.status === 'contradicted').length ?? 0;
  return (
    <Card title="The seller’s claims beside the findings" className="mt-6">
      {!keptWithVersion ? (
        <p className="text-ink-soft">This version was released before the seller’s answers were kept with each report, so none are shown.</p>
      ) : !assessments ? (
        <p className="text-ink-soft">
          {stage === 'review' ? 'The seller has not answered the disclosure questions for this machine.' : 'The seller had not answered the disclosure questions when this version was released.'}
        </p>
      ) : (
        <>
          <p className="figures text-ink-soft">
            Answers as given on {answeredOn ? formatDate(answeredOn) : ''}
            {stage === 'review' ? '; releasing keeps a copy of them with this version.' : ' and kept with this version at release.'}{' '}
            {contradicted === 0 ? 'No claim is contradicted by the findings.' : `${contradicted} ${contradicted === 1 ? 'claim is' : 'claims are'} contradicted by the findings.`}
          </p>
          <ul className="mt-4 divide-y divide-line">
            {assessments.map((a) => {
              const look = STATUS_LOOKS[a.status];
              return (
                <li key={a.claimId} data-claim={a.claimId} data-status={a.status} className="grid gap-2 py-3 sm:grid-cols-[10rem_1fr_1fr]">
                  <p className="font-medium">{a.question}</p>
                  <p>{a.claim}</p>
                  <div>
                    <p className={`flex items-center gap-2 font-medium ${look.className}`}>
                      <svg aria-hidden="true" width="16" height="16" viewBox="0 0 16 16">
                        {look.shape}
                      </svg>
                      {look.word}
                    </p>
                    {a.findings.length ? (
                      <ul className="mt-1 text-sm text-ink-soft">
                        {a.findings.map((f) => (
                          <li key={f}>{f}</li>
                        ))}
                      </ul>
                    ) : null}
                  </div>
                </li>
              );
            })}
          </ul>
        </>
      )}
    </Card>
  );
}
