/**
 * Reads a number a person typed or a file holds, one rule everywhere (the cash-flow grid, the
 * option cards, the workbook and CSV readers). The decimal separator is the point. Spaces
 * (also no-break and thin ones) and apostrophes may group thousands; a comma may too, but only
 * in full groups of three with more than one group or a decimal point ("1,250,000",
 * "1,250.5"). A comma that could be a decimal comma ("23,5", "3,0", "1,250") is refused with a
 * message saying how to write it, never guessed: 23,5 read as 235 put a figure ten times too
 * large in front of a committee.
 */
export type NumberText = { ok: true; value: number } | { ok: false; message: string };

const MINUS = /^[−–-]/;
const PLAIN = /^\d+(\.\d*)?$|^\.\d+$/;
const SCIENTIFIC = /^(\d+(\.\d*)?|\.\d+)e[+-]?\d+$/i;
const COMMA_GROUPS = /^\d{1,3}(,\d{3})+(\.\d+)?$/;

export function readNumberText(raw: string): NumberText {
  const text = raw.trim().replace(/[\s\u00a0\u2009\u202f']/g, '');
  if (text === '') return { ok: false, message: 'Enter a number.' };
  const negative = MINUS.test(text);
  const body = negative ? text.slice(1) : text;
  let digits: string;
  if (PLAIN.test(body) || SCIENTIFIC.test(body)) digits = body;
  else if (COMMA_GROUPS.test(body) && (body.split(',').length > 2 || body.includes('.'))) digits = body.replace(/,/g, '');
  else if (/^\d+,\d+$/.test(body)) {
    const sign = negative ? '-' : '';
    const asDecimal = `${sign}${body.replace(',', '.')}`;
    const asThousands = `${sign}${body.replace(',', '')}`;
    const both = /^\d{1,3},\d{3}$/.test(body);
    return {
      ok: false,
      message: both
        ? `“${raw.trim()}” could be ${asThousands} or ${asDecimal}: write ${asThousands} or ${asDecimal}.`
        : `“${raw.trim()}”: write decimals with a point (${asDecimal}).`,
    };
  } else return { ok: false, message: `“${raw.trim()}” is not a number.` };
  const value = Number(digits) * (negative ? -1 : 1);
  if (!Number.isFinite(value) || Math.abs(value) > 1e15) return { ok: false, message: `“${raw.trim()}” is too large.` };
  return { ok: true, value: Object.is(value, -0) ? 0 : value };
}

/** The value, or null when the text is not a number by the rule above. */
export function numberOrNull(raw: string): number | null {
  const read = readNumberText(raw);
  return read.ok ? read.value : null;
}
