/** Numbers formatted for people (common practice, no source): grouping, a true minus, signed changes. */
import { describe, expect, it } from 'vitest';
import { formatChange, formatMoney, formatNumber, formatPercent } from '@/lib/format';

describe('formatting', () => {
  it('groups thousands, rounds to one decimal and puts the currency first', () => {
    expect(formatMoney(1234567.891, 'EUR')).toBe('EUR 1,234,567.9');
    expect(formatMoney(-31.04, 'EUR')).toBe('EUR −31.0');
    expect(formatNumber(0.04)).toBe('0.0');
    expect(formatNumber(-0.04)).toBe('0.0');
    expect(formatMoney(-1234567.891, 'EUR', 2)).toBe('EUR −1,234,567.89');
  });
  it('shows a dash for a missing or non-finite figure', () => {
    expect(formatMoney(null, 'EUR')).toBe('–');
    expect(formatMoney(Number.NaN)).toBe('–');
  });
  it('signs changes', () => {
    expect(formatChange(5.47, 'EUR')).toBe('EUR +5.5');
    expect(formatChange(-2.16)).toBe('−2.2');
    expect(formatChange(0.01)).toBe('0.0');
    expect(formatChange(-0.04, 'EUR')).toBe('EUR 0.0');
    expect(formatChange(-1234.56, 'EUR', 2)).toBe('EUR −1,234.56');
  });
  it('writes percentages with a space before the sign', () => {
    expect(formatPercent(0.305)).toBe('30.5 %');
    expect(formatPercent(Number.NaN)).toBe('–');
  });
});
