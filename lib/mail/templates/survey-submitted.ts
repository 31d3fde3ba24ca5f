import { greet, renderMail } from '../render';
import { machineName, mailDateTime, type MachineSummary } from '../mail-format';

export type SurveySubmittedData = {
  coordinatorName: string | null;
  machine: MachineSummary;
  inspectorName: string;
  submittedAt: Date;
  /** Number of readings outside their permissible value, shown so urgent reviews stand out. */
  findingsOutOfTolerance?: number;
  /** The review page. */
  url: string;
};

export function surveySubmitted(data: SurveySubmittedData) {
  const facts: Array<readonly [string, string]> = [
    ['Machine', machineName(data.machine)],
    ['Inspector', data.inspectorName],
    ['Submitted', mailDateTime(data.submittedAt)],
  ];
  if (data.findingsOutOfTolerance !== undefined) facts.push(['Readings outside tolerance', String(data.findingsOutOfTolerance)]);
  return renderMail({
    subject: `Survey ready for review: ${data.machine.maker} ${data.machine.model}`,
    greeting: greet(data.coordinatorName),
    paragraphs: [`${data.inspectorName} has submitted the survey of the ${machineName(data.machine)}. It is waiting for your review before the report can be released.`],
    facts,
    action: { label: 'Review the survey', url: data.url },
  });
}
