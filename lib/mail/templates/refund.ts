import { greet, renderMail } from '../render';
import { machineName, mailDateTime, mailMoney, type MachineSummary } from '../mail-format';

export type RefundData = {
  recipientName: string | null;
  receiptNumber: string;
  machine: MachineSummary;
  reportCode?: string | null;
  amountMinor: number;
  currency: string;
  refundedAt: Date;
  reason?: string | null;
};

export function refund(data: RefundData) {
  const facts: Array<readonly [string, string]> = [
    ['Original receipt', data.receiptNumber],
    ['For', data.reportCode ? `${data.reportCode} — ${machineName(data.machine)}` : machineName(data.machine)],
    ['Amount refunded', mailMoney(data.amountMinor, data.currency)],
    ['Refunded', mailDateTime(data.refundedAt)],
  ];
  if (data.reason) facts.push(['Reason', data.reason]);
  return renderMail({
    subject: `Refund of ${mailMoney(data.amountMinor, data.currency)} for receipt ${data.receiptNumber}`,
    greeting: greet(data.recipientName),
    paragraphs: ['We have refunded your payment. Depending on your bank it can take five to ten working days to appear on your statement.'],
    facts,
    footnote: 'Questions about this refund: reply to this mail and a coordinator will answer.',
  });
}
