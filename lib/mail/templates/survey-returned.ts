import { greet, renderMail } from '../render';
import { machineName, type MachineSummary } from '../mail-format';

export type SurveyReturnedData = {
  inspectorName: string | null;
  machine: MachineSummary;
  coordinatorName: string;
  comment: string;
  /** True when a released report is being corrected rather than a draft sent back. */
  correction: boolean;
  url: string;
};

export function surveyReturned(data: SurveyReturnedData) {
  const what = machineName(data.machine);
  return renderMail({
    subject: `${data.correction ? 'Correction needed' : 'Survey sent back'}: ${data.machine.maker} ${data.machine.model}`,
    greeting: greet(data.inspectorName),
    paragraphs: [
      data.correction
        ? `${data.coordinatorName} has reopened the survey of the ${what} so its released report can be corrected. The correction will be released as a new version.`
        : `${data.coordinatorName} has sent the survey of the ${what} back to you before release.`,
      'Your readings are kept as you left them; change what is asked and submit again.',
    ],
    facts: [
      ['Machine', what],
      ['Comment', data.comment],
    ],
    action: { label: 'Open the survey', url: data.url },
  });
}
