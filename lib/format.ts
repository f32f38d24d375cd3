/** Numbers formatted for people: thousands separators, percentages, dates in the reader's locale. */
export function formatPercent(fraction: number, digits = 1): string {
  if (!Number.isFinite(fraction)) return '–';
  return `${(fraction * 100).toFixed(digits)} %`;
}

export function formatDateTime(value: Date | string): string {
  return new Intl.DateTimeFormat('en-GB', { dateStyle: 'medium', timeStyle: 'short', timeZone: 'UTC' }).format(new Date(value)) + ' UTC';
}

export function formatDate(value: Date | string): string {
  return new Intl.DateTimeFormat('en-GB', { dateStyle: 'medium', timeZone: 'UTC' }).format(new Date(value));
}

export const monthNames = ['January', 'February', 'March', 'April', 'May', 'June', 'July', 'August', 'September', 'October', 'November', 'December'];

/**
 * A money amount as people read it in a finance pack: grouped thousands, one decimal (the demo
 * and most cases are in millions), a true minus sign, and the currency code in front.
 */
export function formatMoney(value: number | null | undefined, currency?: string, digits = 1): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '–';
  const text = new Intl.NumberFormat('en-GB', { minimumFractionDigits: digits, maximumFractionDigits: digits }).format(Math.abs(value));
  const sign = value < 0 && Number(text.replace(/,/g, '')) !== 0 ? '−' : '';
  return `${currency ? `${currency} ` : ''}${sign}${text}`;
}

/** A number with grouped thousands and a true minus sign, for grids and tables. */
export function formatNumber(value: number | null | undefined, digits = 1): string {
  return formatMoney(value, undefined, digits);
}

/** A change, always signed (+ or −), e.g. for increments in a waterfall. */
export function formatChange(value: number, currency?: string, digits = 1): string {
  const text = formatMoney(value, currency, digits);
  return value > 0 && text.replace(/[^1-9]/g, '') !== '' ? text.replace(/^([A-Z]{3} )?/, (m) => `${m}+`) : text;
}
