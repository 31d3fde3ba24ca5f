import { greet, renderMail } from '../render';
import { machineName, mailDateTime, mailMoney, type MachineSummary } from '../mail-format';

export type ReinspectionPaidData = {
  recipientName: string | null;
  receiptNumber: string;
  machine: MachineSummary;
  amountMinor: number;
  currency: string;
  paidAt: Date;
  /** Where the requester follows the request. */
  url: string;
};

/** The receipt for a paid re-inspection request, with what happens next and when the fee comes back. */
export function reinspectionPaid(data: ReinspectionPaidData) {
  const what = machineName(data.machine);
  return renderMail({
    subject: `Receipt ${data.receiptNumber}: re-inspection of the ${data.machine.maker} ${data.machine.model}`,
    greeting: greet(data.recipientName),
    paragraphs: [
      `Thank you for your payment. Your request to inspect the ${what} again is with our coordinators, who will book the visit with the seller and assign an inspector.`,
      'When the new report is released it is yours to download at no further charge, and we will write to you.',
      'If the machine is sold or taken off the market before the inspector starts the visit, the visit is cancelled and the fee is refunded to you automatically. Once the visit has started there is no automatic refund.',
    ],
    facts: [
      ['Receipt', data.receiptNumber],
      ['For', `Re-inspection — ${what}`],
      ['Amount paid', mailMoney(data.amountMinor, data.currency)],
      ['Paid', mailDateTime(data.paidAt)],
    ],
    action: { label: 'Follow your request', url: data.url },
    footnote: 'Keep this mail as your receipt.',
  });
}
