// Display formats shared by pages and the PDF: one place so figures read the same everywhere.

export function formatMoney(minor: number | null | undefined, currency = 'EUR') {
  if (minor === null || minor === undefined) return '—';
  return new Intl.NumberFormat('en-GB', { style: 'currency', currency, maximumFractionDigits: 0 }).format(minor / 100);
}

export function formatDate(value: Date | null | undefined) {
  if (!value) return '—';
  return new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' }).format(value);
}

export function formatDateTime(value: Date | null | undefined) {
  if (!value) return '—';
  return new Intl.DateTimeFormat('en-GB', {
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    hour: '2-digit',
    minute: '2-digit',
    timeZone: 'UTC',
  }).format(value);
}

export function formatMm(value: number | null | undefined) {
  return value === null || value === undefined ? '—' : `${value.toLocaleString('en-GB')} mm`;
}
