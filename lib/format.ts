// Display formats shared by pages and the PDF: one place so figures read the same everywhere.
// Each formatter is built once: building an Intl formatter costs far more than using one.

const MONEY_FORMATS = new Map<string, Intl.NumberFormat>();
const DATE_FORMAT = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' });
const DATE_TIME_FORMAT = new Intl.DateTimeFormat('en-GB', {
  day: 'numeric',
  month: 'short',
  year: 'numeric',
  hour: '2-digit',
  minute: '2-digit',
  timeZone: 'UTC',
});
const WHOLE_NUMBER_FORMAT = new Intl.NumberFormat('en-GB');

function moneyFormat(currency: string) {
  let format = MONEY_FORMATS.get(currency);
  if (!format) {
    format = new Intl.NumberFormat('en-GB', { style: 'currency', currency, maximumFractionDigits: 0 });
    MONEY_FORMATS.set(currency, format);
  }
  return format;
}

export function formatMoney(minor: number | null | undefined, currency = 'EUR') {
  if (minor === null || minor === undefined) return '—';
  return moneyFormat(currency).format(minor / 100);
}

export function formatDate(value: Date | null | undefined) {
  if (!value) return '—';
  return DATE_FORMAT.format(value);
}

export function formatDateTime(value: Date | null | undefined) {
  if (!value) return '—';
  return DATE_TIME_FORMAT.format(value);
}

export function formatMm(value: number | null | undefined) {
  return value === null || value === undefined ? '—' : `${WHOLE_NUMBER_FORMAT.format(value)} mm`;
}
