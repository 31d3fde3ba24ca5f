import { greet, renderMail } from '../render';
import { machineName, type MachineSummary } from '../mail-format';

export type ReportReleasedData = {
  recipientName: string | null;
  /** The seller hears about every release; earlier buyers hear when a new version supersedes theirs. */
  audience: 'seller' | 'earlier-buyer';
  machine: MachineSummary;
  reportCode: string;
  version: number;
  /** The overall condition in the appraisers' words, e.g. "Good". */
  overallCondition?: string | null;
  url: string;
};

export function reportReleased(data: ReportReleasedData) {
  const what = machineName(data.machine);
  const facts: Array<readonly [string, string]> = [
    ['Machine', what],
    ['Report code', data.reportCode],
    ['Version', String(data.version)],
  ];
  if (data.overallCondition) facts.push(['Overall condition', data.overallCondition]);
  const paragraphs =
    data.audience === 'seller'
      ? [
          data.version > 1
            ? `A corrected report (version ${data.version}) for your ${what} has been released. It replaces the earlier version, which stays on record.`
            : `The condition report for your ${what} has been released. Buyers can now find it and pay the inspection fee to download it.`,
        ]
      : [
          `You bought the report for the ${what}. A new version (${data.version}) has been released that supersedes the one you downloaded.`,
          'You can download the new version at no charge. The earlier version stays valid as a record of what was known then.',
        ];
  return renderMail({
    subject: data.audience === 'seller' ? `Report released: ${data.machine.maker} ${data.machine.model}` : `New version of a report you bought: ${data.reportCode}`,
    greeting: greet(data.recipientName),
    paragraphs,
    facts,
    action: { label: 'Open the report', url: data.url },
    footnote: `Anyone can check that a Waygrade report is genuine with its code ${data.reportCode}.`,
  });
}
