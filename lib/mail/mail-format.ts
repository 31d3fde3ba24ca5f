import { formatDateTime, formatMoney } from '@/lib/format';

/** A machine as mails name it: "Harlow Turnmaster 280 (serial HT-1182)". */
export type MachineSummary = { maker: string; model: string; serialNumber?: string | null };

export function machineName(machine: MachineSummary) {
  const name = `${machine.maker} ${machine.model}`;
  return machine.serialNumber ? `${name} (serial ${machine.serialNumber})` : name;
}

/** Times in mail are UTC and say so: the reader's mail client may be in any zone. */
export function mailDateTime(value: Date) {
  return `${formatDateTime(value)} UTC`;
}

export function mailMoney(minor: number, currency: string) {
  // formatMoney rounds to whole units for listings; receipts show cents.
  return minor % 100 === 0
    ? formatMoney(minor, currency)
    : new Intl.NumberFormat('en-GB', { style: 'currency', currency }).format(minor / 100);
}
