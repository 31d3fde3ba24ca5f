'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Field, FormMessage, INPUT_CLASS } from '@/components/forms/field';
import { releaseReportAction, reopenForCorrectionAction, sendSurveyBackAction } from '../../actions';

type Decision = 'release' | 'send-back' | 'reopen';

const ACTIONS = {
  release: { call: releaseReportAction, button: 'Release the report', done: 'Released. The seller has been e-mailed.' },
  'send-back': { call: sendSurveyBackAction, button: 'Send back to the inspector', done: 'Sent back. The survey is open again for the inspector.' },
  reopen: { call: reopenForCorrectionAction, button: 'Reopen for correction', done: 'Reopened. The corrected report will be released as a new version.' },
} as const;

export function ReviewActions({ inspectionId, reportId, decisions }: { inspectionId: number; reportId: number | null; decisions: Decision[] }) {
  const router = useRouter();
  const [comment, setComment] = useState('');
  const [message, setMessage] = useState<{ text: string; tone: 'error' | 'ok' } | null>(null);
  const [pending, setPending] = useState<Decision | null>(null);

  async function decide(decision: Decision) {
    setPending(decision);
    setMessage(null);
    const result = await ACTIONS[decision].call({ inspectionId, reportId, comment });
    setPending(null);
    if (!result.ok) return setMessage({ text: result.fieldErrors?.comment?.[0] ?? result.message, tone: 'error' });
    setMessage({ text: ACTIONS[decision].done, tone: 'ok' });
    setComment('');
    router.refresh();
  }

  if (decisions.length === 0) {
    return (
      <div className="space-y-4">
        <FormMessage message={message?.text} tone={message?.tone} />
        <p className="text-ink-soft">Nothing to decide now: the survey is with the inspector.</p>
      </div>
    );
  }

  return (
    <div className="space-y-4">
      <Field id="review-comment" label="Comment" hint="Required when sending back or reopening; kept on the timeline.">
        <textarea id="review-comment" rows={3} value={comment} onChange={(e) => setComment(e.target.value)} className={`${INPUT_CLASS} py-2`} />
      </Field>
      <FormMessage message={message?.text} tone={message?.tone} />
      <div className="flex flex-wrap gap-3">
        {decisions.map((decision) => (
          <Button key={decision} variant={decision === 'release' ? 'primary' : 'secondary'} disabled={pending !== null} onClick={() => decide(decision)}>
            {pending === decision ? 'Working…' : ACTIONS[decision].button}
          </Button>
        ))}
      </div>
    </div>
  );
}
