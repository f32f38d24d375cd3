/** One reading of typed and imported numbers (lib/number-text.ts): common practice, no source. */
import { describe, expect, it } from 'vitest';
import { readNumberText } from '@/lib/number-text';

const value = (text: string) => {
  const read = readNumberText(text);
  return read.ok ? read.value : read.message;
};

describe('reading a number', () => {
  it.each([
    ['23.5', 23.5],
    ['0.5', 0.5],
    ['.5', 0.5],
    ['23.', 23],
    ['  1 250 ', 1250],
    ['1\u00a0250.75', 1250.75],
    ["1'250", 1250],
    ['1,250,000', 1250000],
    ['1,250.5', 1250.5],
    ['−12', -12],
    ['-0', 0],
    ['2e3', 2000],
  ])('reads %j as %d', (text, expected) => expect(value(text)).toBe(expected));

  it.each([
    ['23,5', '“23,5”: write decimals with a point (23.5).'],
    ['3,0', '“3,0”: write decimals with a point (3.0).'],
    ['1,250', '“1,250” could be 1250 or 1.250: write 1250 or 1.250.'],
    ['-1,250', '“-1,250” could be -1250 or -1.250: write -1250 or -1.250.'],
    ['nine', '“nine” is not a number.'],
    ['', 'Enter a number.'],
    ['1e400', '“1e400” is too large.'],
    ['12,34,567', '“12,34,567” is not a number.'],
  ])('refuses %j, saying how to write it', (text, message) => expect(value(text)).toBe(message));
});
