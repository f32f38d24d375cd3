/**
 * Splits a chart label into lines that fit a width, by words, so no label is cut off (the PDF
 * has no text measuring at layout time). The width of a character is taken as 0.55 of the font
 * size, a little wider than Work Sans's average, so the estimate errs towards shorter lines.
 * A label that needs more than `maxLines` ends its last line with "…".
 */
export const CHAR_WIDTH_EM = 0.55;

export function wrapLabel(text: string, maxWidth: number, fontSize: number, maxLines = 2): string[] {
  const perLine = Math.max(4, Math.floor(maxWidth / (fontSize * CHAR_WIDTH_EM)));
  const lines: string[] = [];
  let current = '';
  for (const word of text.split(/\s+/).filter(Boolean)) {
    const next = current ? `${current} ${word}` : word;
    if (next.length <= perLine || !current) current = next;
    else {
      lines.push(current);
      current = word;
    }
  }
  if (current) lines.push(current);
  const kept = lines.slice(0, maxLines).map((line) => (line.length > perLine ? `${line.slice(0, perLine - 1)}…` : line));
  if (lines.length > maxLines) {
    const last = kept[maxLines - 1]!;
    kept[maxLines - 1] = `${last.length >= perLine ? last.slice(0, perLine - 1) : last}…`;
  }
  return kept;
}

/** Whether `wrapLabel` keeps every word of the label whole, with no "…". */
export function fitsWhole(text: string, maxWidth: number, fontSize: number, maxLines = 2): boolean {
  return wrapLabel(text, maxWidth, fontSize, maxLines).join(' ') === text.split(/\s+/).filter(Boolean).join(' ');
}

/** The estimated width of a single line of text, for margins that must hold it. */
export function textWidth(text: string, fontSize: number): number {
  return text.length * fontSize * CHAR_WIDTH_EM;
}
