import { greet, renderMail } from '../render';
import { machineName, mailDateTime, mailMoney, type MachineSummary } from '../mail-format';

export type PaymentReceiptData = {
  recipientName: string | null;
  receiptNumber: string;
  machine: MachineSummary;
  reportCode: string;
  amountMinor: number;
  currency: string;
  paidAt: Date;
  /** Where the report can be downloaded. */
  url: string;
};

export function paymentReceipt(data: PaymentReceiptData) {
  return renderMail({
    subject: `Receipt ${data.receiptNumber}: Waygrade report ${data.reportCode}`,
    greeting: greet(data.recipientName),
    paragraphs: ['Thank you for your payment. The report is yours to download as often as you need, including any later version.'],
    facts: [
      ['Receipt', data.receiptNumber],
      ['Report', `${data.reportCode} — ${machineName(data.machine)}`],
      ['Amount paid', mailMoney(data.amountMinor, data.currency)],
      ['Paid', mailDateTime(data.paidAt)],
    ],
    action: { label: 'Download the report', url: data.url },
    footnote: 'Keep this mail as your receipt.',
  });
}
