import { greet, renderMail } from '../render';
import { machineName, type MachineSummary } from '../mail-format';

export type ReinspectionReportReadyData = {
  recipientName: string | null;
  machine: MachineSummary;
  reportCode: string;
  overallCondition?: string | null;
  /** Where the new report is downloaded. */
  url: string;
};

/** The requester of a re-inspection hears that the new report is released and already theirs. */
export function reinspectionReportReady(data: ReinspectionReportReadyData) {
  const what = machineName(data.machine);
  const facts: Array<readonly [string, string]> = [
    ['Machine', what],
    ['Report code', data.reportCode],
  ];
  if (data.overallCondition) facts.push(['Overall condition', data.overallCondition]);
  return renderMail({
    subject: `New report from the re-inspection you requested: ${data.reportCode}`,
    greeting: greet(data.recipientName),
    paragraphs: [
      `The ${what} has been inspected again at your request and the new report is released.`,
      'You paid for it with your request, so it is already in your downloads at no further charge.',
    ],
    facts,
    action: { label: 'Download the new report', url: data.url },
    footnote: `Anyone can check that a Waygrade report is genuine with its code ${data.reportCode}.`,
  });
}
