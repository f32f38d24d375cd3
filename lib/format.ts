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

const numberFormats = new Map<string, Intl.NumberFormat>();

/**
 * Grouped thousands and a fixed number of decimals by Intl's own options: `negative` signs
 * negative figures only, `exceptZero` every figure but zero, and a figure that rounds to zero
 * is never signed in either (Intl rounds before it signs). The hyphen Intl writes for minus
 * becomes the true minus sign a printed pack uses.
 */
function grouped(value: number, digits: number, signDisplay: 'negative' | 'exceptZero'): string {
  const key = `${digits}|${signDisplay}`;
  let format = numberFormats.get(key);
  if (!format) numberFormats.set(key, (format = new Intl.NumberFormat('en-GB', { minimumFractionDigits: digits, maximumFractionDigits: digits, signDisplay })));
  return format
    .formatToParts(value)
    .map((part) => (part.type === 'minusSign' ? '−' : part.value))
    .join('');
}

const withCurrency = (text: string, currency?: string) => (currency ? `${currency} ${text}` : text);

/**
 * A money amount as people read it in a finance pack: grouped thousands, one decimal (the demo
 * and most cases are in millions), a true minus sign, and the currency code in front.
 */
export function formatMoney(value: number | null | undefined, currency?: string, digits = 1): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '–';
  return withCurrency(grouped(value, digits, 'negative'), currency);
}

/** A number with grouped thousands and a true minus sign, for grids and tables. */
export function formatNumber(value: number | null | undefined, digits = 1): string {
  return formatMoney(value, undefined, digits);
}

/** A change, always signed (+ or −) unless it rounds to zero, e.g. for increments in a waterfall. */
export function formatChange(value: number, currency?: string, digits = 1): string {
  if (!Number.isFinite(value)) return '–';
  return withCurrency(grouped(value, digits, 'exceptZero'), currency);
}
