import { greet, renderMail } from '../render';
import { machineName, mailDateTime, type MachineSummary } from '../mail-format';

export type InspectionCancelledData = {
  recipientName: string | null;
  /** The seller hears it was cancelled; an assigned inspector hears the visit is off. */
  audience: 'seller' | 'inspector';
  machine: MachineSummary;
  scheduledAt: Date | null;
  reason: string;
  cancelledBy: string;
  url: string;
};

export function inspectionCancelled(data: InspectionCancelledData) {
  const what = machineName(data.machine);
  const facts: Array<readonly [string, string]> = [
    ['Machine', what],
    ['Reason', data.reason],
    ['Cancelled by', data.cancelledBy],
  ];
  if (data.scheduledAt) facts.splice(1, 0, ['Visit that was booked', mailDateTime(data.scheduledAt)]);
  return renderMail({
    subject: `Inspection cancelled: ${data.machine.maker} ${data.machine.model}`,
    greeting: greet(data.recipientName),
    paragraphs: [
      data.audience === 'seller'
        ? `The inspection of your ${what} has been cancelled. You can request a new one from the machine's page at any time.`
        : `The visit to inspect the ${what} is cancelled. It has been taken off your jobs.`,
    ],
    facts,
    action: { label: data.audience === 'seller' ? 'Open the machine' : 'Open your jobs', url: data.url },
  });
}
